import { useState } from 'react';
import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { useClientDeliveries } from '../api/get-deliveries';
import { useSendMeasurements } from '../api/send-measurements';
import { DELIVERY_KIND_LABEL, DELIVERY_STATUS_LABEL, dateTime } from '../lib/mail-words';

export interface ClientMailCardProps {
  clientId: number;
  clientName: string;
  /** The client's address, or null when none is on record. */
  email: string | null;
  hasMeasurements: boolean;
}

/** E-mail a client their latest measurements, and what has been e-mailed about them (owners). */
export function ClientMailCard({ clientId, clientName, email, hasMeasurements }: ClientMailCardProps) {
  const deliveries = useClientDeliveries(clientId);
  const [confirming, setConfirming] = useState(false);
  const [sent, setSent] = useState<string | null>(null);
  const send = useSendMeasurements({
    onSuccess: (d) => {
      setConfirming(false);
      setSent(`The measurements went to ${d.to}.`);
    },
  });
  const blocked = !email ? `${clientName} has no e-mail address: add one under contact details first.` : !hasMeasurements ? 'Take their measurements first.' : null;

  return (
    <Card
      title="E-mail"
      description="Messages go out with the studio's name as the sender; replies come to you."
      actions={
        <Button
          onClick={() => {
            setSent(null);
            send.reset();
            setConfirming(true);
          }}
          disabled={blocked !== null}
        >
          E-mail the measurements
        </Button>
      }
    >
      {blocked && <p className="mb-3 text-sm text-muted">{blocked}</p>}
      <div role="status" className="mb-3 empty:hidden">
        {sent && (
          <Alert tone="success" announce={false}>
            {sent}
          </Alert>
        )}
      </div>
      {deliveries.isPending && <LoadingState>Loading what was sent…</LoadingState>}
      {deliveries.isError && <Alert tone="error">{deliveries.error.message}</Alert>}
      {deliveries.data?.length === 0 && <p className="text-muted">Nothing has been e-mailed about {clientName} yet.</p>}
      {deliveries.data && deliveries.data.length > 0 && (
        <ul className="divide-y divide-line">
          {deliveries.data.map((d) => (
            <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span>
                <span className="font-medium">{DELIVERY_KIND_LABEL[d.kind]}</span>
                <span className="block text-sm break-all text-muted">
                  to {d.to}
                  {d.sentBy ? `, by ${d.sentBy}` : ''}, <span className="num">{dateTime(d.sentAt)}</span>
                </span>
                {d.error && <span className="block text-sm text-danger">{d.error}</span>}
              </span>
              <span className="flex items-center gap-2">
                <Badge tone={d.status === 'failed' ? 'danger' : d.status === 'sent' ? 'neutral' : 'warn'}>{DELIVERY_STATUS_LABEL[d.status]}</Badge>
                {d.messageId !== null && (
                  <Link to={paths.studioMailMessage.href(d.messageId)} className="text-sm text-accent underline underline-offset-2 hover:text-accent-strong">
                    Open<span className="sr-only"> the message: {DELIVERY_KIND_LABEL[d.kind]}</span>
                  </Link>
                )}
              </span>
            </li>
          ))}
        </ul>
      )}
      <ConfirmDialog
        open={confirming}
        title={`E-mail the measurements to ${clientName}?`}
        description={`The measurements of their latest fitting go to ${email ?? ''}, in the studio's unit.`}
        confirmLabel="Send the measurements"
        pending={send.isPending}
        error={send.error?.message ?? null}
        onConfirm={() => send.mutate({ clientId })}
        onCancel={() => setConfirming(false)}
      />
    </Card>
  );
}
