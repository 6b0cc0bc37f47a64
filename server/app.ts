import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { AppConfig } from './config.js';
import { passportFor } from './auth/passport.js';
import { authenticate } from './middleware/authenticate.js';
import { csrfProtect } from './middleware/csrf.js';
import { apiNotFound, errorHandler } from './middleware/error-handler.js';
import { jsonOnly } from './middleware/json-only.js';
import { sessionSetup } from './middleware/session.js';
import { apiRoutesMount } from './routes/index.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export interface AppDeps {
  config: AppConfig;
  sequelize: Sequelize;
  logger: Logger;
}

/** Builds the Express app without listening, so tests can drive it with supertest. */
export function appCreate(deps: AppDeps): Express {
  const { config, logger } = deps;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', trustProxyValue(config.TRUST_PROXY));

  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
        },
      },
      strictTransportSecurity: config.NODE_ENV === 'production' ? { maxAge: 31_536_000, includeSubDomains: true } : false,
      referrerPolicy: { policy: 'same-origin' },
    }),
  );

  const sessions = sessionSetup(config, deps.sequelize);
  app.locals.sessionStore = sessions.store;
  const api = express.Router();
  // Answers carry studio data: never kept by shared caches or the browser's back-forward cache.
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.use(csrfProtect(config.PUBLIC_ORIGIN));
  api.use(jsonOnly());
  api.use(express.json({ limit: '256kb' }));
  api.use(sessions.middleware);
  api.use(authenticate(passportFor(deps), sessions.absoluteMs));
  apiRoutesMount(api, deps);
  api.use(apiNotFound);
  app.use('/api', api);

  const serveClient = config.SERVE_CLIENT ?? config.NODE_ENV === 'production';
  const dist = path.join(root, 'dist');
  if (serveClient && fs.existsSync(path.join(dist, 'index.html'))) {
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(path.join(dist, 'index.html'));
    });
  }

  app.use(errorHandler);
  return app;
}

function trustProxyValue(value: string): boolean | number | string {
  if (value === 'true') return true;
  if (value === 'false' || value === '') return false;
  if (/^\d+$/.test(value)) return Number(value);
  return value;
}
