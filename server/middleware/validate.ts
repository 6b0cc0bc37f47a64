import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { Invalid } from '../lib/errors.js';

type Part = 'body' | 'query' | 'params';

/** Turns zod issues into `{ "measurements.bust": "message" }`, one message per field. */
export function zodFieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    if (issue.code === 'unrecognized_keys') {
      for (const k of issue.keys) fields[[...issue.path, k].join('.')] ??= `Unknown field "${k}".`;
      continue;
    }
    fields[key] ??= issue.message;
  }
  return fields;
}

/**
 * Parses one part of the request with a shared zod schema and replaces it with the parsed value,
 * so handlers never read the raw input again.
 */
export function validate<S extends z.ZodType>(schema: S, part: Part = 'body'): RequestHandler {
  return (req, _res, next) => {
    const result = schema.safeParse(req[part] ?? {});
    if (!result.success) {
      return next(new Invalid('Some fields need attention.', zodFieldErrors(result.error)));
    }
    if (part === 'query') {
      // Express 5 exposes req.query as a getter: shadow it with the parsed value.
      Object.defineProperty(req, 'query', { value: result.data, writable: true, configurable: true });
    } else {
      (req as unknown as Record<Part, unknown>)[part] = result.data;
    }
    next();
  };
}
