import { lengthFormat, type LengthUnit } from '@shared/units';
import { negativeEaseRecommend, patternGirthForStretch, type Recovery } from '@shared/schemas/fabric';
import { Card } from '@/components/ui/card';
import { percentFormat } from '../lib/stretch-test';

interface EaseRecommendationProps {
  stretchPct: number | null;
  recovery: Recovery | null;
  unit: LengthUnit;
}

/**
 * Bust girths for the worked example: the EN 13402-3 example body's 88 cm, or a round 36 in
 * for a studio working in inches.
 */
export const EXAMPLE_BUST_MM = { cm: 880, in: 914.4 } as const;

/** The negative ease that suits the knit, with each step of the reasoning and a worked example. */
export function EaseRecommendation({ stretchPct, recovery, unit }: EaseRecommendationProps) {
  if (stretchPct === null || recovery === null || !Number.isFinite(stretchPct) || stretchPct < 0) {
    return (
      <Card title="Recommended negative ease">
        <p className="text-muted">Enter the crosswise stretch and the recovery to see the negative ease that suits this knit.</p>
      </Card>
    );
  }
  const r = negativeEaseRecommend(stretchPct, recovery);
  const bustMm = unit === 'in' ? EXAMPLE_BUST_MM.in : EXAMPLE_BUST_MM.cm;
  const patternMm = patternGirthForStretch(bustMm, r.wornStretchPct);
  return (
    <Card title="Recommended negative ease" description="For a fitted top drafted from the bust girth.">
      <p className="num text-4xl font-semibold" data-testid="ease-result">
        {r.stable ? 'No negative ease' : `−${percentFormat(r.negativeEasePct)} %`}
      </p>
      <p className="mt-1 text-muted">
        {r.stable
          ? 'Draft it like a woven, with positive ease.'
          : `Cut the bust at ${r.patternGirthFactor.toFixed(3)} × the body girth (worn at ${percentFormat(r.wornStretchPct)} % stretch).`}
      </p>
      <h3 className="mt-5 text-sm font-semibold">How this is worked out</h3>
      <ol className="mt-2 list-decimal space-y-1 pl-5 text-sm">
        {r.reasoning.map((step) => (
          <li key={step}>{step}</li>
        ))}
      </ol>
      <p className="mt-4 rounded-lg bg-surface p-3 text-sm">
        Example: a bust girth of <span className="num font-semibold">{lengthFormat(bustMm, unit)}</span> is cut at{' '}
        <span className="num font-semibold">{lengthFormat(patternMm, unit)}</span>
        {r.stable ? ' before ease is added.' : '.'}
      </p>
    </Card>
  );
}
