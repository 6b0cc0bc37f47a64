import { memo, useId, useState, type ChangeEvent, type KeyboardEvent } from 'react';
import type { LengthUnit } from '@shared/units';
import { cx } from '@/components/ui/cx';
import type { ParamField } from '../lib/param-fields';
import {
  fieldUnit,
  paramParse,
  sliderBounds,
  sliderValue,
  workingFormat,
  workingFromSlider,
} from '../lib/param-value';
import { paramInputMark } from '../lib/perf-marks';

export interface ParamControlProps {
  field: ParamField;
  /** The value in effect: mm, percent or ratio. */
  working: number;
  /** The value a reset gives (the style's or the engine's default). */
  fallback: number | null;
  /** True when the draft holds its own value (so a reset means something). */
  own: boolean;
  unit: LengthUnit;
  /** The block's correction to this parameter, already in working units, or 0. */
  correction: number;
  /** The engine's complaint about this field, if any. */
  problem?: string;
  readOnly: boolean;
  onChange: (key: ParamField['key'], working: number | undefined) => void;
  /** The end of a drag or of typing: the next change is a new undo step. */
  onCommit: () => void;
}

function signed(text: string, value: number): string {
  return value > 0 ? `+${text}` : text.startsWith('−') || text.startsWith('-') ? text : `−${text}`;
}

/** One parameter: a slider across the trade's range and a typed field in the studio's unit. */
export const ParamControl = memo(function ParamControl({
  field,
  working,
  fallback,
  own,
  unit,
  correction,
  problem,
  readOnly,
  onChange,
  onCommit,
}: ParamControlProps) {
  const id = useId();
  const [draftText, setDraftText] = useState<string | null>(null);
  const [typedError, setTypedError] = useState<string | null>(null);
  const [showTypedError, setShowTypedError] = useState(false);
  const bounds = sliderBounds(field, unit);
  const suffix = fieldUnit(field, unit);
  const shown = workingFormat(field, working, unit);
  const text = draftText ?? shown;
  const error = (showTypedError && typedError) || problem;
  const errorId = `${id}-error`;
  const noteId = `${id}-note`;
  const fmt = (v: number) => `${workingFormat(field, v, unit)}${field.kind === 'ratio' ? '' : ` ${suffix}`}`;

  const onSlide = (e: ChangeEvent<HTMLInputElement>) => {
    paramInputMark(e.timeStamp);
    setDraftText(null);
    setTypedError(null);
    onChange(field.key, workingFromSlider(field, Number(e.target.value), unit));
  };

  const onType = (e: ChangeEvent<HTMLInputElement>) => {
    const value = e.target.value;
    setDraftText(value);
    const read = paramParse(field, value, unit, 'mm');
    if (read.ok) {
      paramInputMark(e.timeStamp);
      setTypedError(null);
      setShowTypedError(false);
      onChange(field.key, read.working);
    } else {
      setTypedError(read.message);
    }
  };

  const settle = () => {
    if (typedError) setShowTypedError(true);
    else setDraftText(null);
    onCommit();
  };

  const onKey = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') settle();
    if (e.key === 'Escape') {
      setDraftText(null);
      setTypedError(null);
      setShowTypedError(false);
    }
  };

  const correctionText =
    correction !== 0 ? `Block correction ${signed(workingFormat(field, Math.abs(correction), unit), correction)}${field.kind === 'ratio' ? '' : ` ${suffix}`}: drafted at ${fmt(working + correction)}` : null;

  return (
    <div className="border-b border-line/70 py-3 last:border-b-0" data-param={field.key}>
      <div className="flex items-center gap-2">
        <label htmlFor={`${id}-text`} id={`${id}-label`} className="min-w-0 flex-1 text-sm font-medium text-ink">
          {field.label}
        </label>
        <input
          id={`${id}-text`}
          type="text"
          inputMode="text"
          autoComplete="off"
          spellCheck={false}
          value={text}
          readOnly={readOnly}
          onChange={onType}
          onBlur={settle}
          onKeyDown={onKey}
          aria-invalid={error ? true : undefined}
          aria-describedby={cx(noteId, error && errorId) || undefined}
          className={cx(
            'num min-h-touch w-[5.5rem] rounded-lg border bg-panel px-2 text-right text-base text-ink',
            'read-only:bg-surface read-only:text-muted',
            error ? 'border-danger' : 'border-line hover:border-muted',
          )}
        />
        <span className="w-5 shrink-0 text-sm text-muted">{suffix}</span>
      </div>
      <input
        type="range"
        min={bounds.min}
        max={bounds.max}
        step={bounds.step}
        value={Math.min(bounds.max, Math.max(bounds.min, sliderValue(field, working, unit)))}
        disabled={readOnly}
        onChange={onSlide}
        onPointerUp={onCommit}
        onKeyUp={onCommit}
        aria-labelledby={`${id}-label`}
        aria-valuetext={fmt(working)}
        aria-describedby={noteId}
        className="mt-2 h-7 w-full cursor-pointer accent-[#1f6f66] disabled:cursor-not-allowed disabled:opacity-60"
      />
      <p id={noteId} className="mt-0.5 flex flex-wrap items-baseline gap-x-2 text-xs text-muted">
        <span className="num">
          {fmt(workingFromSlider(field, bounds.min, unit))} to {fmt(workingFromSlider(field, bounds.max, unit))}
        </span>
        {fallback !== null && <span className="num">default {fmt(fallback)}</span>}
        {own && !readOnly && fallback !== null && (
          <button
            type="button"
            onClick={() => {
              setDraftText(null);
              setTypedError(null);
              onChange(field.key, undefined);
              onCommit();
            }}
            className="ml-auto min-h-[32px] rounded px-1.5 font-medium text-accent-strong underline-offset-2 hover:underline"
            aria-label={`Reset ${field.label.toLowerCase()} to its default`}
          >
            Reset
          </button>
        )}
      </p>
      {correctionText && <p className="num mt-1 text-xs font-medium text-ink">{correctionText}</p>}
      {error && (
        <p id={errorId} role="alert" className="mt-1 text-sm font-medium text-danger">
          {error}
        </p>
      )}
    </div>
  );
});
