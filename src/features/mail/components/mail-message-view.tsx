import { useState } from 'react';
import type { MailMessageView as Message } from '@shared/schemas/mail';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { attachmentHref } from '../api/get-mail-message';
import { dateTime, sizeWords } from '../lib/mail-words';
import { sandboxedHtml } from '../lib/sandboxed-html';

export interface MailMessageViewProps {
  message: Message;
}

/**
 * One message: its headers, its HTML part in a sandboxed frame (no scripts, no access to the
 * app; links open in a new tab) or its text part, and its attachments to download.
 */
export function MailMessageView({ message }: MailMessageViewProps) {
  const [asText, setAsText] = useState(message.html === null);
  return (
    <div className="space-y-6">
      <Card>
        <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[auto_minmax(0,1fr)]">
          <dt className="font-medium text-muted">From</dt>
          <dd className="break-all">
            {message.fromName} &lt;{message.fromAddress}&gt;
          </dd>
          <dt className="font-medium text-muted">To</dt>
          <dd className="break-all">{message.to}</dd>
          <dt className="font-medium text-muted">Received</dt>
          <dd className="num">{dateTime(message.receivedAt)}</dd>
        </dl>
      </Card>
      <Card
        title="Message"
        actions={
          message.html !== null && message.text !== null ? (
            <Button compact onClick={() => setAsText((v) => !v)}>
              {asText ? 'Show as sent (HTML)' : 'Show as plain text'}
            </Button>
          ) : undefined
        }
      >
        {asText || message.html === null ? (
          <pre className="overflow-x-auto rounded-lg border border-line bg-surface p-4 text-sm whitespace-pre-wrap break-words" data-testid="mail-text">
            {message.text ?? '(This message has no text part.)'}
          </pre>
        ) : (
          <iframe
            title={`Message: ${message.subject}`}
            sandbox="allow-popups allow-popups-to-escape-sandbox"
            referrerPolicy="no-referrer"
            srcDoc={sandboxedHtml(message.html)}
            className="h-[28rem] w-full rounded-lg border border-line bg-white"
            data-testid="mail-html"
          />
        )}
      </Card>
      <Card title="Attachments">
        {message.attachments.length === 0 ? (
          <p className="text-muted">This message has no attachments.</p>
        ) : (
          <ul className="space-y-2">
            {message.attachments.map((a) => (
              <li key={a.id} className="flex flex-wrap items-center gap-x-3">
                <a
                  href={attachmentHref(message.id, a.id)}
                  download={a.filename}
                  className="inline-flex min-h-touch items-center font-medium text-accent underline underline-offset-2 hover:text-accent-strong"
                >
                  {a.filename}
                </a>
                <span className="num text-sm text-muted">
                  {a.contentType}, {sizeWords(a.size)}
                </span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
