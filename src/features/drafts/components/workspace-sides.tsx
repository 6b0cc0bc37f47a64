import { useDeferredValue, useMemo, useState } from 'react';
import type { Draft } from '@shared/engine';
import type { DraftDto } from '@shared/schemas/draft-dto';
import type { ParamsMm } from '@shared/schemas/style';
import type { LengthUnit } from '@shared/units';
import { cx } from '@/components/ui/cx';
import type { Workspace } from '../hooks/use-workspace';
import type { EdgeRef } from '../lib/edge-names';
import { edgeFinishOf, workingValues } from '../lib/live-draft';
import type { ArrangementMode } from '../lib/piece-arrangement';
import { NumbersPanel } from './numbers-panel';
import { ParamPanel } from './param-panel';
import { PatternCanvas } from './pattern-canvas';
import { RevisionsPanel } from './revisions-panel';
import { SectionBoundary } from './section-boundary';

export interface WorkspaceSidesProps {
  draft: DraftDto;
  ws: Workspace;
  unit: LengthUnit;
  editable: boolean;
  shownDraft: Draft | null;
  viewing: number | null;
  /** The viewed revision's values, shown read-only in the parameters. */
  viewedParams: ParamsMm | null;
  onView: (rev: number | null) => void;
  onRestore: (rev: number) => void;
  restoring: number | null;
  mode: ArrangementMode;
  onModeChange: (mode: ArrangementMode) => void;
  highlight: EdgeRef | null;
  onHighlight: (edge: EdgeRef | null) => void;
}

type Tab = 'numbers' | 'revisions';

const NO_PROBLEMS: Record<string, string> = {};

/** Parameters on the left, the drawing in the middle, figures and revisions on the right. */
export function WorkspaceSides(props: WorkspaceSidesProps) {
  const { draft, ws, unit, editable, shownDraft, viewing, onView, onRestore, restoring, mode, onModeChange, highlight, onHighlight } = props;
  const [tab, setTab] = useState<Tab>('numbers');
  // The drawing redraws in the frame of the drag; the figures follow in the next idle moment.
  const figuresDraft = useDeferredValue(shownDraft);
  const panelParams = props.viewedParams ?? ws.params;
  const working = useMemo(() => (viewing === null ? ws.working : workingValues(ws.parts, panelParams)), [viewing, ws.working, ws.parts, panelParams]);
  const caption = viewing !== null ? `Revision ${viewing}` : !ws.valid ? 'Showing the last values that drafted cleanly: correct the value marked in red.' : undefined;

  return (
    <div className="grid min-h-0 flex-1 gap-3 lg:grid-cols-[minmax(236px,272px)_minmax(0,1fr)_minmax(256px,300px)]">
      <aside aria-labelledby="params-heading" className="min-h-0 overflow-y-auto rounded-xl border border-line bg-panel lg:order-none">
        <h2 id="params-heading" className="sticky top-0 z-10 border-b border-line bg-panel px-3 py-2.5 text-base font-semibold">
          Parameters <span className="text-sm font-normal text-muted">· {unit === 'in' ? 'inches' : 'centimetres'}</span>
        </h2>
        <ParamPanel
          parts={ws.parts}
          params={panelParams}
          working={working}
          defaults={ws.defaults}
          edgeFinish={edgeFinishOf(ws.parts, panelParams)}
          unit={unit}
          readOnly={!editable}
          problems={viewing === null ? ws.problems : NO_PROBLEMS}
          onChange={ws.setParam}
          onEdgeFinish={ws.setEdgeFinish}
          onCommit={ws.commit}
        />
      </aside>
      <div className="order-first h-[62vh] min-h-[420px] lg:order-none lg:h-auto lg:min-h-0">
        <SectionBoundary name="The pattern drawing" resetKey={shownDraft}>
          {shownDraft ? (
            <PatternCanvas
              draft={shownDraft}
              unit={unit}
              mode={mode}
              onModeChange={onModeChange}
              highlight={highlight}
              onHighlight={onHighlight}
              fitKey={`${draft.id}:${viewing ?? 'current'}`}
              caption={caption}
            />
          ) : (
            <p role="status" className="rounded-xl border border-line bg-panel p-6 text-muted">
              {viewing !== null ? 'Loading the revision…' : 'These values cannot be drafted yet: correct the values marked in red.'}
            </p>
          )}
        </SectionBoundary>
      </div>
      <aside aria-label="Figures and revisions" className="flex min-h-0 flex-col overflow-hidden rounded-xl border border-line bg-panel">
        <div role="tablist" aria-label="Right panel" className="flex border-b border-line">
          {(['numbers', 'revisions'] as const).map((t) => (
            <button
              key={t}
              type="button"
              role="tab"
              id={`tab-${t}`}
              aria-selected={tab === t}
              aria-controls={`tabpanel-${t}`}
              onClick={() => setTab(t)}
              className={cx(
                'min-h-touch flex-1 border-b-2 px-3 text-sm font-semibold',
                tab === t ? 'border-accent text-accent-strong' : 'border-transparent text-muted hover:text-ink',
              )}
            >
              {t === 'numbers' ? 'Figures' : 'Revisions'}
            </button>
          ))}
        </div>
        <div id={`tabpanel-${tab}`} role="tabpanel" aria-labelledby={`tab-${tab}`} className="min-h-0 flex-1 overflow-y-auto">
          {tab === 'numbers' ? (
            figuresDraft && (
              <SectionBoundary name="The figures" resetKey={figuresDraft}>
                <NumbersPanel draft={figuresDraft} unit={unit} highlight={highlight} onHighlight={onHighlight} />
              </SectionBoundary>
            )
          ) : (
            <RevisionsPanel
              draftId={draft.id}
              current={draft.revision}
              unit={unit}
              viewing={viewing}
              canRestore={draft.editable}
              restoring={restoring}
              onView={onView}
              onRestore={onRestore}
            />
          )}
        </div>
      </aside>
    </div>
  );
}
