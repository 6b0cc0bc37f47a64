import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { DeliveryKind } from '../../shared/schemas/mail.js';
import { AppError } from '../lib/errors.js';
import { Delivery } from '../models/index.js';
import type { Mailer } from './transport.js';

/** What a service that sends needs besides its context: the database, the transport, the origin links point at. */
export interface MailEnv {
  sequelize: Sequelize;
  mailer: Mailer;
  origin: string;
}

export interface Outgoing {
  studioId: number;
  /** The sender name every message carries. */
  studioName: string;
  kind: DeliveryKind;
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Where a reply goes, e.g. the member who sent a client their measurements. */
  replyTo?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
  clientId?: number | null;
  draftId?: number | null;
  invitationId?: number | null;
  sentBy?: number | null;
}

/** The mail server refused the message or could not be reached; the delivery is recorded as failed. */
export class MailFailed extends AppError {
  constructor(reason: string) {
    super(502, 'mail_failed', `The e-mail could not be sent: ${reason}. Try again in a moment; if it keeps failing, check the mail server settings (SMTP_URL).`);
  }
}

const ERROR_MAX = 500;

/**
 * Records the delivery (with the Message-ID the message will carry), sends the message and
 * records how it went. Resolves with the delivery once the mail server has taken the message;
 * throws MailFailed when it did not.
 */
export async function mailSend(mailer: Mailer, out: Outgoing): Promise<Delivery> {
  const messageId = mailer.messageIdCreate();
  const delivery = await Delivery.create({
    studioId: out.studioId,
    kind: out.kind,
    clientId: out.clientId ?? null,
    draftId: out.draftId ?? null,
    invitationId: out.invitationId ?? null,
    toAddress: out.to,
    subject: out.subject,
    messageId,
    sentBy: out.sentBy ?? null,
  });
  try {
    await mailer.transport.sendMail({
      messageId,
      from: { name: out.studioName, address: mailer.fromAddress },
      to: out.to,
      replyTo: out.replyTo,
      subject: out.subject,
      text: out.text,
      html: out.html,
      attachments: out.attachments,
      // Attachments are bytes made here: never let a message read a file or fetch a URL.
      disableUrlAccess: true,
      disableFileAccess: true,
    });
  } catch (err) {
    const reason = (err as Error).message.slice(0, ERROR_MAX);
    await delivery.update({ status: 'failed', error: reason });
    throw new MailFailed(reason);
  }
  await delivery.update({ status: 'sent' });
  return delivery;
}

/**
 * Sends without making the caller wait (and without the caller's timing showing whether a
 * message went out at all); a failure is recorded on the delivery and logged.
 */
export function mailSendLater(mailer: Mailer, out: Outgoing, logger: Logger): void {
  mailSend(mailer, out).catch((err: unknown) => logger.error({ err, kind: out.kind }, 'e-mail not sent'));
}
