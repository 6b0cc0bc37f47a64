import { useState } from 'react';
import { Link } from 'react-router';
import { PAPERS_FOR_KIND } from '@shared/engine/export/pdf-options';
import type { PaperId } from '@shared/engine/layout/tiling-paper';
import type { DeliveryView, SendKind } from '@shared/schemas/mail';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { controlClasses, Field } from '@/components/ui/field';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { paths } from '@/config/paths';
import { useSendDraft } from '../api/send-draft';
import { draftSendCheck, draftSendServerErrors, type DraftSendErrors, type DraftSendForm, type Recipient } from '../lib/draft-send-form';
import { DELIVERY_KIND_LABEL } from '../lib/mail-words';
import { ChoiceCards, type ChoiceCard } from './choice-cards';
import { DraftDeliveries } from './draft-deliveries';

/**
 * The documents and papers of the print dialog, handed in by the screen that composes both
 * features, so the two dialogs offer the same choices from one list.
 */
export interface MailDocuments {
  kinds: readonly { kind: SendKind; label: string; hint: string }[];
  paperLabel: (id: PaperId) => string;
  paperDefault: (kind: SendKind, studioPaper: string | undefined) => PaperId;
}

/** The draft's client as the caller knows them; `email` is undefined while unknown (cutters never see it). */
export interface MailClient {
  name: string;
  email: string | null | undefined;
}

export interface DraftMailDialogProps {
  open: boolean;
  onClose: () => void;
  draftId: number;
  title: string;
  revision: number;
  unsaved: boolean;
  owner: boolean;
  client: MailClient;
  studioPaper: string;
  documents: MailDocuments;
}

function clientChoice(owner: boolean, client: MailClient): ChoiceCard<Recipient> {
  const base = { value: 'client' as const, label: 'The client' };
  if (!owner) return { ...base, hint: "Only an owner can send to the client's own address.", disabled: true };
  if (client.email === undefined) return { ...base, hint: `Looking up ${client.name}'s address…`, disabled: true };
  if (client.email === null) return { ...base, hint: `${client.name} has no e-mail address: add one on the client's page first.`, disabled: true };
  return { ...base, hint: `${client.name}, ${client.email}` };
}

const ADDRESS_CHOICE: ChoiceCard<Recipient> = { value: 'address', label: 'Another address', hint: 'A copy shop for the wide sheet, or a cutter working elsewhere.' };

/**
 * E-mails one of a draft's documents as a PDF the server makes from the saved revision: what
 * to send and on which paper, to the client (owners) or to an address someone types, with a
 * note. The server's messages appear beside their fields; owners see what was already sent.
 */
export function DraftMailDialog({ open, onClose, draftId, title, revision, unsaved, owner, client, studioPaper, documents }: DraftMailDialogProps) {
  const [form, setForm] = useState<DraftSendForm>(() => ({
    kind: 'ticket',
    paper: documents.paperDefault('ticket', studioPaper),
    recipient: 'address',
    address: '',
    note: '',
  }));
  const [errors, setErrors] = useState<DraftSendErrors>({});
  const [sent, setSent] = useState<DeliveryView | null>(null);
  const send = useSendDraft({
    onSuccess: (delivery) => {
      setSent(delivery);
      setForm((f) => ({ ...f, note: '' }));
    },
  });
  const recipients = [clientChoice(owner, client), ADDRESS_CHOICE];
  const canClient = recipients[0]?.disabled !== true;
  // The client's card may become unavailable (its address was removed): fall back to an address.
  const recipient: Recipient = form.recipient === 'client' && !canClient ? 'address' : form.recipient;

  const change = (patch: Partial<DraftSendForm>) => {
    setForm((f) => ({ ...f, ...patch }));
    setErrors({});
    setSent(null);
  };

  const submit = () => {
    const checked = draftSendCheck({ ...form, recipient });
    if (!checked.ok) return setErrors(checked.errors);
    send.mutate({ draftId, body: checked.body }, { onError: (error) => setErrors(draftSendServerErrors(error)) });
  };

  const busy = send.isPending;
  const kindLabel = documents.kinds.find((k) => k.kind === form.kind)?.label ?? form.kind;
  return (
    <Dialog open={open} onClose={busy ? () => undefined : onClose} title={`E-mail ${title}`} className="max-w-3xl! text-base">
      <form
        noValidate
        aria-label="E-mail the draft"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
        className="flex flex-col gap-5"
      >
        <p className="text-sm text-muted">
          Sends revision {revision} as saved, as a PDF attached to the message. The studio's name is the sender; replies come to you.
        </p>
        {unsaved && (
          <Alert tone="warn" title="Your latest changes are not saved">
            The PDF is made from revision {revision}. Close this, save, and send again to include your changes.
          </Alert>
        )}
        <fieldset disabled={busy} className="flex flex-col gap-5">
          <legend className="sr-only">What to send and to whom</legend>
          <ChoiceCards<SendKind>
            legend="What to send"
            value={form.kind}
            options={documents.kinds.map((k) => ({ value: k.kind, label: k.label, hint: k.hint }))}
            onChange={(kind) => change({ kind, paper: PAPERS_FOR_KIND[kind].includes(form.paper) ? form.paper : documents.paperDefault(kind, studioPaper) })}
            error={errors.kind}
            testId="mail-kind"
          />
          <SelectField
            label="Paper"
            value={form.paper}
            onChange={(e) => change({ paper: e.target.value as PaperId })}
            options={PAPERS_FOR_KIND[form.kind].map((id) => ({ value: id, label: documents.paperLabel(id) }))}
            hint={form.kind === 'sheet' ? 'The copy shop prints it at 100 % on this paper.' : 'Printed at 100 % (actual size).'}
            error={errors.paper}
            className="max-w-sm"
          />
          <ChoiceCards<Recipient>
            legend="Send to"
            value={recipient}
            options={recipients}
            onChange={(r) => change({ recipient: r })}
            error={recipient === 'client' ? errors.to : undefined}
            columns={2}
            testId="mail-recipient"
          />
          {recipient === 'address' && (
            <TextField
              label="E-mail address"
              type="email"
              value={form.address}
              onChange={(e) => change({ address: e.target.value })}
              placeholder="prints@copyshop.example"
              autoComplete="off"
              spellCheck={false}
              error={errors.to}
              hint="A PDF sent to another address leaves out the client's name."
              className="max-w-md"
            />
          )}
          <Field label="Note" optional error={errors.note} hint="Added above the message, e.g. the paper weight you want or when you will collect it.">
            {(ids) => (
              <textarea
                id={ids.id}
                aria-describedby={ids.describedBy}
                aria-invalid={ids.invalid || undefined}
                rows={3}
                value={form.note}
                onChange={(e) => change({ note: e.target.value })}
                className={`${controlClasses(ids.invalid)} py-2`}
              />
            )}
          </Field>
        </fieldset>
        <div role="status" className="empty:hidden">
          {busy && <p className="text-sm text-muted">Making the PDF of the {kindLabel.toLowerCase()} and sending it…</p>}
          {sent && (
            <Alert tone={sent.status === 'failed' ? 'error' : 'success'} announce={false} title={sent.status === 'failed' ? 'Not sent' : 'Sent'}>
              {sent.status === 'failed'
                ? `${DELIVERY_KIND_LABEL[sent.kind]} could not be sent to ${sent.to}${sent.error ? `: ${sent.error}` : '.'}`
                : `${DELIVERY_KIND_LABEL[sent.kind]} went to ${sent.to}.`}
              {owner && sent.status !== 'failed' && (
                <>
                  {' '}
                  <Link to={paths.studioMail.href()} className="text-accent underline underline-offset-2 hover:text-accent-strong">
                    See it in Sent mail
                  </Link>
                </>
              )}
            </Alert>
          )}
        </div>
        {errors.form && <Alert tone="error">{errors.form}</Alert>}
        <div className="flex flex-wrap justify-end gap-3 border-t border-line pt-4">
          <Button variant="ghost" onClick={onClose} disabled={busy}>
            Close
          </Button>
          <Button type="submit" variant="primary" pending={busy} pendingLabel="Sending…" data-testid="mail-send">
            Send
          </Button>
        </div>
      </form>
      {owner && (
        <div className="mt-6 border-t border-line pt-4">
          <DraftDeliveries draftId={draftId} enabled={open} />
        </div>
      )}
    </Dialog>
  );
}
