import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/errors.js';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

function refused(message: string): AppError {
  return new AppError(403, 'csrf', message);
}

function ownOrigins(req: Request, publicOrigin: string | undefined): string[] {
  if (publicOrigin) return publicOrigin.split(',').map((o) => o.trim().replace(/\/+$/, '').toLowerCase());
  return [`${req.protocol}://${req.get('host') ?? ''}`.toLowerCase()];
}

/**
 * CSRF defence for a cookie-session JSON API (OWASP CSRF Prevention Cheat Sheet, "Custom Request
 * Headers", "Verifying Origin With Standard Headers" and "Fetch Metadata headers"; ASVS 5.0
 * §3.5.1): every state-changing request must carry `X-Requested-With: XMLHttpRequest` (a header
 * a cross-site form cannot send and a cross-site script cannot send without a CORS preflight the
 * server never grants); when the browser sends `Origin` it must be the app's own, and when it
 * sends `Sec-Fetch-Site` it must be `same-origin`. GET, HEAD and OPTIONS change nothing.
 */
export function csrfProtect(publicOrigin: string | undefined): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    if (req.get('x-requested-with') !== 'XMLHttpRequest') {
      return next(refused('Missing the X-Requested-With: XMLHttpRequest header: send requests through the Knitwright app.'));
    }
    const origin = req.get('origin');
    if (origin !== undefined && !ownOrigins(req, publicOrigin).includes(origin.toLowerCase())) {
      return next(refused('This request came from another site and was refused.'));
    }
    const site = req.get('sec-fetch-site');
    if (site !== undefined && site !== 'same-origin') {
      return next(refused('This request came from another site and was refused.'));
    }
    next();
  };
}
