import { Router } from 'express';
import { z } from 'zod';
import { pdfOptionsSchema, type PdfOptions } from '../../shared/engine/export/pdf-options.js';
import { draftParamsSchema } from '../../shared/schemas/draft.js';
import { Invalid } from '../lib/errors.js';
import { requireAuth } from '../middleware/require-role.js';
import { validate, zodFieldErrors } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import { draftPdfBuild } from '../services/draft-pdf.js';

type IdParams = z.infer<typeof draftParamsSchema>;

/** The query names and the engine option each one carries. */
const QUERY_TO_OPTION = { kind: 'kind', paper: 'paper', orientation: 'orientation', overlap: 'overlapMm', pieces: 'pieceIds' } as const;
type QueryName = keyof typeof QUERY_TO_OPTION;
const OPTION_TO_QUERY = Object.fromEntries(Object.entries(QUERY_TO_OPTION).map(([q, o]) => [o, q])) as Record<string, QueryName>;

const once = (label: string) => z.string({ error: `${label} must be given once, as text` }).optional();

/** The query as it arrives: every value text, given at most once, no other names. */
const pdfQueryRawSchema = z.strictObject(
  { kind: once('kind'), paper: once('paper'), orientation: once('orientation'), overlap: once('overlap'), pieces: once('pieces') },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown query field: ${issue.keys.join(', ')}` : 'The query must be name=value pairs') },
);

/** Text of the query → the engine's options: overlap in mm as a number, pieces as a comma-separated list of ids. */
function optionsFromQuery(raw: z.infer<typeof pdfQueryRawSchema>): unknown {
  const overlap = raw.overlap?.trim();
  return {
    kind: raw.kind,
    paper: raw.paper?.toLowerCase(),
    orientation: raw.orientation,
    // An empty or non-numeric overlap becomes NaN, which the shared schema answers by name.
    overlapMm: overlap === undefined ? undefined : overlap === '' ? Number.NaN : Number(overlap),
    pieceIds: raw.pieces === undefined ? undefined : raw.pieces.split(',').map((p) => p.trim()).filter(Boolean),
  };
}

/**
 * Parses the print query with the engine's shared pdfOptionsSchema; a bad value is a 400 naming
 * the query field (`overlap`, not the engine's `overlapMm`).
 */
export function pdfQueryParse(query: unknown): PdfOptions {
  const raw = pdfQueryRawSchema.safeParse(query ?? {});
  if (!raw.success) throw new Invalid('The print settings need attention.', zodFieldErrors(raw.error));
  const parsed = pdfOptionsSchema.safeParse(optionsFromQuery(raw.data));
  if (!parsed.success) throw new Invalid('The print settings need attention.', queryFields(zodFieldErrors(parsed.error)));
  return parsed.data;
}

/** Field errors keyed by the engine's option names ("overlapMm", "pieceIds.0") → by the query's names. */
function queryFields(fields: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(fields)) {
    const head = path.split('.')[0] ?? path;
    out[OPTION_TO_QUERY[head] ?? path] ??= message;
  }
  return out;
}

/**
 * `/api/drafts/:id/pdf?kind=tiles|sheet|ticket&paper=&orientation=&overlap=<mm>&pieces=a,b`: the
 * draft's tiled pages, wide sheet or cutting ticket as a PDF download. Any member who may read
 * the draft may print it.
 */
export function draftPdfRouter(): Router {
  const router = Router();
  router.use(requireAuth);

  router.get('/:id/pdf', validate(draftParamsSchema, 'params'), async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    const options = pdfQueryParse(req.query);
    const pdf = await draftPdfBuild(ctx(req), id, {
      kind: options.kind,
      paper: options.paper,
      orientation: options.orientation,
      overlapMm: options.overlapMm,
      pieceIds: options.pieceIds,
    }).catch((error: unknown) => {
      // The layout's refusals name the engine's options ("pieceIds"): answer with the query's names.
      if (error instanceof Invalid && error.fields) throw new Invalid(error.message, queryFields(error.fields));
      throw error;
    });
    res.set({
      'Content-Type': 'application/pdf',
      // The name is built from [a-z0-9-] only, so it needs no quoting rules beyond the quotes.
      'Content-Disposition': `attachment; filename="${pdf.fileName}"`,
      'Content-Length': String(pdf.bytes.length),
      'Cache-Control': 'private, no-store',
      'X-Page-Count': String(pdf.pageCount),
    });
    res.end(pdf.bytes);
  });

  return router;
}
