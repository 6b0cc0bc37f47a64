import { Link } from 'react-router';
import type { MailSummary } from '@shared/schemas/mail';
import { Table, Td, Th } from '@/components/ui/table';
import { paths } from '@/config/paths';
import { dateTime } from '../lib/mail-words';

export interface MailTableProps {
  messages: readonly MailSummary[];
}

/** The studio's messages: subject (opens the message), recipient, time and attachments. */
export function MailTable({ messages }: MailTableProps) {
  return (
    <Table caption="Messages the studio sent" captionHidden>
      <thead>
        <tr>
          <Th>Subject</Th>
          <Th>To</Th>
          <Th>Received</Th>
          <Th className="hidden md:table-cell">Attachments</Th>
        </tr>
      </thead>
      <tbody>
        {messages.map((m) => (
          <tr key={m.id}>
            <Th scope="row">
              <Link to={paths.studioMailMessage.href(m.id)} className="text-accent underline underline-offset-2 hover:text-accent-strong">
                {m.subject || '(no subject)'}
              </Link>
            </Th>
            <Td className="break-all">{m.to}</Td>
            <Td className="num whitespace-nowrap text-muted">{dateTime(m.receivedAt)}</Td>
            <Td className="num hidden text-muted md:table-cell">{m.attachmentCount === 0 ? 'None' : m.attachmentCount}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
