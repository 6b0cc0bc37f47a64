import type { DraftDto } from '@shared/schemas/draft-dto';
import { Alert } from '@/components/ui/alert';

function figure(value: number | string | null): string {
  if (value === null) return 'none';
  return typeof value === 'number' ? String(Math.round(value * 10) / 10) : value;
}

/**
 * An approved draft keeps the engine version it was approved with. When today's engine would
 * draw it differently the workspace says so, with the figures that moved.
 */
export function EngineCheckNote({ draft }: { draft: DraftDto }) {
  const check = draft.engineCheck;
  if (!check.drawsDifferently) return null;
  const kept = draft.approved?.engineVersion ?? check.storedVersion;
  const title =
    kept === check.currentVersion
      ? `The saved figures differ from what engine ${kept} gives now`
      : `Drafted with engine ${kept}; the current engine (${check.currentVersion}) draws it differently`;
  return (
    <Alert tone="warn" title={title}>
      <p>
        The saved figures and the ticket keep version {kept}. The drawing here comes from the current engine: check it before cutting, or reopen
        and save to adopt the new figures.
      </p>
      {check.differences.length > 0 && (
        <ul className="num mt-1 list-disc pl-5 text-xs">
          {check.differences.slice(0, 6).map((d) => (
            <li key={d.path}>
              {d.path}: {figure(d.stored)} → {figure(d.current)}
            </li>
          ))}
        </ul>
      )}
    </Alert>
  );
}
