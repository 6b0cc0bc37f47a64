import { useId, useState } from 'react';
import type { LengthUnit } from '@shared/units';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { TextField } from '@/components/ui/text-field';
import { percentFormat, stretchTestRead } from '../lib/stretch-test';

interface StretchTestProps {
  unit: LengthUnit;
  /** Puts the result into the fabric's crosswise or lengthwise stretch (owners only). */
  onUse?: (direction: 'crosswise' | 'lengthwise', percent: number) => void;
}

/** Relaxed and stretched length of a marked length → stretch percent, with how to test. */
export function StretchTest({ unit, onUse }: StretchTestProps) {
  const [relaxed, setRelaxed] = useState(unit === 'in' ? '4' : '10');
  const [stretched, setStretched] = useState('');
  const resultId = useId();
  const result = stretchTestRead(relaxed, stretched, unit);
  const typed = relaxed.trim() !== '' && stretched.trim() !== '';
  const percent = result.ok ? Number(percentFormat(result.percent)) : null;

  return (
    <Card title="Stretch test" description="Works out the stretch percent from a marked length pulled gently.">
      <ol className="mb-5 list-decimal space-y-1 pl-5 text-sm text-ink">
        <li>Fold the knit and mark {unit === 'in' ? '4 in' : '10 cm'} across the grain.</li>
        <li>Hold it against a ruler and pull gently to the point of resistance, not as far as it will go.</li>
        <li>Read the stretched length; repeat two or three times and use a typical reading.</li>
        <li>For a four-way knit, test lengthwise too. Let go: a knit with good recovery returns to its mark.</li>
      </ol>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Relaxed length"
          value={relaxed}
          onChange={(e) => setRelaxed(e.target.value)}
          suffix={unit}
          inputMode="decimal"
          inputClassName="num text-lg"
          error={typed && !result.ok ? result.errors.relaxed : undefined}
        />
        <TextField
          label="Stretched length"
          value={stretched}
          onChange={(e) => setStretched(e.target.value)}
          suffix={unit}
          inputMode="decimal"
          inputClassName="num text-lg"
          error={typed && !result.ok ? result.errors.stretched : undefined}
          placeholder={unit === 'in' ? 'e.g. 5' : 'e.g. 15'}
          data-testid="stretch-stretched"
        />
      </div>
      <div id={resultId} aria-live="polite" className="mt-5 rounded-lg bg-surface p-4">
        {percent !== null ? (
          <>
            <p className="text-sm text-muted">Stretch = (stretched − relaxed) ÷ relaxed × 100</p>
            <p className="num mt-1 text-4xl font-semibold" data-testid="stretch-result">
              {percentFormat(result.ok ? result.percent : 0)} %
            </p>
            {onUse && (
              <div className="mt-3 flex flex-wrap gap-2">
                <Button compact onClick={() => onUse('crosswise', percent)}>
                  Use as crosswise stretch
                </Button>
                <Button compact onClick={() => onUse('lengthwise', percent)}>
                  Use as lengthwise stretch
                </Button>
              </div>
            )}
          </>
        ) : (
          <p className="text-muted">Type both lengths to see the stretch percent.</p>
        )}
      </div>
    </Card>
  );
}
