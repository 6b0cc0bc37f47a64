import { percentText } from '../lib/figures';

export interface StretchGaugeProps {
  label: string;
  needed: number;
  fabric: number;
}

/**
 * The stretch a girth needs when worn against what the fabric gives. The bar is a reading aid;
 * the words say whether it is enough, so colour is never the only sign.
 */
export function StretchGauge({ label, needed, fabric }: StretchGaugeProps) {
  const enough = needed <= fabric + 1e-9;
  const top = Math.max(fabric, needed, 1) * 1.15;
  return (
    <div>
      <p className="flex items-baseline justify-between gap-2 text-sm">
        <span className="font-medium text-ink">{label}</span>
        <span className="num text-muted">
          needs <span className="font-semibold text-ink">{percentText(needed, false)}</span> of {percentText(fabric, false)}
        </span>
      </p>
      <div className="relative mt-1 h-2.5 rounded-full bg-surface" aria-hidden="true">
        <div className="absolute inset-y-0 left-0 rounded-full bg-line" style={{ width: `${(fabric / top) * 100}%` }} />
        <div
          className={`absolute inset-y-0 left-0 rounded-full ${enough ? 'bg-ink/70' : 'bg-danger'}`}
          style={{ width: `${(needed / top) * 100}%` }}
        />
      </div>
      <p className={`mt-1 text-xs font-medium ${enough ? 'text-muted' : 'text-danger'}`}>
        {enough ? 'The fabric gives enough stretch.' : 'More than the fabric gives: ease off, or choose a stretchier knit.'}
      </p>
    </div>
  );
}
