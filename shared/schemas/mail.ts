/**
 * E-mail: invitations, password resets, sending work to clients and copy shops, and the sent
 * mail the local sink keeps. The same schemas validate the client's forms and the server's
 * routes; every object is strict and every message names its field.
 */
import { z } from 'zod';
import { SHEET_PAPER_IDS, TILE_PAPER_IDS } from '../engine/layout/tiling-paper';
import { EMAIL_MAX, emailSchema, NAME_MAX, PASSWORD_MAX, PASSWORD_MIN, ROLES, type Role } from './auth';

export const DELIVERY_KINDS = ['invitation', 'password_reset', 'measurements', 'tiles', 'sheet', 'ticket'] as const;
export type DeliveryKind = (typeof DELIVERY_KINDS)[number];
export const DELIVERY_STATUSES = ['sending', 'sent', 'failed'] as const;
export type DeliveryStatus = (typeof DELIVERY_STATUSES)[number];

/** The documents of a draft that can be e-mailed. */
export const SEND_KINDS = ['tiles', 'sheet', 'ticket'] as const;
export type SendKind = (typeof SEND_KINDS)[number];

/** An invitation link is good for 72 hours; a password-reset link for one hour. */
export const INVITATION_HOURS = 72;
export const RESET_MINUTES = 60;

/** A note added to a message for the client or the copy shop. */
export const NOTE_MAX = 2000;

function objectError(label: string) {
  return {
    error: (issue: { code: string; keys?: string[] }) =>
      issue.code === 'unrecognized_keys' ? `Unknown field: ${(issue.keys ?? []).join(', ')}` : `${label} must be an object`,
  };
}

const codePoints = (s: string): number => [...s].length;

/** The same length rules as sign-up (OWASP ASVS 5.0 §6.2.1, §6.2.9). */
const passwordField = z
  .string({ error: (i) => (i.input === undefined ? 'Password is required' : 'Password must be text') })
  .refine((s) => codePoints(s) >= PASSWORD_MIN, { error: `Password must be at least ${PASSWORD_MIN} characters` })
  .refine((s) => codePoints(s) <= PASSWORD_MAX, { error: `Password must be at most ${PASSWORD_MAX} characters` });

const nameField = z
  .string({ error: (i) => (i.input === undefined ? 'Your name is required' : 'Your name must be text') })
  .trim()
  .min(1, { error: 'Your name is required' })
  .max(NAME_MAX, { error: `Your name must be at most ${NAME_MAX} characters` });

const noteField = z
  .string({ error: 'Note must be text' })
  .trim()
  .max(NOTE_MAX, { error: `Note must be at most ${NOTE_MAX} characters` })
  .optional();

/** The e-mailed tokens: 32 random bytes in base64url (43 characters). */
export const tokenParamsSchema = z.strictObject({
  token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, { error: 'This link is not complete: open it from the e-mail again, or copy all of it.' }),
});

const idField = (label: string) =>
  z.coerce
    .number({ error: `${label} must be a positive whole number` })
    .int({ error: `${label} must be a positive whole number` })
    .positive({ error: `${label} must be a positive whole number` })
    .max(4_294_967_295, { error: `${label} is too large` });

export const invitationParamsSchema = z.strictObject({ id: idField('Invitation id') });
export const messageParamsSchema = z.strictObject({ id: idField('Message id') });
export const attachmentParamsSchema = z.strictObject({ id: idField('Message id'), attachmentId: idField('Attachment id') });
export const clientMailParamsSchema = z.strictObject({ clientId: idField('Client id') });
export const draftMailParamsSchema = z.strictObject({ draftId: idField('Draft id') });

/** `POST /api/studio/invitations`. */
export const InvitationCreateSchema = z.strictObject(
  { email: emailSchema, role: z.enum(ROLES, { error: 'Role must be "owner" or "cutter"' }) },
  objectError('Invitation'),
);

/** `POST /api/invitations/:token/accept`. */
export const InvitationAcceptSchema = z.strictObject({ name: nameField, password: passwordField }, objectError('Acceptance'));

/** `POST /api/auth/password-reset`. */
export const ResetRequestSchema = z.strictObject({ email: emailSchema }, objectError('Reset request'));

/** `POST /api/auth/password-reset/:token`. */
export const ResetConfirmSchema = z.strictObject({ password: passwordField }, objectError('New password'));

/** `POST /api/clients/:clientId/send-measurements`. */
export const MeasurementsSendSchema = z.strictObject({ note: noteField }, objectError('Message'));

const PAPERS = [...TILE_PAPER_IDS, ...SHEET_PAPER_IDS] as [string, ...string[]];

const SEND_TO_MESSAGE = 'To must be "client" or an e-mail address like shop@example.com';

/** `"client"` (the draft's client's own address) or any e-mail address, lower-cased. */
const sendToField = z
  .string({ error: (i) => (i.input === undefined ? 'To is required: "client" or an e-mail address' : SEND_TO_MESSAGE) })
  .trim()
  .max(EMAIL_MAX, { error: `To must be at most ${EMAIL_MAX} characters` })
  .refine((v) => v === 'client' || emailSchema.safeParse(v).success, { error: SEND_TO_MESSAGE })
  .transform((v) => (v === 'client' ? v : v.toLowerCase()));

/** `POST /api/drafts/:draftId/send`: which document, to the client or to any address. */
export const DraftSendSchema = z.strictObject(
  {
    kind: z.enum(SEND_KINDS, { error: 'Kind must be "tiles", "sheet" or "ticket"' }),
    to: sendToField,
    paper: z.enum(PAPERS, { error: `Paper must be one of ${PAPERS.join(', ')}` }).optional(),
    note: noteField,
  },
  objectError('Message'),
);

export type InvitationCreateInput = z.infer<typeof InvitationCreateSchema>;
export type InvitationAcceptInput = z.infer<typeof InvitationAcceptSchema>;
export type ResetRequestInput = z.infer<typeof ResetRequestSchema>;
export type ResetConfirmInput = z.infer<typeof ResetConfirmSchema>;
export type MeasurementsSendInput = z.infer<typeof MeasurementsSendSchema>;
export type DraftSendInput = z.infer<typeof DraftSendSchema>;

export type InvitationStatus = 'open' | 'accepted' | 'revoked' | 'expired';

export interface InvitationView {
  id: number;
  email: string;
  role: Role;
  status: InvitationStatus;
  invitedBy: string | null;
  createdAt: string;
  lastSentAt: string;
  sentCount: number;
  expiresAt: string;
  acceptedAt: string | null;
  revokedAt: string | null;
}

/** `GET /api/studio/invitations`. */
export interface InvitationsResponse {
  invitations: InvitationView[];
}

/** `GET /api/invitations/:token`: what the person is invited to. */
export interface InvitationPublicView {
  studioName: string;
  role: Role;
  email: string;
  invitedBy: string | null;
  expiresAt: string;
}

/** `POST /api/auth/password-reset`: the same answer whatever the address. */
export interface ResetRequestResponse {
  message: string;
}

export interface DeliveryView {
  id: number;
  kind: DeliveryKind;
  to: string;
  subject: string;
  status: DeliveryStatus;
  error: string | null;
  sentBy: string | null;
  sentAt: string;
  /** The sink's copy, when the local sink received it (owners open it under Sent mail). */
  messageId: number | null;
}

/** `GET /api/clients/:clientId/deliveries` and `GET /api/drafts/:draftId/deliveries`. */
export interface DeliveriesResponse {
  deliveries: DeliveryView[];
}

export interface AttachmentView {
  id: number;
  filename: string;
  contentType: string;
  size: number;
}

export interface MailSummary {
  id: number;
  subject: string;
  fromName: string;
  fromAddress: string;
  to: string;
  receivedAt: string;
  attachmentCount: number;
}

/** `GET /api/studio/mail`. */
export interface MailListResponse {
  messages: MailSummary[];
  /** Where the local sink listens, or null when mail goes out through SMTP_URL. */
  sink: { host: string; port: number } | null;
}

/** `GET /api/studio/mail/:id`. */
export interface MailMessageView extends MailSummary {
  sentAt: string | null;
  html: string | null;
  text: string | null;
  attachments: AttachmentView[];
}
