import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { PAPERS, UNITS, type StudioResponse, type StudioUnit, type StudioUpdateInput } from '@shared/schemas/auth';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useUpdateStudio } from '../api/update-studio';
import {
  allowanceConvert,
  PAPER_LABEL,
  SERVER_FIELD_NAMES,
  StudioFormSchema,
  studioFormValues,
  UNIT_LABEL,
  type StudioFormValues,
} from '../lib/studio-form';

const UNIT_OPTIONS = UNITS.map((u) => ({ value: u, label: UNIT_LABEL[u] }));
const PAPER_OPTIONS = PAPERS.map((p) => ({ value: p, label: PAPER_LABEL[p] }));

export interface StudioDefaultsFormProps {
  studio: StudioResponse;
  /** After a save, e.g. to refresh what the header shows. */
  onSaved?: (studio: StudioResponse) => void;
}

/** The studio's name and the defaults every new draft and print starts from. */
export function StudioDefaultsForm({ studio, onSaved }: StudioDefaultsFormProps) {
  const form = useForm<StudioFormValues, unknown, z.output<typeof StudioFormSchema>>({
    resolver: zodResolver(StudioFormSchema),
    defaultValues: studioFormValues(studio),
  });
  const { errors, isDirty, dirtyFields } = form.formState;
  const unit = useWatch({ control: form.control, name: 'defaultUnit' });
  const update = useUpdateStudio({
    onSuccess: (saved) => {
      form.reset(studioFormValues(saved));
      onSaved?.(saved);
    },
  });

  const submit = form.handleSubmit((values) => {
    // Send only what the owner changed, so an untouched allowance is not rounded to the display step.
    const changes: StudioUpdateInput = {};
    if (dirtyFields.name) changes.name = values.name;
    if (dirtyFields.defaultUnit) changes.defaultUnit = values.defaultUnit;
    if (dirtyFields.defaultPaper) changes.defaultPaper = values.defaultPaper;
    if (dirtyFields.seamAllowance) changes.seamAllowanceMm = values.seamAllowanceMm;
    if (dirtyFields.hemAllowance) changes.hemAllowanceMm = values.hemAllowanceMm;
    if (dirtyFields.bindingRatio) changes.bindingRatio = values.bindingRatio;
    return update.mutateAsync(changes).catch((error: unknown) => {
      serverErrorsApply(error, form.setError, ['name', 'defaultUnit', 'defaultPaper', 'bindingRatio'], SERVER_FIELD_NAMES);
    });
  });

  // `unit` is still the value of the last render: the unit the lengths were typed in.
  const unitChange = (next: StudioUnit) => {
    const from = unit;
    if (from === next) return;
    for (const name of ['seamAllowance', 'hemAllowance'] as const) {
      form.setValue(name, allowanceConvert(form.getValues(name), from, next), { shouldDirty: true });
    }
  };

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Studio defaults">
      <TextField label="Studio name" autoComplete="organization" error={errors.name?.message} {...form.register('name')} />
      <div className="grid gap-5 sm:grid-cols-2">
        <SelectField
          label="Unit"
          hint="Screens show lengths in this unit and read typed lengths in it."
          options={UNIT_OPTIONS}
          error={errors.defaultUnit?.message}
          {...form.register('defaultUnit', { onChange: (e: { target: { value: StudioUnit } }) => unitChange(e.target.value) })}
        />
        <SelectField
          label="Paper"
          hint="The sheet patterns are tiled on unless a print says otherwise."
          options={PAPER_OPTIONS}
          error={errors.defaultPaper?.message}
          {...form.register('defaultPaper')}
        />
        <TextField
          label="Seam allowance"
          hint="Overlocked knit seams: 1/4 in (6 mm) on a home overlocker, 3/8 in (10 mm) for production."
          inputMode="decimal"
          suffix={unit}
          inputClassName="num"
          error={errors.seamAllowance?.message}
          {...form.register('seamAllowance')}
        />
        <TextField
          label="Hem allowance"
          hint="Knit hems are usually turned 1/2 in to 1 in (13–25 mm)."
          inputMode="decimal"
          suffix={unit}
          inputClassName="num"
          error={errors.hemAllowance?.message}
          {...form.register('hemAllowance')}
        />
        <TextField
          label="Binding ratio"
          hint="Band length ÷ edge length: 1 for binding tape applied unstretched, about 0.85 for self-fabric neckbands."
          inputMode="decimal"
          inputClassName="num"
          error={errors.bindingRatio?.message}
          {...form.register('bindingRatio')}
        />
      </div>
      <p className="text-sm text-muted">
        Lengths accept <span className="num">1/4</span>, <span className="num">0.25</span>, <span className="num">¼</span>,{' '}
        <span className="num">6 mm</span> or <span className="num">0.6 cm</span>.
      </p>
      {errors.root?.server?.message && (
        <Alert tone="error" title="The defaults were not saved">
          {errors.root.server.message}
        </Alert>
      )}
      {update.isSuccess && !isDirty && <Alert tone="success">Studio defaults saved.</Alert>}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" pending={form.formState.isSubmitting} pendingLabel="Saving…" disabled={!isDirty}>
          Save defaults
        </Button>
        {isDirty && (
          <Button
            onClick={() => form.reset(studioFormValues(studio))}
          >
            Undo changes
          </Button>
        )}
      </div>
    </form>
  );
}
