import type { Request, RequestHandler } from 'express';
import { UnsupportedMediaType } from '../lib/errors.js';

/**
 * API paths that take `multipart/form-data` (file uploads) instead of JSON. A router that
 * accepts uploads adds its path pattern here, matched against the path below /api.
 */
export const MULTIPART_PATHS: RegExp[] = [];

function hasBody(req: Request): boolean {
  if (req.headers['transfer-encoding'] !== undefined) return true;
  const length = req.headers['content-length'];
  return length !== undefined && length !== '0';
}

/**
 * Every request body sent to the JSON API must be `application/json` (415 otherwise), so an
 * HTML form post (text/plain, urlencoded, multipart), which a cross-site page can send without
 * a preflight, never reaches a handler (OWASP CSRF Prevention Cheat Sheet, "Custom Request
 * Headers" note on content types; ASVS 5.0 §4.1.1).
 */
export function jsonOnly(multipartPaths: RegExp[] = MULTIPART_PATHS): RequestHandler {
  return (req, _res, next) => {
    if (!hasBody(req)) return next();
    if (req.is('application/json')) return next();
    if (req.is('multipart/form-data') && multipartPaths.some((re) => re.test(req.path))) return next();
    next(new UnsupportedMediaType());
  };
}
