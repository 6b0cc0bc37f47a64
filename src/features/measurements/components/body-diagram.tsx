import { useMemo } from 'react';
import { BACK_OFFSET, FIGURE_MARKS, FIGURE_VIEWBOX, figureOutlinePaths, markEnds, markPaths } from '../lib/body-figure';

interface BodyDiagramProps {
  /** The measurement key to highlight. */
  field: string;
  /** What the mark shows, read out by screen readers. */
  label: string;
  className?: string;
}

const HEAD = { cx: 100, cy: 24, rx: 15, ry: 19 };
/** The figures leave this much blank at each side of the drawing: crop it so they draw larger. */
const VIEW_LEFT = 28;

/** A front and a back view of the body with the tape of one measurement drawn on it. */
export function BodyDiagram({ field, label, className }: BodyDiagramProps) {
  const outline = useMemo(() => figureOutlinePaths(), []);
  const mark = FIGURE_MARKS[field];
  const paths = mark ? markPaths(mark) : null;
  const ends = mark ? markEnds(mark) : [];
  return (
    <figure className={className}>
      <svg
        viewBox={`${VIEW_LEFT} 0 ${FIGURE_VIEWBOX.width - 2 * VIEW_LEFT} ${FIGURE_VIEWBOX.height}`}
        role="img"
        aria-label={`Where to measure: ${label}`}
        className="h-auto w-full"
        data-testid="body-diagram"
        data-field={field}
      >
        <g fill="#ffffff" stroke="#8c8f8a" strokeWidth={1.5} strokeLinejoin="round">
          <path d={outline.front} />
          <path d={outline.back} />
          <ellipse {...HEAD} />
          <ellipse {...HEAD} cx={HEAD.cx + BACK_OFFSET} />
        </g>
        <g fill="none" stroke="#c4c1b9" strokeWidth={1} strokeLinecap="round">
          {/* Front: the bust curves and centre front; back: the spine and shoulder blades. */}
          <path d="M76 118 Q87 128 98 119 M102 119 Q113 128 124 118" />
          <path d="M100 60 L100 222" strokeDasharray="3 4" />
          <path d={`M${BACK_OFFSET + 100} 48 L${BACK_OFFSET + 100} 200`} />
          <path
            d={`M${BACK_OFFSET + 80} 82 Q${BACK_OFFSET + 84} 98 ${BACK_OFFSET + 92} 104 M${BACK_OFFSET + 120} 82 Q${BACK_OFFSET + 116} 98 ${BACK_OFFSET + 108} 104`}
          />
        </g>
        {paths && (
          <g fill="none" stroke="#1f6f66" strokeLinecap="round" data-testid="diagram-mark">
            {paths.hidden && <path d={paths.hidden} strokeWidth={2} strokeDasharray="3 4" opacity={0.6} />}
            <path d={paths.solid} strokeWidth={3.5} />
            {ends.map(([x, y]) => (
              <circle key={`${x}-${y}`} cx={x} cy={y} r={3.5} fill="#1f6f66" stroke="none" />
            ))}
          </g>
        )}
        <g fill="#5d605c" fontSize={13} fontWeight={600} textAnchor="middle" fontFamily="Inter, system-ui, sans-serif">
          <text x={100} y={278}>
            Front
          </text>
          <text x={BACK_OFFSET + 100} y={278}>
            Back
          </text>
        </g>
      </svg>
      {mark && (
        <figcaption className="mt-2 text-center text-sm text-muted">
          {mark.kind === 'girth'
            ? 'The tape goes round the body: solid in front, dashed behind.'
            : 'The tape runs from one dot to the other.'}
        </figcaption>
      )}
    </figure>
  );
}
