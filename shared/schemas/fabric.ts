/**
 * Fabrics: knits with their stretch and recovery. The fabric form and the /api/fabrics routes
 * validate with these same objects. Width is typed in the request's unit (or as "60 in",
 * "150 cm") and stored in mm; stretch is percent; weight is grams per square metre.
 */
import { z } from 'zod';
import type { LengthUnit } from '../units';
import { RECOVERIES, type Recovery } from '../fabric/stretch';
import {
  idParam,
  lengthInput,
  lengthRead,
  objectError,
  optionalText,
  pageQuery,
  recordUnitSchema,
  requiredText,
  versionField,
  type LengthLimit,
  type Page,
  type StudioUnit,
} from './record-fields';

export * from '../fabric/stretch';

export const FABRIC_NAME_MAX = 120;
export const FABRIC_FIBRE_MAX = 200;
export const FABRIC_NOTES_MAX = 4000;

/** Fabric width accepted, mm: a narrow tubular rib to a wide sheeting knit. */
export const FABRIC_WIDTH_LIMIT_MM: LengthLimit = { min: 300, max: 3500 };
/** Stretch accepted, percent (swim knits reach about 100 %; nothing knitted doubles twice). */
export const FABRIC_STRETCH_LIMIT_PCT = { min: 0, max: 150 } as const;
/** Weight accepted, g/m² (a fine mesh to a heavy sweatshirt fleece). */
export const FABRIC_WEIGHT_LIMIT_GSM = { min: 20, max: 1200 } as const;

function percentField(label: string) {
  const { min, max } = FABRIC_STRETCH_LIMIT_PCT;
  const range = `${label} must be between ${min} % and ${max} %`;
  return z
    .number({ error: (issue) => (issue.input === undefined ? `${label} is required` : `${label} must be a number of percent`) })
    .min(min, range)
    .max(max, range)
    .transform((v) => Math.round(v * 10) / 10);
}

const recoveryField = z.enum(RECOVERIES as [Recovery, ...Recovery[]], {
  error: 'Recovery must be "good", "fair" or "poor"',
});

const weightField = z
  .number({ error: 'Weight must be a whole number of grams per square metre' })
  .int('Weight must be a whole number of grams per square metre')
  .min(FABRIC_WEIGHT_LIMIT_GSM.min, `Weight must be between ${FABRIC_WEIGHT_LIMIT_GSM.min} and ${FABRIC_WEIGHT_LIMIT_GSM.max} g/m²`)
  .max(FABRIC_WEIGHT_LIMIT_GSM.max, `Weight must be between ${FABRIC_WEIGHT_LIMIT_GSM.min} and ${FABRIC_WEIGHT_LIMIT_GSM.max} g/m²`)
  .nullable();

const widthField = z.union([lengthInput, z.null()], { error: 'Width must be a number or a length such as 60 in or 150 cm' });

const fabricShape = {
  name: requiredText('Name', FABRIC_NAME_MAX),
  fibreContent: optionalText('Fibre content', FABRIC_FIBRE_MAX).optional(),
  unit: recordUnitSchema.optional(),
  width: widthField.optional(),
  weightGsm: weightField.optional(),
  stretchCrosswise: percentField('Crosswise stretch'),
  stretchLengthwise: percentField('Lengthwise stretch').nullable().optional(),
  recovery: recoveryField,
  notes: optionalText('Notes', FABRIC_NOTES_MAX).optional(),
};

type WidthCarrier = { unit?: LengthUnit; width?: number | string | null };

function widthRead(input: WidthCarrier): { widthMm: number | null | undefined; message?: string; path?: 'unit' | 'width' } {
  const raw = input.width;
  if (raw === undefined) return { widthMm: undefined };
  if (raw === null || (typeof raw === 'string' && raw.trim() === '')) return { widthMm: null };
  if (typeof raw !== 'string' && typeof raw !== 'number') return { widthMm: undefined };
  // A typed "60 in" carries its own unit; a bare number needs the request's unit.
  if (input.unit === undefined && (typeof raw === 'number' || !/[a-z"″]\s*$/i.test(raw.trim()))) {
    return { widthMm: undefined, path: 'unit', message: 'Unit is required with a width: "in", "cm" or "mm"' };
  }
  const read = lengthRead(raw, input.unit ?? 'mm', 'Width', FABRIC_WIDTH_LIMIT_MM);
  return read.ok ? { widthMm: read.mm } : { widthMm: undefined, path: 'width', message: read.message };
}

function widthCheck(input: WidthCarrier, ctx: z.RefinementCtx): void {
  const read = widthRead(input);
  if (read.message && read.path) ctx.addIssue({ code: 'custom', path: [read.path], message: read.message });
}

function widthReadable(payload: { value: unknown }): boolean {
  const input = payload.value as WidthCarrier | null;
  return typeof input === 'object' && input !== null && (input.unit === undefined || recordUnitSchema.safeParse(input.unit).success);
}

function widthConvert<T extends WidthCarrier>(input: T): Omit<T, 'unit' | 'width'> & { widthMm?: number | null } {
  const { unit: _unit, width: _width, ...rest } = input;
  const { widthMm } = widthRead(input);
  return widthMm === undefined ? rest : { ...rest, widthMm };
}

/**
 * `POST /api/fabrics`: `{ name, fibreContent?, unit?, width?, weightGsm?, stretchCrosswise,
 * stretchLengthwise?, recovery, notes? }`; `unit` is needed when the width is a bare number.
 */
export const fabricCreateSchema = z
  .strictObject(fabricShape, objectError('A fabric'))
  .superRefine(widthCheck, { when: widthReadable })
  .transform(widthConvert);

/** `PATCH /api/fabrics/:id`: the `version` edited plus the fields that change. */
export const fabricUpdateSchema = z
  .strictObject(
    {
      version: versionField,
      name: fabricShape.name.optional(),
      fibreContent: fabricShape.fibreContent,
      unit: fabricShape.unit,
      width: fabricShape.width,
      weightGsm: fabricShape.weightGsm,
      stretchCrosswise: fabricShape.stretchCrosswise.optional(),
      stretchLengthwise: fabricShape.stretchLengthwise,
      recovery: fabricShape.recovery.optional(),
      notes: fabricShape.notes,
    },
    objectError('A fabric change'),
  )
  .refine((v) => Object.keys(v).some((k) => k !== 'version' && k !== 'unit'), {
    message: 'Send at least one field to change',
    path: ['_'],
  })
  .superRefine(widthCheck, { when: widthReadable })
  .transform(widthConvert);

/** The columns a fabric list sorts by. */
export const FABRIC_SORTS = ['name', 'updatedAt', 'stretchCrosswise'] as const;

/** `GET /api/fabrics?q=&sort=&order=&page=&pageSize=`; `q` searches name and fibre content. */
export const fabricListQuerySchema = z.strictObject(
  {
    q: pageQuery.q,
    sort: z.enum(FABRIC_SORTS, { error: `Sort must be one of ${FABRIC_SORTS.join(', ')}` }).default('name'),
    order: pageQuery.order,
    page: pageQuery.page,
    pageSize: pageQuery.pageSize,
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown query parameter: ${issue.keys.join(', ')}` : 'Bad query') },
);

/** `/api/fabrics/:id` path parameter. */
export const fabricParamsSchema = z.strictObject({ id: idParam('Fabric id') });

/** The stretch test helper's form: relaxed and stretched length of the same mark. */
export const stretchTestSchema = z
  .strictObject(
    {
      relaxed: z
        .number({ error: 'Relaxed length must be a number' })
        .positive('Relaxed length must be greater than zero'),
      stretched: z
        .number({ error: 'Stretched length must be a number' })
        .positive('Stretched length must be greater than zero'),
    },
    objectError('A stretch test'),
  )
  .refine((v) => v.stretched >= v.relaxed, {
    message: 'Stretched length cannot be shorter than the relaxed length',
    path: ['stretched'],
  });

export type FabricCreateInput = z.input<typeof fabricCreateSchema>;
export type FabricCreate = z.output<typeof fabricCreateSchema>;
export type FabricUpdateInput = z.input<typeof fabricUpdateSchema>;
export type FabricUpdate = z.output<typeof fabricUpdateSchema>;
export type FabricListQuery = z.output<typeof fabricListQuerySchema>;

/** A fabric as the API returns it: width in mm with the studio's unit beside it. */
export interface FabricView {
  id: number;
  name: string;
  fibreContent: string | null;
  widthMm: number | null;
  weightGsm: number | null;
  stretchCrosswise: number;
  stretchLengthwise: number | null;
  recovery: Recovery;
  notes: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
  studioUnit: StudioUnit;
}

/** `GET /api/fabrics`. */
export type FabricPage = Page<FabricView>;
