import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef, type ReactNode } from 'react';
import { useForm, useWatch, type UseFormReturn } from 'react-hook-form';
import { fabricCreateSchema, RECOVERIES, type FabricCreate, type FabricCreateInput, type Recovery } from '@shared/schemas/fabric';
import { lengthFormat, lengthParse, type LengthUnit } from '@shared/units';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { controlClasses, Field } from '@/components/ui/field';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';

export type FabricFormValues = FabricCreateInput;

const FIELDS = ['name', 'fibreContent', 'width', 'weightGsm', 'stretchCrosswise', 'stretchLengthwise', 'recovery', 'notes'] as const;

const RECOVERY_TEXT: Record<Recovery, string> = {
  good: 'Good: springs straight back to its mark',
  fair: 'Fair: comes back slowly or nearly',
  poor: 'Poor: stays longer than its mark',
};

const numberOrNull = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(String(v).replace(',', '.')));
const numberOrUndefined = (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(String(v).replace(',', '.')));

interface FabricFormProps {
  defaultValues: Partial<FabricFormValues>;
  unit: LengthUnit;
  submitLabel: string;
  /** Saves the values as typed (the server reads them with the same schema). */
  onSubmit: (values: FabricFormValues) => Promise<unknown>;
  /** Lets the screen fill fields from outside (the stretch test) and watch them (the ease). */
  onReady?: (form: UseFormReturn<FabricFormValues, unknown, FabricCreate>) => void;
  /** Values to load from outside (e.g. "use the saved copy" after a conflict). */
  resetTo?: FabricFormValues | null;
  /** Shown above the buttons (the conflict panel). */
  notice?: ReactNode;
  /** Watched values, for the recommendation beside the form. */
  onStretchChange?: (stretchPct: number | null, recovery: Recovery | null) => void;
}

/** A knit's name, content, width, weight, stretch and recovery, checked with the server's schema. */
export function FabricForm({ defaultValues, unit, submitLabel, onSubmit, onReady, resetTo, notice, onStretchChange }: FabricFormProps) {
  const form = useForm<FabricFormValues, unknown, FabricCreate>({ resolver: zodResolver(fabricCreateSchema), defaultValues });
  const { errors, isSubmitting } = form.formState;
  const [stretch, recovery] = useWatch({ control: form.control, name: ['stretchCrosswise', 'recovery'] });

  useEffect(() => onReady?.(form), [form, onReady]);
  useEffect(() => {
    if (resetTo) form.reset(resetTo);
  }, [resetTo, form]);
  useEffect(() => {
    const pct = typeof stretch === 'number' && Number.isFinite(stretch) ? stretch : null;
    onStretchChange?.(pct, (RECOVERIES as readonly string[]).includes(recovery ?? '') ? (recovery as Recovery) : null);
  }, [stretch, recovery, onStretchChange]);
  // A width typed in one unit is re-written when the unit on screen changes, so its meaning stays.
  const shownUnit = useRef(unit);
  useEffect(() => {
    const from = shownUnit.current;
    shownUnit.current = unit;
    if (from === unit) return;
    const width = form.getValues('width');
    if (typeof width !== 'string' || width.trim() === '') return;
    const parsed = lengthParse(width, from);
    if (parsed.ok) form.setValue('width', lengthFormat(parsed.mm, unit, { withUnit: false }));
  }, [form, unit]);

  // The schema checks the form; what is sent is the text as typed, which the server parses the same way.
  const submit = form.handleSubmit(() =>
    onSubmit({ ...form.getValues(), unit }).catch((error: unknown) => serverErrorsApply(error, form.setError, FIELDS)),
  );

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Fabric">
      <TextField label="Name" error={errors.name?.message} {...form.register('name')} />
      <TextField label="Fibre content" optional placeholder="e.g. 95 % cotton, 5 % elastane" error={errors.fibreContent?.message} {...form.register('fibreContent')} />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField label="Width" optional suffix={unit} inputMode="decimal" inputClassName="num" hint="Selvedge to selvedge" error={errors.width?.message ?? errors.unit?.message} {...form.register('width')} />
        <TextField label="Weight" optional suffix="g/m²" inputMode="numeric" inputClassName="num" error={errors.weightGsm?.message} {...form.register('weightGsm', { setValueAs: numberOrNull })} />
      </div>
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField label="Crosswise stretch" suffix="%" inputMode="decimal" inputClassName="num text-lg" hint="Across the grain: the stretch that sets the ease" error={errors.stretchCrosswise?.message} {...form.register('stretchCrosswise', { setValueAs: numberOrUndefined })} />
        <TextField label="Lengthwise stretch" optional suffix="%" inputMode="decimal" inputClassName="num text-lg" hint="For four-way knits" error={errors.stretchLengthwise?.message} {...form.register('stretchLengthwise', { setValueAs: numberOrNull })} />
      </div>
      <fieldset>
        <legend className="text-sm font-medium">Recovery</legend>
        <div className="mt-2 grid gap-2 sm:grid-cols-3">
          {RECOVERIES.map((r) => (
            <label
              key={r}
              className={cx(
                'flex min-h-touch cursor-pointer items-start gap-2 rounded-lg border px-3 py-2 text-sm',
                recovery === r ? 'border-accent bg-accent-soft' : 'border-line bg-panel hover:bg-surface',
              )}
            >
              <input type="radio" value={r} className="mt-1 accent-[#1f6f66]" {...form.register('recovery')} />
              <span>{RECOVERY_TEXT[r]}</span>
            </label>
          ))}
        </div>
        {errors.recovery?.message && <p className="mt-1.5 text-sm font-medium text-danger">{errors.recovery.message}</p>}
      </fieldset>
      <Field label="Notes" optional error={errors.notes?.message}>
        {(ids) => (
          <textarea id={ids.id} aria-invalid={ids.invalid || undefined} aria-describedby={ids.describedBy} rows={3} className={`${controlClasses(ids.invalid)} py-2`} {...form.register('notes')} />
        )}
      </Field>
      {notice}
      {errors.root?.server?.message && (
        <Alert tone="error" title="Not saved">
          {errors.root.server.message}
        </Alert>
      )}
      <div className="flex justify-end">
        <Button type="submit" variant="primary" pending={isSubmitting} pendingLabel="Saving…">
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
