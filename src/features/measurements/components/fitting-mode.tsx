import { useMemo, useRef, useState, type ReactNode } from 'react';
import { useBlocker } from 'react-router';
import type { LengthUnit } from '@shared/units';
import { MEASUREMENT_FIELDS, measurementSetCreateSchema, measurementWarnings, type MeasurementKey, type MeasurementSetCreateInput } from '@shared/schemas/measurement';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { controlClasses } from '@/components/ui/field';
import { entriesConvert, entriesFromMm, entriesRead, fittingPayload, requiredMissing, swipeDirection, todayIso, type FittingEntries } from '../lib/fitting-entries';
import type { ValuesMm } from '../lib/set-compare';
import { BodyDiagram } from './body-diagram';
import { FittingField } from './fitting-field';
import { FittingProgress, type FittingStepState } from './fitting-progress';
import { FittingReview } from './fitting-review';

export interface FittingPrevious {
  valuesMm: ValuesMm;
  takenAt: string;
  /** "Last fitting", "Version 2 (being corrected)". */
  label: string;
}

interface FittingModeProps {
  title: ReactNode;
  unit: LengthUnit;
  /** Controls placed in the top bar: the unit switch, the way out. */
  tools: ReactNode;
  previous: FittingPrevious | null;
  /** Values of the set being corrected: the texts start from them, and untouched ones are sent back exactly. */
  initialValuesMm?: ValuesMm;
  initialTakenAt?: string;
  initialNotes?: string;
  saveLabel: string;
  saving: boolean;
  saveError: string | null;
  onSave: (payload: MeasurementSetCreateInput) => void;
  /** True once the set is saved: leaving then needs no confirmation. */
  saved: () => boolean;
}

const LAST = MEASUREMENT_FIELDS.length;

/** Taking a set at a fitting: one measurement at a time, then a review with the previous set. */
export function FittingMode(props: FittingModeProps) {
  const { title, unit, tools, previous, saveLabel, saving, saveError, onSave, saved } = props;
  const [typed, setTyped] = useState<{ unit: LengthUnit; entries: FittingEntries }>(() => ({
    unit,
    entries: props.initialValuesMm ? entriesFromMm(props.initialValuesMm, unit) : {},
  }));
  const [step, setStep] = useState(0);
  const [left, setLeft] = useState<ReadonlySet<MeasurementKey>>(new Set());
  const [takenAt, setTakenAt] = useState(props.initialTakenAt ?? todayIso());
  const [notes, setNotes] = useState(props.initialNotes ?? '');
  const [dateError, setDateError] = useState<string | null>(null);
  const swipeStart = useRef<{ x: number; y: number } | null>(null);

  // Texts follow the unit on screen: switching unit re-writes them in the new one.
  const entries = useMemo(() => entriesConvert(typed.entries, typed.unit, unit), [typed, unit]);
  const read = useMemo(() => entriesRead(entries, unit), [entries, unit]);
  const warnings = useMemo(() => measurementWarnings(read.valuesMm, unit), [read, unit]);

  const go = (next: number) => {
    const field = MEASUREMENT_FIELDS[step];
    if (field) setLeft((s) => new Set(s).add(field.key));
    setStep(Math.max(0, Math.min(LAST, next)));
  };
  const goTo = (key: MeasurementKey) => go(MEASUREMENT_FIELDS.findIndex((f) => f.key === key));

  const problems = [
    ...MEASUREMENT_FIELDS.flatMap((f) => (read.errors[f.key] ? [{ key: f.key, message: read.errors[f.key] as string }] : [])),
    ...requiredMissing(entries).map((key) => ({ key, message: `${MEASUREMENT_FIELDS.find((f) => f.key === key)?.label ?? key} is required for a tank top` })),
  ];

  const save = () => {
    setLeft(new Set(MEASUREMENT_FIELDS.map((f) => f.key)));
    const payload = fittingPayload(entries, unit, takenAt, notes, props.initialValuesMm);
    const checked = measurementSetCreateSchema.safeParse(payload);
    const dateIssue = checked.success ? undefined : checked.error.issues.find((i) => i.path[0] === 'takenAt');
    setDateError(dateIssue?.message ?? null);
    if (problems.length > 0 || !checked.success) return;
    onSave(payload);
  };

  // Pins in hand, a stray tap on the menu must not lose a fitting: ask before leaving.
  const typedAnything = Object.values(entries).some((text) => text !== undefined && text.trim() !== '');
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => typedAnything && !saved() && currentLocation.pathname !== nextLocation.pathname,
  );

  const states: FittingStepState[] = MEASUREMENT_FIELDS.map((f) => ({
    filled: read.valuesMm[f.key] !== undefined,
    error: Boolean(read.errors[f.key]) && left.has(f.key),
    warning: warnings.some((w) => w.field === f.key),
  }));
  const field = MEASUREMENT_FIELDS[step];

  return (
    <div className="flex flex-col gap-4" data-testid="fitting-mode">
      <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
        <h1 className="mr-auto text-2xl font-semibold tracking-tight">{title}</h1>
        <div className="flex flex-col gap-1">
          <label htmlFor="fitting-date" className="text-sm font-medium">
            Date taken
          </label>
          <input
            id="fitting-date"
            type="date"
            value={takenAt}
            max={todayIso()}
            onChange={(e) => setTakenAt(e.target.value)}
            aria-invalid={Boolean(dateError) || undefined}
            aria-describedby={dateError ? 'fitting-date-error' : undefined}
            className={`${controlClasses(Boolean(dateError))} num w-44`}
          />
          {dateError && (
            <p id="fitting-date-error" className="text-sm font-medium text-danger">
              {dateError}
            </p>
          )}
        </div>
        {tools}
      </div>
      <FittingProgress fields={MEASUREMENT_FIELDS} states={states} current={step} onGo={go} />
      {field ? (
        <div
          className="grid touch-pan-y gap-6 md:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]"
          onPointerDown={(e) => {
            if (e.pointerType !== 'mouse') swipeStart.current = { x: e.clientX, y: e.clientY };
          }}
          onPointerUp={(e) => {
            const start = swipeStart.current;
            swipeStart.current = null;
            if (!start) return;
            const direction = swipeDirection(e.clientX - start.x, e.clientY - start.y);
            if (direction) go(direction === 'next' ? step + 1 : step - 1);
          }}
          onPointerCancel={() => (swipeStart.current = null)}
        >
          <div className="flex items-center justify-center rounded-xl border border-line bg-panel p-3">
            <BodyDiagram field={field.key} label={field.label} className="w-full" />
          </div>
          <div className="flex flex-col justify-between gap-5 rounded-xl border border-line bg-panel p-5">
            <FittingField
              field={field}
              index={step}
              count={LAST}
              text={entries[field.key] ?? ''}
              unit={unit}
              valueMm={read.valuesMm[field.key]}
              error={read.errors[field.key]}
              showError={left.has(field.key)}
              warnings={warnings.filter((w) => w.field === field.key)}
              previous={previous ? { mm: previous.valuesMm[field.key], takenAt: previous.takenAt, label: previous.label } : null}
              onTextChange={(text) => setTyped({ unit, entries: { ...entries, [field.key]: text } })}
              onNext={() => go(step + 1)}
              onPrevious={() => go(step - 1)}
            />
            <div className="flex gap-3">
              <Button onClick={() => go(step - 1)} disabled={step === 0} className="min-h-14 flex-1 text-lg">
                ← Previous
              </Button>
              <Button variant="primary" onClick={() => go(step + 1)} className="min-h-14 flex-1 text-lg" data-testid="fitting-next">
                {step + 1 < LAST ? 'Next →' : 'Review →'}
              </Button>
            </div>
          </div>
        </div>
      ) : (
        <FittingReview
          valuesMm={read.valuesMm}
          unit={unit}
          previous={previous}
          warnings={warnings}
          problems={problems}
          notes={notes}
          onNotesChange={setNotes}
          onGoTo={goTo}
          onSave={save}
          saving={saving}
          saveLabel={saveLabel}
          saveError={dateError ? `Date taken: ${dateError}` : saveError}
        />
      )}
      <ConfirmDialog
        open={blocker.state === 'blocked'}
        title="Leave without saving?"
        description="The measurements typed in this fitting are not saved yet and will be lost."
        confirmLabel="Leave and lose them"
        tone="danger"
        onConfirm={() => blocker.proceed?.()}
        onCancel={() => blocker.reset?.()}
      />
      <p className="text-sm text-muted">
        Enter or ↓ goes to the next measurement, Shift+Enter or ↑ back; on a tablet, swipe sideways. Type lengths like 36 1/2,
        36.5, 36½, 92 cm or 920 mm.
      </p>
    </div>
  );
}
