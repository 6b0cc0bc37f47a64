import { z } from 'zod';

const bool = z
  .enum(['0', '1', 'true', 'false', 'yes', 'no'])
  .transform((v) => v === '1' || v === 'true' || v === 'yes');

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().positive().default(3407),
  DB_NAME: z.string().default('knitwright'),
  DB_USER: z.string().default('knitwright'),
  DB_PASSWORD: z.string().default('knitwright-local'),
  DB_POOL_MAX: z.coerce.number().int().positive().default(10),
  SESSION_SECRET: z.string().min(16).default('knitwright-local-development-secret'),
  SESSION_IDLE_HOURS: z.coerce.number().positive().default(12),
  SESSION_ABSOLUTE_DAYS: z.coerce.number().positive().default(7),
  TRUST_PROXY: z.string().default('loopback'),
  /** Secure + `__Host-` session cookie; defaults to on in production (`npm start` on plain http sets 0). */
  SECURE_COOKIES: bool.optional(),
  PUBLIC_ORIGIN: z.string().optional(),
  SERVE_CLIENT: bool.optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  SMTP_URL: z.string().optional(),
  /** Port of the local SMTP sink on 127.0.0.1 (used when SMTP_URL is unset); 0 picks a free port. */
  SMTP_SINK_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  /** Sender address of every message; the studio's name is the sender name. */
  MAIL_FROM: z.email().default('no-reply@knitwright.localhost'),
  STORAGE_URL: z.string().optional(),
});

export type AppConfig = z.infer<typeof EnvSchema>;

/** Reads the configuration from the environment; a bad value stops the server naming the variable. */
export function configLoad(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n  ${lines.join('\n  ')}`);
  }
  const config = parsed.data;
  if (config.NODE_ENV === 'production' && config.SESSION_SECRET === 'knitwright-local-development-secret' && !env.KW_LOCAL_PRODUCTION) {
    throw new Error('SESSION_SECRET must be set in production (at least 16 characters).');
  }
  return config;
}
