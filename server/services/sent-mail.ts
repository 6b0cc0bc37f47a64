import { fn, col } from 'sequelize';
import type { DeliveriesResponse, DeliveryView, MailListResponse, MailMessageView, MailSummary } from '../../shared/schemas/mail.js';
import { NotFound } from '../lib/errors.js';
import { Delivery, SentMessage, SentMessageAttachment, User } from '../models/index.js';
import type { Mailer } from '../mail/transport.js';
import { clientFind } from './clients.js';
import type { ServiceContext } from './context.js';
import { draftFind } from './draft-view.js';

/** How many messages the list shows: the newest ones. */
export const MAIL_LIST_MAX = 200;

function summary(m: SentMessage, attachmentCount: number): MailSummary {
  return {
    id: m.id,
    subject: m.subject,
    fromName: m.fromName,
    fromAddress: m.fromAddress,
    to: m.toAddresses,
    receivedAt: m.receivedAt.toISOString(),
    attachmentCount,
  };
}

async function attachmentCounts(ids: number[]): Promise<Map<number, number>> {
  if (ids.length === 0) return new Map();
  const rows = (await SentMessageAttachment.findAll({
    where: { sentMessageId: ids },
    attributes: ['sentMessageId', [fn('COUNT', col('id')), 'n']],
    group: ['sentMessageId'],
    raw: true,
  })) as unknown as { sentMessageId: number; n: number | string }[];
  return new Map(rows.map((r) => [r.sentMessageId, Number(r.n)]));
}

/** The studio's messages as the local sink received them, newest first. */
export async function mailList(c: ServiceContext, mailer: Mailer): Promise<MailListResponse> {
  const rows = await SentMessage.findAll({
    where: { studioId: c.studioId },
    attributes: ['id', 'subject', 'fromName', 'fromAddress', 'toAddresses', 'receivedAt'],
    order: [['receivedAt', 'DESC'], ['id', 'DESC']],
    limit: MAIL_LIST_MAX,
  });
  const counts = await attachmentCounts(rows.map((r) => r.id));
  return { messages: rows.map((r) => summary(r, counts.get(r.id) ?? 0)), sink: mailer.sink };
}

async function messageFind(c: ServiceContext, id: number): Promise<SentMessage> {
  const message = await SentMessage.findOne({ where: { id, studioId: c.studioId } });
  if (!message) throw new NotFound('message');
  return message;
}

/** One message with both bodies and its attachments' names and sizes. */
export async function mailGet(c: ServiceContext, id: number): Promise<MailMessageView> {
  const message = await messageFind(c, id);
  const attachments = await SentMessageAttachment.findAll({
    where: { sentMessageId: message.id },
    attributes: ['id', 'filename', 'contentType', 'size'],
    order: [['id', 'ASC']],
  });
  return {
    ...summary(message, attachments.length),
    sentAt: message.sentAt?.toISOString() ?? null,
    html: message.html,
    text: message.text,
    attachments: attachments.map((a) => ({ id: a.id, filename: a.filename, contentType: a.contentType, size: a.size })),
  };
}

/** The bytes of one attachment of one of the studio's messages. */
export async function attachmentGet(c: ServiceContext, id: number, attachmentId: number): Promise<SentMessageAttachment> {
  const message = await messageFind(c, id);
  const attachment = await SentMessageAttachment.findOne({ where: { id: attachmentId, sentMessageId: message.id } });
  if (!attachment) throw new NotFound('attachment');
  return attachment;
}

/** The sends recorded on one client or one draft of the studio, newest first. */
export async function deliveriesList(c: ServiceContext, where: { clientId: number } | { draftId: number }): Promise<DeliveriesResponse> {
  // Another studio's client or draft is simply not found.
  if ('clientId' in where) await clientFind(c, where.clientId);
  else await draftFind(c, where.draftId);
  const rows = await Delivery.findAll({ where: { studioId: c.studioId, ...where }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: MAIL_LIST_MAX });
  const senders = [...new Set(rows.map((r) => r.sentBy).filter((id): id is number => id !== null))];
  const users = senders.length ? await User.findAll({ where: { id: senders, studioId: c.studioId }, attributes: ['id', 'name'] }) : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  const copies = rows.length
    ? await SentMessage.findAll({ where: { studioId: c.studioId, messageId: rows.map((r) => r.messageId) }, attributes: ['id', 'messageId'] })
    : [];
  const copyOf = new Map(copies.map((m) => [m.messageId, m.id]));
  const deliveries: DeliveryView[] = rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    to: r.toAddress,
    subject: r.subject,
    status: r.status,
    error: r.error,
    sentBy: r.sentBy === null ? null : (names.get(r.sentBy) ?? null),
    sentAt: r.createdAt.toISOString(),
    messageId: copyOf.get(r.messageId) ?? null,
  }));
  return { deliveries };
}
