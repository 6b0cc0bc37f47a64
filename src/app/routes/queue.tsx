import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams } from 'react-router';
import type { DraftState, DraftStateChange } from '@shared/schemas/draft';
import type { QueueItemDto } from '@shared/schemas/draft-dto';
import { Alert } from '@/components/ui/alert';
import { cx } from '@/components/ui/cx';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useMoveDraft } from '@/features/drafts/api/move-draft';
import { DraftMoveDialog } from '@/features/drafts/components/draft-move-dialog';
import { useFabrics } from '@/features/fabrics/api/get-fabrics';
import { useMember } from '@/features/auth/hooks/use-member';
import { PrintButton } from '@/features/printing/components/print-button';
import { queueQueryOptions, useQueue } from '@/features/queue/api/get-queue';
import { queueKeys, type QueueState } from '@/features/queue/api/queue-keys';
import { QueueTable } from '@/features/queue/components/queue-table';
import { UnitSwitch } from '@/features/units/components/unit-switch';
import { ApiError } from '@/lib/api-client';
import { queryClient as appQueryClient } from '@/lib/query-client';
import { useDisplayUnit } from '@/lib/unit';

const TABS: { state: QueueState; label: string; next: DraftState; action: string; empty: string }[] = [
  {
    state: 'approved',
    label: 'To cut',
    next: 'cut',
    action: 'Mark cut…',
    empty: 'Nothing is waiting to be cut. Drafts appear here as soon as the owner approves them.',
  },
  { state: 'cut', label: 'To sew', next: 'sewn', action: 'Mark sewn…', empty: 'Nothing cut is waiting to be sewn.' },
  { state: 'sewn', label: 'To deliver', next: 'delivered', action: 'Mark delivered…', empty: 'Nothing sewn is waiting to go to its client.' },
];

function queueState(raw: string | null): QueueState {
  return raw === 'cut' || raw === 'sewn' ? raw : 'approved';
}

export async function queueLoader({ request }: { request: Request }) {
  const state = queueState(new URL(request.url).searchParams.get('state'));
  await appQueryClient.ensureQueryData(queueQueryOptions(state));
  return null;
}

function todayIso(): string {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/** The work queue: approved drafts waiting to be cut, oldest first, then cut and sewn ones. */
export function QueueRoute() {
  const [search, setSearch] = useSearchParams();
  const state = queueState(search.get('state'));
  const tab = TABS.find((t) => t.state === state) ?? TABS[0]!;
  const unit = useDisplayUnit();
  const queue = useQueue(state);
  const fabrics = useFabrics({ sort: 'name', order: 'asc', pageSize: 100 });
  const queryClient = useQueryClient();
  const [acting, setActing] = useState<QueueItemDto | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const move = useMoveDraft();
  const { studio } = useMember();

  const confirm = async (change: DraftStateChange) => {
    if (!acting) return;
    setError(null);
    try {
      await move.mutateAsync({ id: acting.id, ...change });
      await queryClient.invalidateQueries({ queryKey: queueKeys.all });
      setDone(`${acting.client.name}, ${acting.style.name}: ${tab.action.replace('Mark ', 'marked ').replace('…', '')}.`);
      setActing(null);
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) {
        await queryClient.invalidateQueries({ queryKey: queueKeys.all });
        setError('Someone moved this draft on meanwhile; the list has been refreshed.');
      } else setError(e instanceof ApiError ? [e.message, ...Object.values(e.fields)].join(' ') : 'Something went wrong. Try again.');
    }
  };

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="Work queue"
        description="Approved drafts waiting to be cut, oldest first. Open one to see its pieces and figures; print its pattern and ticket from there."
        actions={<UnitSwitch />}
      />
      <div role="tablist" aria-label="Queue" className="flex gap-1 border-b border-line">
        {TABS.map((t) => (
          <button
            key={t.state}
            type="button"
            role="tab"
            aria-selected={t.state === state}
            aria-controls="queue-panel"
            onClick={() => {
              setDone(null);
              setSearch(t.state === 'approved' ? {} : { state: t.state });
            }}
            className={cx(
              'min-h-touch border-b-2 px-4 text-sm font-semibold',
              t.state === state ? 'border-accent text-accent-strong' : 'border-transparent text-muted hover:text-ink',
            )}
          >
            {t.label}
          </button>
        ))}
      </div>
      <section id="queue-panel" role="tabpanel" aria-label={tab.label} className="flex flex-col gap-4">
        {done && <Alert tone="success">{done}</Alert>}
        {queue.isPending && <LoadingState>Loading the queue…</LoadingState>}
        {queue.isError && <Alert tone="error" title="The queue could not be loaded">{queue.error.message}</Alert>}
        {queue.data && queue.data.length === 0 && <p className="rounded-xl border border-line bg-panel p-6 text-muted">{tab.empty}</p>}
        {queue.data && queue.data.length > 0 && (
          <QueueTable
            items={queue.data}
            state={state}
            unit={unit}
            openHref={paths.draft.href}
            actionLabel={tab.action}
            onAction={(item) => {
              setError(null);
              setActing(item);
            }}
            today={todayIso()}
            rowActions={(item) => (
              <PrintButton draftId={item.id} studio={studio} ariaLabel={`Print ${item.client.name}, ${item.style.name}`} />
            )}
          />
        )}
      </section>
      <DraftMoveDialog
        key={acting ? `${acting.id}-${acting.version}` : 'closed'}
        to={acting ? tab.next : null}
        version={acting?.version ?? 0}
        subject={acting ? `${acting.client.name} — ${acting.style.name}` : ''}
        fabrics={fabrics.data?.items.map((f) => ({ id: f.id, name: f.name })) ?? []}
        defaultFabricId={acting?.fabric.id}
        pending={move.isPending}
        error={error}
        onConfirm={(change) => void confirm(change)}
        onCancel={() => setActing(null)}
      />
    </div>
  );
}
