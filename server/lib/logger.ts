import { pino, type Logger } from 'pino';
import type { AppConfig } from '../config.js';

/** Structured JSON logs; quiet in tests unless LOG_LEVEL asks otherwise. */
export function loggerCreate(config: AppConfig): Logger {
  const level = config.LOG_LEVEL ?? (config.NODE_ENV === 'test' ? 'silent' : 'info');
  return pino({
    level,
    redact: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]'],
  });
}
