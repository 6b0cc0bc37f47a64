import { simpleParser } from 'mailparser';
import type { Logger } from 'pino';
import { SMTPServer } from 'smtp-server';
import { sinkMessageStore } from './sink-store.js';
import { SINK_HOST } from './transport.js';

/** Largest message the sink takes: a tiled pattern of a long dress is a few MB. */
export const SINK_MESSAGE_MAX_BYTES = 25 * 1024 * 1024;

/** The words the sink greets with, so another app server can tell the port is already ours. */
export const SINK_BANNER = 'Knitwright mail sink';

export interface MailSink {
  host: string;
  port: number;
  close: () => Promise<void>;
}

/** The greeting names the database, since the sink stores what it receives there. */
export function sinkBanner(database: string): string {
  return `${SINK_BANNER}, database ${database}`;
}

/**
 * A real SMTP server on 127.0.0.1 (smtp-server) that takes every message, reads it with
 * mailparser and stores it in MariaDB (through the registered models), where owners read their studio's mail under
 * Studio → Sent mail. It answers 250 only once the message is stored, so a send that succeeded
 * is already readable. Loopback only, no TLS, no authentication: it never relays anything.
 * `port` 0 picks a free port (tests); the chosen one is in the result.
 */
export async function mailSinkStart(options: { database: string; port: number; logger: Logger }): Promise<MailSink> {
  const { logger } = options;
  const server = new SMTPServer({
    banner: sinkBanner(options.database),
    disabledCommands: ['AUTH', 'STARTTLS'],
    hideSTARTTLS: true,
    authOptional: true,
    size: SINK_MESSAGE_MAX_BYTES,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          if (stream.sizeExceeded) {
            const err = Object.assign(new Error(`Message larger than ${SINK_MESSAGE_MAX_BYTES} bytes`), { responseCode: 552 });
            return callback(err);
          }
          const size = (stream as unknown as { byteLength?: number }).byteLength ?? 0;
          const id = await sinkMessageStore(mail, size);
          callback(null, `Stored as message ${id}`);
        })
        .catch((err: unknown) => {
          logger.error({ err }, 'mail sink could not store a message');
          callback(Object.assign(new Error('Could not store the message'), { responseCode: 451 }));
        });
    },
  });
  // Until it listens, a failure (the port taken) is the caller's to handle, not a log line.
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, SINK_HOST, () => {
      server.off('error', reject);
      resolve();
    });
  });
  server.on('error', (err) => logger.error({ err }, 'mail sink error'));
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : options.port;
  return { host: SINK_HOST, port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
