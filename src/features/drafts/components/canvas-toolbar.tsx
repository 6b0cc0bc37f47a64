import { cx } from '@/components/ui/cx';
import type { ArrangementMode } from '../lib/piece-arrangement';

export interface CanvasToolbarProps {
  mode: ArrangementMode;
  onModeChange: (mode: ArrangementMode) => void;
  onZoomIn: () => void;
  onZoomOut: () => void;
  onFit: () => void;
}

const MODES: { value: ArrangementMode; label: string }[] = [
  { value: 'side-by-side', label: 'Side by side' },
  { value: 'overlaid', label: 'Overlaid' },
];

const toolClasses =
  'inline-flex min-h-touch min-w-touch items-center justify-center rounded-lg border border-line bg-panel px-2.5 text-sm font-medium hover:bg-surface';

/** View controls of the canvas: arrangement of front and back, zoom and fit. */
export function CanvasToolbar({ mode, onModeChange, onZoomIn, onZoomOut, onFit }: CanvasToolbarProps) {
  return (
    <div className="flex flex-wrap items-center gap-2 border-b border-line px-2 py-1.5">
      <div role="radiogroup" aria-label="Show front and back" className="flex rounded-lg border border-line p-0.5">
        {MODES.map((m) => (
          <button
            key={m.value}
            type="button"
            role="radio"
            aria-checked={mode === m.value}
            title={m.value === 'overlaid' ? 'Front over back, matched at the shoulder' : 'Front and back next to each other'}
            onClick={() => onModeChange(m.value)}
            className={cx(
              'min-h-[40px] rounded-md px-3 text-sm font-medium',
              mode === m.value ? 'bg-accent-soft text-accent-strong' : 'text-muted hover:bg-surface hover:text-ink',
            )}
          >
            {m.label}
          </button>
        ))}
      </div>
      <div className="ml-auto flex gap-1" role="group" aria-label="Zoom">
        <button type="button" className={toolClasses} onClick={onZoomOut} aria-label="Zoom out">
          <span aria-hidden="true" className="text-lg leading-none">−</span>
        </button>
        <button type="button" className={toolClasses} onClick={onZoomIn} aria-label="Zoom in">
          <span aria-hidden="true" className="text-lg leading-none">+</span>
        </button>
        <button type="button" className={toolClasses} onClick={onFit}>
          Fit
        </button>
      </div>
    </div>
  );
}
