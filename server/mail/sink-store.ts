import type { AddressObject, ParsedMail } from 'mailparser';
import { Delivery, SentMessage, SentMessageAttachment } from '../models/index.js';

const SUBJECT_MAX = 255;
const NAME_MAX = 255;
const FILENAME_MAX = 255;

function addressList(field: AddressObject | AddressObject[] | undefined): string {
  const objects = Array.isArray(field) ? field : field ? [field] : [];
  return objects.map((o) => o.text).filter(Boolean).join(', ');
}

/** A file name without any folder part, never empty. */
function filenameSafe(name: string | undefined, index: number): string {
  const base = (name ?? '').split(/[\\/]/).pop()?.trim() ?? '';
  return (base || `attachment-${index + 1}`).slice(0, FILENAME_MAX);
}

/**
 * Stores one parsed message with its attachments, in one transaction. The studio is the one
 * whose delivery carries the same Message-ID; mail from anywhere else is kept with no studio
 * and shown to nobody.
 */
export async function sinkMessageStore(mail: ParsedMail, size: number): Promise<number> {
  const sequelize = SentMessage.sequelize;
  if (!sequelize) throw new Error('Models are not initialised: call modelsInit before mail arrives');
  const messageId = mail.messageId ?? null;
  const delivery = messageId ? await Delivery.findOne({ where: { messageId }, attributes: ['studioId'] }) : null;
  const from = mail.from?.value[0];
  return sequelize.transaction(async (transaction) => {
    const message = await SentMessage.create(
      {
        studioId: delivery?.studioId ?? null,
        messageId: messageId?.slice(0, 255) ?? null,
        fromAddress: (from?.address ?? '').slice(0, 254),
        fromName: (from?.name ?? '').slice(0, NAME_MAX),
        toAddresses: addressList(mail.to),
        subject: (mail.subject ?? '').slice(0, SUBJECT_MAX),
        sentAt: mail.date ?? null,
        receivedAt: new Date(),
        html: typeof mail.html === 'string' ? mail.html : null,
        text: mail.text ?? null,
        size,
      },
      { transaction },
    );
    await SentMessageAttachment.bulkCreate(
      mail.attachments.map((a, i) => ({
        sentMessageId: message.id,
        filename: filenameSafe(a.filename, i),
        contentType: (a.contentType || 'application/octet-stream').slice(0, 127),
        size: a.content.length,
        content: a.content,
      })),
      { transaction },
    );
    return message.id;
  });
}
