import net from 'node:net';
import type { Logger } from 'pino';
import type { AppConfig } from '../config.js';
import { mailSinkStart, sinkBanner, SINK_BANNER, type MailSink } from './sink.js';
import { SINK_HOST } from './transport.js';

const PROBE_TIMEOUT_MS = 2_000;

/** The first line an SMTP server at host:port greets with, or null when nothing answers in time. */
export function smtpGreeting(host: string, port: number): Promise<string | null> {
  return new Promise((resolve) => {
    const socket = net.connect({ host, port });
    let buffer = '';
    const done = (line: string | null) => {
      socket.destroy();
      resolve(line);
    };
    socket.setTimeout(PROBE_TIMEOUT_MS, () => done(null));
    socket.on('error', () => done(null));
    socket.on('data', (chunk: Buffer) => {
      buffer += chunk.toString('latin1');
      const end = buffer.indexOf('\n');
      if (end >= 0) {
        socket.write('QUIT\r\n');
        done(buffer.slice(0, end).trim());
      }
    });
  });
}

/**
 * Starts the local SMTP sink for this app server when mail has nowhere else to go (no
 * SMTP_URL). When the port is already taken by another Knitwright server's sink on the same
 * database, this server shares it (its messages land in the same tables either way); when it is
 * taken by anything else, mail cannot be delivered and the log says what to change.
 * Returns the sink this process owns, or null.
 */
export async function mailSinkOpen(config: AppConfig, logger: Logger): Promise<MailSink | null> {
  if (config.SMTP_URL) return null;
  try {
    const sink = await mailSinkStart({ database: config.DB_NAME, port: config.SMTP_SINK_PORT, logger });
    logger.info({ host: sink.host, port: sink.port }, `local mail sink on smtp://${sink.host}:${sink.port}`);
    return sink;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE') throw err;
  }
  const greeting = await smtpGreeting(SINK_HOST, config.SMTP_SINK_PORT);
  if (greeting?.includes(sinkBanner(config.DB_NAME))) {
    logger.info(`sharing the local mail sink of another Knitwright server on ${SINK_HOST}:${config.SMTP_SINK_PORT}`);
  } else if (greeting?.includes(SINK_BANNER)) {
    logger.warn(
      `port ${config.SMTP_SINK_PORT} holds the mail sink of a Knitwright server on another database: messages sent from here would be stored there. Set SMTP_SINK_PORT to a free port (0 picks one).`,
    );
  } else {
    logger.warn(`port ${config.SMTP_SINK_PORT} is taken by another program: e-mail cannot be delivered. Set SMTP_SINK_PORT to a free port, or SMTP_URL.`);
  }
  return null;
}
