import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { useDraftDeliveries } from '../api/get-draft-deliveries';
import { DELIVERY_KIND_LABEL, DELIVERY_STATUS_LABEL, dateTime } from '../lib/mail-words';

export interface DraftDeliveriesProps {
  draftId: number;
  /** Whether the list may be read now (owners, while the dialog is open). */
  enabled: boolean;
}

/** What was e-mailed from this draft: the document, to whom, when, and whether it went (owners). */
export function DraftDeliveries({ draftId, enabled }: DraftDeliveriesProps) {
  const deliveries = useDraftDeliveries(draftId, enabled);
  return (
    <section aria-labelledby={`draft-sent-${draftId}`} className="flex flex-col gap-2" data-testid="draft-deliveries">
      <h3 id={`draft-sent-${draftId}`} className="text-base font-semibold">
        Sent
      </h3>
      {deliveries.isPending && <LoadingState>Loading what was sent…</LoadingState>}
      {deliveries.isError && <Alert tone="error">{deliveries.error.message}</Alert>}
      {deliveries.data?.length === 0 && <p className="text-sm text-muted">Nothing has been e-mailed from this draft yet.</p>}
      {deliveries.data && deliveries.data.length > 0 && (
        <ul className="max-h-56 divide-y divide-line overflow-y-auto rounded-lg border border-line px-3">
          {deliveries.data.map((d) => (
            <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
              <span className="min-w-0">
                <span className="font-medium">{DELIVERY_KIND_LABEL[d.kind]}</span>
                <span className="block break-all text-muted">
                  to {d.to}
                  {d.sentBy ? `, by ${d.sentBy}` : ''}, <span className="num">{dateTime(d.sentAt)}</span>
                </span>
                {d.error && <span className="block text-danger">{d.error}</span>}
              </span>
              <span className="flex items-center gap-2">
                <Badge tone={d.status === 'failed' ? 'danger' : d.status === 'sent' ? 'neutral' : 'warn'}>{DELIVERY_STATUS_LABEL[d.status]}</Badge>
                {d.messageId !== null && (
                  <Link to={paths.studioMailMessage.href(d.messageId)} className="text-accent underline underline-offset-2 hover:text-accent-strong">
                    Open
                    <span className="sr-only">
                      {' '}
                      the message: {DELIVERY_KIND_LABEL[d.kind]} to {d.to}
                    </span>
                  </Link>
                )}
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
