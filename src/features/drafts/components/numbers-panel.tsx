import { memo } from 'react';
import type { Draft } from '@shared/engine';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { FOLD_LABELS, percentText, signedLength } from '../lib/figures';
import type { EdgeRef } from '../lib/edge-names';
import { BigFigure } from './big-figure';
import { BindingsList } from './bindings-list';
import { EdgeTable } from './edge-table';
import { FoldLayoutMini } from './fold-layout-mini';
import { StretchGauge } from './stretch-gauge';

export interface NumbersPanelProps {
  draft: Draft;
  unit: LengthUnit;
  highlight: EdgeRef | null;
  onHighlight: (edge: EdgeRef | null) => void;
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section aria-label={title} className="border-b border-line/70 px-3 py-3 last:border-b-0">
      <h3 className="mb-2 text-xs font-semibold tracking-wide text-muted uppercase">{title}</h3>
      {children}
    </section>
  );
}

/** Every figure that matters beside the drawing, recomputed with it. */
export const NumbersPanel = memo(function NumbersPanel({ draft, unit, highlight, onHighlight }: NumbersPanelProps) {
  const { finished, layout, warnings } = draft;
  const body = (finishedMm: number, easeMm: number) => finishedMm - easeMm;
  return (
    <div data-testid="draft-numbers">
      {warnings.length > 0 && (
        <Section title="Warnings">
          <ul className="space-y-2" data-testid="draft-warnings">
            {warnings.map((w) => (
              <li key={`${w.code}-${w.field ?? ''}`} className="flex gap-2 rounded-lg border border-warn/40 bg-[#fbf5e9] p-2 text-sm text-ink">
                <span aria-hidden="true" className="font-bold text-warn">
                  !
                </span>
                <span>{w.message}</span>
              </li>
            ))}
          </ul>
        </Section>
      )}
      <Section title="Finished garment">
        <dl className="grid grid-cols-2 gap-x-3 gap-y-3">
          <BigFigure
            label="Bust"
            testId="finished-bust"
            value={lengthFormat(finished.bust, unit)}
            detail={
              <>
                body {lengthFormat(body(finished.bust, finished.bustEase.mm), unit)}
                <br />
                ease <span data-testid="bust-ease">{signedLength(finished.bustEase.mm, unit)}</span> · {percentText(finished.bustEase.percent)}
              </>
            }
          />
          <BigFigure
            label="Hip"
            testId="finished-hip"
            value={lengthFormat(finished.hip, unit)}
            detail={
              <>
                body {lengthFormat(body(finished.hip, finished.hipEase.mm), unit)}
                <br />
                ease {signedLength(finished.hipEase.mm, unit)} · {percentText(finished.hipEase.percent)}
              </>
            }
          />
          {finished.waist !== null && finished.waistEase && (
            <BigFigure
              label="Waist"
              value={lengthFormat(finished.waist, unit)}
              detail={`ease ${signedLength(finished.waistEase.mm, unit)} · ${percentText(finished.waistEase.percent)}`}
            />
          )}
          <BigFigure label="Length" testId="finished-length" value={lengthFormat(finished.length, unit)} detail="shoulder to hem at the fold" />
        </dl>
      </Section>
      <Section title="Stretch when worn">
        <div className="space-y-3">
          <StretchGauge label="At the bust" needed={finished.stretchNeeded} fabric={finished.fabricStretch} />
          {finished.hipStretchNeeded > 0 && <StretchGauge label="At the hip" needed={finished.hipStretchNeeded} fabric={finished.fabricStretch} />}
        </div>
      </Section>
      <Section title="Openings and binding strips">
        <BindingsList bindings={draft.bindings} unit={unit} />
      </Section>
      <Section title="Fabric needed">
        <p className="num text-2xl font-semibold text-ink" data-testid="fabric-needed">
          {lengthFormat(layout.lengthNeeded, unit)}
        </p>
        <p className="text-sm text-muted">
          {FOLD_LABELS[layout.fold]} · {layout.layers} layers · {lengthFormat(layout.widthUsed, unit)} of width
          {layout.fabricWidth !== null && <> of {lengthFormat(layout.fabricWidth, unit)}</>}
        </p>
        <div className="mt-2">
          <FoldLayoutMini layout={layout} pieces={draft.pieces} unit={unit} />
        </div>
      </Section>
      <Section title="Edge lengths (stitching line)">
        <EdgeTable pieces={draft.pieces} unit={unit} highlight={highlight} onHighlight={onHighlight} />
      </Section>
    </div>
  );
});
