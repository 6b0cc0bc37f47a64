import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError, NotFound } from '../lib/errors.js';

export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string>; current?: unknown };
}

/** Unknown API paths answer the same error shape as everything else. */
export const apiNotFound: RequestHandler = (_req, _res, next) => next(new NotFound('API route'));

/** The one place failures become responses; stack traces never leave the server. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  void _next;
  if (err instanceof AppError) {
    const body: ErrorBody = { error: { code: err.code, message: err.message } };
    if (err.fields) body.error.fields = err.fields;
    if (err.details !== undefined) body.error.current = err.details;
    res.status(err.status).json(body);
    return;
  }
  const e = err as { type?: string; status?: number; statusCode?: number; message?: string };
  if (e.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'invalid_json', message: 'The request body is not valid JSON.' } });
    return;
  }
  if (e.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'too_large', message: 'The request body is too large.' } });
    return;
  }
  const status = e.status ?? e.statusCode;
  if (status && status >= 400 && status < 500) {
    res.status(status).json({ error: { code: 'bad_request', message: e.message ?? 'Bad request.' } });
    return;
  }
  req.log?.error({ err }, 'unhandled error');
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Try again.' } });
};
