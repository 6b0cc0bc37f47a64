/**
 * Parsing untrusted input into a DraftInput with the shared schema: shape and types, then each
 * field's range in the input's unit, then the consistency of the style's fields. Errors name the field by its
 * dotted path ("measurements.bust") and in words.
 */
import type { z } from 'zod';
import { draftInputSchema, type DraftInput } from '../../schemas/draft-input';
import type { FieldError } from '../types';

/** A parsed input, or the errors that prevent drafting. */
export type DraftInputParseResult = { ok: true; input: DraftInput } | { ok: false; errors: FieldError[] };

/** Field errors from zod issues, with dotted paths. */
export function fieldErrorsFromIssues(issues: readonly z.core.$ZodIssue[]): FieldError[] {
  return issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}

/** Parses raw input (e.g. a JSON body) into a DraftInput or field errors. */
export function parseDraftInput(raw: unknown): DraftInputParseResult {
  const parsed = draftInputSchema.safeParse(raw);
  return parsed.success
    ? { ok: true, input: parsed.data }
    : { ok: false, errors: fieldErrorsFromIssues(parsed.error.issues) };
}
