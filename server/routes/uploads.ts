import { Router, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import {
  PHOTO_FIELD,
  photoClientParamsSchema,
  photoFieldsSchema,
  photoParamsSchema,
  swatchFieldsSchema,
  swatchParamsSchema,
  type PhotoFields,
} from '../../shared/schemas/photo.js';
import type { AppDeps } from '../app.js';
import { MULTIPART_PATHS } from '../middleware/json-only.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import * as photos from '../services/photos.js';
import * as swatches from '../services/swatches.js';
import { storageFromUrl } from '../storage/storage-url.js';
import { fileNameCheck, imageTypeDetect } from '../uploads/image-check.js';
import type { UploadDeps } from '../uploads/image-files.js';
import { imageProcess, type ProcessedImage } from '../uploads/image-process.js';
import { recordCleanupRegister } from '../uploads/record-cleanup.js';
import { singleImageUpload, uploadedFile } from '../uploads/upload-middleware.js';

/** The API paths (below /api) that take a multipart upload instead of JSON. */
export const UPLOAD_PATHS = [/^\/clients\/[^/]+\/photos\/?$/, /^\/fabrics\/[^/]+\/swatch\/?$/];

type IdParams = { id: number };
const idOf = (req: Request) => (req.params as unknown as IdParams).id;

/** Runs `check` before the body is read, so a refused caller never gets to send 10 MB. */
function before(check: (req: Request) => Promise<void>): RequestHandler {
  return (req: Request, _res: Response, next: NextFunction) => {
    check(req).then(() => next(), next);
  };
}

/** The uploaded image checked by its bytes and written again without metadata. */
async function imageFromRequest(req: Request): Promise<ProcessedImage> {
  const file = uploadedFile(req.file, PHOTO_FIELD);
  fileNameCheck(PHOTO_FIELD, file.originalname);
  const type = await imageTypeDetect(PHOTO_FIELD, file.buffer, file.originalname, file.mimetype);
  return imageProcess(PHOTO_FIELD, file.buffer, type);
}

/**
 * Fitting photos and fabric swatches: members of the studio view them, owners upload and delete.
 * Files are served only through these authorised routes, never from a public folder.
 */
export function uploadsRouter(appDeps: AppDeps): Router {
  const deps: UploadDeps = { storage: storageFromUrl(appDeps.config.STORAGE_URL), logger: appDeps.logger };
  recordCleanupRegister(deps);
  for (const re of UPLOAD_PATHS) if (!MULTIPART_PATHS.some((known) => known.source === re.source)) MULTIPART_PATHS.push(re);

  const router = Router();
  const owner = requireRole('owner');
  const upload = singleImageUpload(PHOTO_FIELD);
  const clientParams = validate(photoClientParamsSchema, 'params');
  const photoParams = validate(photoParamsSchema, 'params');
  const fabricParams = validate(swatchParamsSchema, 'params');

  router.get('/clients/:id/photos', requireAuth, clientParams, async (req, res) => {
    res.json({ items: await photos.photoList(ctx(req), idOf(req)) });
  });

  router.post(
    '/clients/:id/photos',
    owner,
    clientParams,
    before((req) => photos.photoUploadAllowed(ctx(req), idOf(req))),
    upload,
    validate(photoFieldsSchema),
    async (req, res) => {
      const image = await imageFromRequest(req);
      res.status(201).json(await photos.photoCreate(deps, ctx(req), idOf(req), req.body as PhotoFields, image));
    },
  );

  for (const s of ['full', 'thumb'] as const) {
    router.get(`/photos/:id/${s}`, requireAuth, photoParams, async (req, res) => {
      await photos.photoSend(deps, ctx(req), idOf(req), s, res);
    });
  }

  router.delete('/photos/:id', owner, photoParams, async (req, res) => {
    await photos.photoDelete(deps, ctx(req), idOf(req));
    res.status(204).end();
  });

  router.get('/swatches', requireAuth, async (req, res) => {
    res.json({ items: await swatches.swatchList(ctx(req)) });
  });

  router.get('/fabrics/:id/swatch', requireAuth, fabricParams, async (req, res) => {
    res.json({ swatch: await swatches.swatchGet(ctx(req), idOf(req)) });
  });

  router.put(
    '/fabrics/:id/swatch',
    owner,
    fabricParams,
    before((req) => swatches.swatchUploadAllowed(ctx(req), idOf(req))),
    upload,
    validate(swatchFieldsSchema),
    async (req, res) => {
      const image = await imageFromRequest(req);
      res.json(await swatches.swatchPut(deps, ctx(req), idOf(req), image));
    },
  );

  router.delete('/fabrics/:id/swatch', owner, fabricParams, async (req, res) => {
    await swatches.swatchDelete(deps, ctx(req), idOf(req));
    res.status(204).end();
  });

  for (const s of ['full', 'thumb'] as const) {
    router.get(`/fabrics/:id/swatch/${s}`, requireAuth, fabricParams, async (req, res) => {
      await swatches.swatchSend(deps, ctx(req), idOf(req), s, res);
    });
  }

  return router;
}
