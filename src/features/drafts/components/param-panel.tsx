import { memo } from 'react';
import type { DraftInputParts } from '@shared/schemas/draft-input-build';
import type { ParamsMm } from '@shared/schemas/style';
import type { LengthUnit } from '@shared/units';
import { controlClasses } from '@/components/ui/field';
import { correctionFor, type WorkingValues } from '../lib/live-draft';
import { PARAM_GROUPS, type NumericParamKey } from '../lib/param-fields';
import { ParamControl } from './param-control';

export interface ParamPanelProps {
  parts: DraftInputParts;
  params: ParamsMm;
  working: WorkingValues;
  defaults: WorkingValues;
  edgeFinish: 'tape' | 'band';
  unit: LengthUnit;
  readOnly: boolean;
  /** The engine's field errors by dotted path ("params.frontNeckDepth"). */
  problems: Record<string, string>;
  onChange: (key: NumericParamKey, working: number | undefined) => void;
  onEdgeFinish: (finish: 'tape' | 'band') => void;
  onCommit: () => void;
}

/** The style's parameters, grouped as a maker works down the piece. */
export const ParamPanel = memo(function ParamPanel({
  parts,
  params,
  working,
  defaults,
  edgeFinish,
  unit,
  readOnly,
  problems,
  onChange,
  onEdgeFinish,
  onCommit,
}: ParamPanelProps) {
  return (
    <div className="px-3 pb-4">
      {PARAM_GROUPS.map((group) => (
        <section key={group.title} aria-labelledby={`param-group-${group.title}`} className="pt-3">
          <h3 id={`param-group-${group.title}`} className="text-xs font-semibold tracking-wide text-muted uppercase">
            {group.title}
          </h3>
          {group.title === 'Edge finish' && (
            <div className="pt-2">
              <label htmlFor="param-edge-finish" className="text-sm font-medium text-ink">
                Finish
              </label>
              <select
                id="param-edge-finish"
                value={edgeFinish}
                disabled={readOnly}
                onChange={(e) => {
                  onEdgeFinish(e.target.value === 'band' ? 'band' : 'tape');
                  onCommit();
                }}
                className={controlClasses(false)}
              >
                <option value="tape">Knit binding tape</option>
                <option value="band">Self-fabric band</option>
              </select>
            </div>
          )}
          {group.fields.map((field) => {
            const value = working[field.key];
            if (value === null) return null;
            if (field.key === 'racerBackInset' && !parts.style.racerBack) return null;
            return (
              <ParamControl
                key={field.key}
                field={field}
                working={value}
                fallback={defaults[field.key]}
                own={params[field.key] !== undefined}
                unit={unit}
                correction={correctionFor(parts, field.key)}
                problem={problems[field.path]}
                readOnly={readOnly}
                onChange={onChange}
                onCommit={onCommit}
              />
            );
          })}
        </section>
      ))}
    </div>
  );
});
