import net from 'node:net';
import type { Request } from 'express';
import type { AppConfig } from '../config.js';
import { AppError } from '../lib/errors.js';

function loopback(hostname: string): boolean {
  const bare = hostname.replace(/^\[|\]$/g, '');
  if (bare === 'localhost') return true;
  if (net.isIPv4(bare)) return bare.startsWith('127.');
  return bare === '::1';
}

/**
 * The origin e-mailed links point at. PUBLIC_ORIGIN when set (its first entry). Otherwise the
 * request's own origin, but only in development and tests or when the app is opened on loopback:
 * in production a `Host` header chosen by the requester would let them send a member a reset
 * link to their own site (OWASP Forgot Password Cheat Sheet, "Host header injection").
 */
export function linkOrigin(config: AppConfig, req: Request): string {
  const configured = config.PUBLIC_ORIGIN?.split(',')[0]?.trim().replace(/\/+$/, '');
  if (configured) return configured;
  if (config.NODE_ENV !== 'production' || loopback(req.hostname)) return `${req.protocol}://${req.get('host') ?? req.hostname}`;
  throw new AppError(
    500,
    'public_origin_missing',
    'Knitwright does not know its public address, so it cannot put a link in the e-mail: set PUBLIC_ORIGIN (e.g. https://studio.example).',
  );
}
