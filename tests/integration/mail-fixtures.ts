/**
 * The mail suites' set-up: the real app and the real local SMTP sink on a free port of
 * 127.0.0.1 (smtp-server, parsed by mailparser, stored in MariaDB), wired the way server/index.ts
 * wires them. Messages are read back from the sink's tables, as the Sent mail screen reads them.
 */
import { pino } from 'pino';
import { Op } from 'sequelize';
import { mailSinkStart, type MailSink } from '../../server/mail/sink.js';
import { SentMessage, SentMessageAttachment } from '../../server/models/index.js';
import { testAppCreate, type TestApp } from '../helpers/test-app.js';

export interface MailTestApp extends TestApp {
  sink: MailSink;
}

/** The app with its own sink (port 0: a free port, so suites and servers never share one). */
export async function mailTestAppCreate(): Promise<MailTestApp> {
  const t = testAppCreate();
  const sink = await mailSinkStart({ database: t.config.DB_NAME, port: 0, logger: pino({ level: 'silent' }) });
  // As server/index.ts does: the transport is made on first use, with the port the sink got.
  t.config.SMTP_SINK_PORT = sink.port;
  return {
    ...t,
    sink,
    close: async () => {
      await sink.close();
      await t.close();
    },
  };
}

export interface Received {
  message: SentMessage;
  attachments: SentMessageAttachment[];
}

const POLL_MS = 50;

/**
 * The messages the sink stored for `to` after `since`, waiting up to `timeoutMs` for `count` of
 * them (a password-reset message goes out after the answer, so it may still be on its way).
 */
export async function messagesTo(to: string, options: { count?: number; timeoutMs?: number; since?: Date } = {}): Promise<Received[]> {
  const { count = 1, timeoutMs = 5_000, since = new Date(0) } = options;
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const rows = await SentMessage.findAll({
      where: { toAddresses: { [Op.like]: `%${to}%` }, receivedAt: { [Op.gte]: since } },
      order: [['id', 'ASC']],
    });
    if (rows.length >= count || Date.now() > deadline) {
      const attachments = rows.length ? await SentMessageAttachment.findAll({ where: { sentMessageId: rows.map((r) => r.id) } }) : [];
      return rows.map((message) => ({ message, attachments: attachments.filter((a) => a.sentMessageId === message.id) }));
    }
    await new Promise((r) => setTimeout(r, POLL_MS));
  }
}

/** The one message to `to`, failing clearly when none arrived. */
export async function messageTo(to: string, since?: Date): Promise<Received> {
  const [first] = await messagesTo(to, { since });
  if (!first) throw new Error(`no message to ${to} reached the sink`);
  return first;
}

/** The token of the first link to `/<path>/<token>` in a text, or throws. */
export function linkToken(text: string | null, path: 'invitations' | 'reset-password'): { url: string; token: string } {
  const match = new RegExp(`https?://[^\\s"<>]+/${path}/([A-Za-z0-9_-]{43})`).exec(text ?? '');
  if (!match?.[1]) throw new Error(`no /${path}/ link in:\n${text}`);
  return { url: match[0], token: match[1] };
}
