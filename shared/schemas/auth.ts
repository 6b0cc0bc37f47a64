/**
 * Accounts: sign-up, sign-in, the member's own profile, the studio's defaults and its members.
 * The same schemas validate the client's forms and the server's routes. Every object is strict,
 * so a field the route does not expect (`role`, `studioId`, ...) is refused rather than ignored.
 */
import { z } from 'zod';

/** Password length in Unicode code points (OWASP ASVS 5.0 §6.2.1, §6.2.9: at least 8, allow 64+). */
export const PASSWORD_MIN = 8;
export const PASSWORD_MAX = 128;
export const NAME_MAX = 120;
export const EMAIL_MAX = 254;

export const ROLES = ['owner', 'cutter'] as const;
export const UNITS = ['in', 'cm'] as const;
export const PAPERS = ['letter', 'a4', 'legal', 'a3', 'tabloid'] as const;

/**
 * Studio default ranges. Seam allowances for overlocked knits run 1/4 in to 1/2 in, hems 1/2 in
 * to 1 in (see /work/shared/trade.md, "Allowances"); the limits leave room either side. Bands are
 * cut from about 2/3 (rib) to 1:1 (tape) of the opening (common practice).
 */
export const SEAM_ALLOWANCE_MM = { min: 0, max: 25.4 } as const;
export const HEM_ALLOWANCE_MM = { min: 0, max: 50.8 } as const;
export const BINDING_RATIO = { min: 0.5, max: 1 } as const;

export type Role = (typeof ROLES)[number];
export type StudioUnit = (typeof UNITS)[number];
export type PaperSize = (typeof PAPERS)[number];

/** "Unknown field "x"" for extra keys, "<label> is required" for a missing object. */
function strictError(label: string) {
  return (issue: { code: string; keys?: string[]; input?: unknown }) =>
    issue.code === 'unrecognized_keys' ? `Unknown field: ${(issue.keys ?? []).join(', ')}` : `${label} must be an object`;
}

function textField(label: string, max: number) {
  return z
    .string({ error: (i) => (i.input === undefined ? `${label} is required` : `${label} must be text`) })
    .trim()
    .min(1, { error: `${label} is required` })
    .max(max, { error: `${label} must be at most ${max} characters` });
}

const codePoints = (s: string): number => [...s].length;

function passwordField(label: string) {
  return z
    .string({ error: (i) => (i.input === undefined ? `${label} is required` : `${label} must be text`) })
    .refine((s) => codePoints(s) >= PASSWORD_MIN, { error: `${label} must be at least ${PASSWORD_MIN} characters` })
    .refine((s) => codePoints(s) <= PASSWORD_MAX, { error: `${label} must be at most ${PASSWORD_MAX} characters` });
}

/** E-mail addresses are compared in lower case, without surrounding spaces. */
export const emailSchema = z
  .string({ error: (i) => (i.input === undefined ? 'E-mail is required' : 'E-mail must be text') })
  .trim()
  .max(EMAIL_MAX, { error: `E-mail must be at most ${EMAIL_MAX} characters` })
  .toLowerCase()
  .pipe(z.email({ error: 'E-mail must be an address like name@studio.com' }));

export const SignUpSchema = z.strictObject(
  {
    studioName: textField('Studio name', NAME_MAX),
    name: textField('Your name', NAME_MAX),
    email: emailSchema,
    password: passwordField('Password'),
  },
  { error: strictError('Sign-up') },
);

/** Sign-in checks no password rules: a wrong password is simply wrong. */
export const SignInSchema = z.strictObject(
  {
    email: emailSchema,
    password: z
      .string({ error: (i) => (i.input === undefined ? 'Password is required' : 'Password must be text') })
      .min(1, { error: 'Password is required' })
      .max(PASSWORD_MAX * 4, { error: 'Password is too long' }),
  },
  { error: strictError('Sign-in') },
);

export const ProfileUpdateSchema = z
  .strictObject(
    {
      name: textField('Name', NAME_MAX).optional(),
      currentPassword: z
        .string({ error: 'Current password must be text' })
        .min(1, { error: 'Current password is required to change the password' })
        .max(PASSWORD_MAX * 4, { error: 'Current password is too long' })
        .optional(),
      newPassword: passwordField('New password').optional(),
    },
    { error: strictError('Profile') },
  )
  .superRefine((v, c) => {
    if (v.newPassword !== undefined && v.currentPassword === undefined) {
      c.addIssue({ code: 'custom', path: ['currentPassword'], message: 'Current password is required to change the password' });
    }
    if (v.currentPassword !== undefined && v.newPassword === undefined) {
      c.addIssue({ code: 'custom', path: ['newPassword'], message: 'New password is required' });
    }
  });

function rangeField(label: string, range: { min: number; max: number }, unit: string) {
  return z
    .number({ error: (i) => (i.input === undefined ? `${label} is required` : `${label} must be a number`) })
    .min(range.min, { error: `${label} must be between ${range.min} and ${range.max}${unit}` })
    .max(range.max, { error: `${label} must be between ${range.min} and ${range.max}${unit}` });
}

export const StudioUpdateSchema = z.strictObject(
  {
    name: textField('Studio name', NAME_MAX).optional(),
    defaultUnit: z.enum(UNITS, { error: 'Default unit must be "in" or "cm"' }).optional(),
    defaultPaper: z.enum(PAPERS, { error: `Default paper must be one of ${PAPERS.join(', ')}` }).optional(),
    seamAllowanceMm: rangeField('Seam allowance', SEAM_ALLOWANCE_MM, ' mm').optional(),
    hemAllowanceMm: rangeField('Hem allowance', HEM_ALLOWANCE_MM, ' mm').optional(),
    bindingRatio: rangeField('Binding ratio', BINDING_RATIO, '').optional(),
  },
  { error: strictError('Studio defaults') },
);

export const MemberUpdateSchema = z.strictObject(
  {
    role: z.enum(ROLES, { error: 'Role must be "owner" or "cutter"' }).optional(),
    disabled: z.boolean({ error: 'Disabled must be true or false' }).optional(),
  },
  { error: strictError('Member') },
);

/** `:id` in /api/studio/members/:id. */
export const MemberIdParamsSchema = z.strictObject({
  id: z.coerce
    .number({ error: 'Member id must be a number' })
    .int({ error: 'Member id must be a whole number' })
    .positive({ error: 'Member id must be positive' })
    .max(4_294_967_295, { error: 'Member id is out of range' }),
});

export type SignUpInput = z.infer<typeof SignUpSchema>;
export type SignInInput = z.infer<typeof SignInSchema>;
export type ProfileUpdateInput = z.infer<typeof ProfileUpdateSchema>;
export type StudioUpdateInput = z.infer<typeof StudioUpdateSchema>;
export type MemberUpdateInput = z.infer<typeof MemberUpdateSchema>;

export interface StudioView {
  id: number;
  name: string;
  defaultUnit: StudioUnit;
  defaultPaper: PaperSize;
  seamAllowanceMm: number;
  hemAllowanceMm: number;
  bindingRatio: number;
}

export interface MeUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

/** Answer of signup, signin, GET /api/auth/me and PATCH /api/auth/me. */
export interface MeResponse {
  user: MeUser;
  studio: StudioView;
}

/** GET/PATCH /api/studio. */
export type StudioResponse = StudioView;

export interface MemberView extends MeUser {
  disabled: boolean;
  createdAt: string;
}

/** GET /api/studio/members. */
export interface MembersResponse {
  members: MemberView[];
}

/** PATCH /api/studio/members/:id. */
export type MemberResponse = MemberView;
