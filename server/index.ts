import type { Socket } from 'node:net';
import { appCreate } from './app.js';
import { configLoad } from './config.js';
import { loggerCreate } from './lib/logger.js';
import { modelsInit } from './models/index.js';
import { mailSinkOpen } from './mail/sink-open.js';
import { sequelizeCreate } from './db/sequelize.js';

const SHUTDOWN_GRACE_MS = 10_000;

const config = configLoad();
const logger = loggerCreate(config);
const sequelize = sequelizeCreate(config);
modelsInit(sequelize);
// With no SMTP_URL, mail goes to the local SMTP sink this process starts (or shares); port 0 picks one.
const mailSink = await mailSinkOpen(config, logger);
if (mailSink) config.SMTP_SINK_PORT = mailSink.port;

const app = appCreate({ config, sequelize, logger });
const server = app.listen(config.PORT, config.HOST);

server.on('listening', () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.PORT;
  logger.info({ port }, `Knitwright listening on http://${config.HOST}:${port}`);
});
server.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EADDRINUSE') {
    logger.fatal(`Port ${config.PORT} is already in use: is Knitwright already running? Set PORT to use another.`);
  } else {
    logger.fatal({ err }, 'server failed to start');
  }
  process.exit(1);
});

const sockets = new Set<Socket>();
server.on('connection', (socket) => {
  sockets.add(socket);
  socket.on('close', () => sockets.delete(socket));
});

let stopping = false;
/** Finishes in-flight requests, drops idle keep-alive sockets, then closes the pool. */
async function shutdown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'shutting down');
  const force = setTimeout(() => {
    for (const s of sockets) s.destroy();
  }, SHUTDOWN_GRACE_MS);
  force.unref();
  await new Promise<void>((resolve) => {
    server.close(() => resolve());
    server.closeIdleConnections();
  });
  await mailSink?.close().catch(() => undefined);
  await sequelize.close().catch(() => undefined);
  logger.info('stopped');
  process.exit(0);
}

process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
