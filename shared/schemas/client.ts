/**
 * Clients: the people garments are made for. The client form and the /api/clients routes
 * validate with these same objects.
 */
import { z } from 'zod';
import { idParam, objectError, optionalText, pageQuery, requiredText, versionField, type Page } from './record-fields';

export const CLIENT_NAME_MAX = 120;
export const CLIENT_EMAIL_MAX = 254;
export const CLIENT_PHONE_MAX = 40;
export const CLIENT_NOTES_MAX = 4000;

/** An e-mail address, or `""`/null for none. */
const emailField = optionalText('E-mail', CLIENT_EMAIL_MAX).pipe(
  z.union([z.null(), z.email('E-mail must be an address like name@example.com')]),
);

/** Digits with the usual separators: +44 20 7946 0000, (555) 010-0199, 020.7946.0000. */
const phoneField = optionalText('Phone', CLIENT_PHONE_MAX).refine(
  (v) => v === null || (/^\+?[0-9 ().\-/]+$/.test(v) && /[0-9].*[0-9].*[0-9]/.test(v)),
  'Phone must be digits, with spaces, + - ( ) . / allowed, like +44 20 7946 0000',
);

const clientShape = {
  name: requiredText('Name', CLIENT_NAME_MAX),
  email: emailField.optional(),
  phone: phoneField.optional(),
  notes: optionalText('Notes', CLIENT_NOTES_MAX).optional(),
};

/** `POST /api/clients`: `{ name, email?, phone?, notes? }`. */
export const clientCreateSchema = z.strictObject(clientShape, objectError('A client'));

/** `PATCH /api/clients/:id`: the `version` edited plus the fields that change. */
export const clientUpdateSchema = z
  .strictObject(
    {
      version: versionField,
      name: clientShape.name.optional(),
      email: clientShape.email,
      phone: clientShape.phone,
      notes: clientShape.notes,
    },
    objectError('A client change'),
  )
  .refine((v) => Object.keys(v).length > 1, { message: 'Send at least one field to change', path: ['_'] });

/** The columns a client list sorts by. */
export const CLIENT_SORTS = ['name', 'createdAt', 'updatedAt', 'lastTakenAt'] as const;

/** `GET /api/clients?q=&sort=&order=&status=&page=&pageSize=` */
export const clientListQuerySchema = z.strictObject(
  {
    q: pageQuery.q,
    sort: z.enum(CLIENT_SORTS, { error: `Sort must be one of ${CLIENT_SORTS.join(', ')}` }).default('name'),
    order: pageQuery.order,
    status: z.enum(['active', 'archived', 'all'], { error: 'Status must be "active", "archived" or "all"' }).default('active'),
    page: pageQuery.page,
    pageSize: pageQuery.pageSize,
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown query parameter: ${issue.keys.join(', ')}` : 'Bad query') },
);

/** `/api/clients/:id` path parameter. */
export const clientParamsSchema = z.strictObject({ id: idParam('Client id') });

export type ClientCreateInput = z.input<typeof clientCreateSchema>;
export type ClientCreate = z.output<typeof clientCreateSchema>;
export type ClientUpdateInput = z.input<typeof clientUpdateSchema>;
export type ClientUpdate = z.output<typeof clientUpdateSchema>;
export type ClientListQueryInput = z.input<typeof clientListQuerySchema>;
export type ClientListQuery = z.output<typeof clientListQuerySchema>;

/**
 * A client as the API returns it. `email` and `phone` are present for owners only: a cutter
 * sees the name, notes and measurements but not how to reach the client.
 */
export interface ClientView {
  id: number;
  name: string;
  email?: string | null;
  phone?: string | null;
  notes: string | null;
  archived: boolean;
  version: number;
  createdAt: string;
  updatedAt: string;
  /** Date of the latest fitting (YYYY-MM-DD), null before the first one. */
  lastTakenAt: string | null;
  /** How many measurement sets (fittings) the client has. */
  measurementSetCount: number;
}

/** `GET /api/clients`. */
export type ClientPage = Page<ClientView>;
