/**
 * The "E-mail a draft" form: what the person chose, turned into the request body and checked
 * with the same DraftSendSchema the server validates with, so a bad address is named beside
 * its field before anything is sent.
 */
import { DraftSendSchema, type DraftSendInput, type SendKind } from '@shared/schemas/mail';
import type { PaperId } from '@shared/engine/layout/tiling-paper';
import { ApiError } from '@/lib/api-client';

export type Recipient = 'client' | 'address';

export interface DraftSendForm {
  kind: SendKind;
  paper: PaperId;
  recipient: Recipient;
  /** The address as typed, used when `recipient` is "address". */
  address: string;
  note: string;
}

/** Messages keyed by the form's fields; `form` for what belongs to no one field. */
export type DraftSendErrors = Partial<Record<'kind' | 'paper' | 'to' | 'note' | 'form', string>>;

const FIELDS = ['kind', 'paper', 'to', 'note'] as const;

function fieldOf(key: unknown): keyof DraftSendErrors {
  return (FIELDS as readonly unknown[]).includes(key) ? (key as keyof DraftSendErrors) : 'form';
}

export type DraftSendChecked = { ok: true; body: DraftSendInput } | { ok: false; errors: DraftSendErrors };

/** The request body for this form, or the messages naming what to correct. */
export function draftSendCheck(form: DraftSendForm): DraftSendChecked {
  const note = form.note.trim();
  const parsed = DraftSendSchema.safeParse({
    kind: form.kind,
    to: form.recipient === 'client' ? 'client' : form.address,
    paper: form.paper,
    ...(note ? { note } : {}),
  });
  if (parsed.success) return { ok: true, body: parsed.data };
  const errors: DraftSendErrors = {};
  for (const issue of parsed.error.issues) errors[fieldOf(issue.path[0])] ??= issue.message;
  // An empty address gets the words of this form rather than the schema's "client" or address.
  if (errors.to && form.recipient === 'address' && form.address.trim() === '') errors.to = 'Type the address to send to, e.g. prints@copyshop.example';
  return { ok: false, errors };
}

/**
 * The server's answer as messages beside the fields (ApiError.fields); an answer tied to no
 * field (no permission, a draft that cannot be drawn, the mail server down) goes to the form.
 */
export function draftSendServerErrors(error: Error): DraftSendErrors {
  if (!(error instanceof ApiError)) return { form: error.message };
  const errors: DraftSendErrors = {};
  for (const [key, message] of Object.entries(error.fields)) errors[fieldOf(key)] ??= message;
  if (Object.keys(errors).length === 0) errors.form = error.message;
  return errors;
}
