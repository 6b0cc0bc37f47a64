import { paths } from '@/config/paths';

/**
 * The page to return to after sign-in, from `?next=`. Only a path on this site is accepted, so
 * a crafted link cannot send a member elsewhere after they sign in (OWASP Unvalidated Redirects
 * and Forwards Cheat Sheet). Anything else falls back to the overview.
 */
export const NEXT_FALLBACK = paths.home.href();

const AUTH_PAGES: string[] = [paths.signIn.path, paths.signUp.path];

function hasControlOrBackslash(text: string): boolean {
  for (const ch of text) {
    const code = ch.codePointAt(0) ?? 0;
    if (code < 0x20 || code === 0x7f || ch === '\\') return true;
  }
  return false;
}

export function nextPathSafe(raw: string | null | undefined, origin = 'http://knitwright.invalid'): string {
  if (!raw) return NEXT_FALLBACK;
  // "//evil.example" and "/\evil.example" are protocol-relative to browsers; control characters
  // are dropped by the URL parser and can turn a path into a host.
  if (!raw.startsWith('/') || raw.startsWith('//')) return NEXT_FALLBACK;
  if (hasControlOrBackslash(raw)) return NEXT_FALLBACK;
  let url: URL;
  try {
    url = new URL(raw, origin);
  } catch {
    return NEXT_FALLBACK;
  }
  if (url.origin !== new URL(origin).origin) return NEXT_FALLBACK;
  if (url.pathname === '/api' || url.pathname.startsWith('/api/')) return NEXT_FALLBACK;
  if (AUTH_PAGES.includes(url.pathname)) return NEXT_FALLBACK;
  return `${url.pathname}${url.search}${url.hash}`;
}

/** The sign-in address that brings the member back to `returnTo` (path + search + hash). */
export function signInHrefFor(returnTo: string): string {
  return paths.signIn.href(nextPathSafe(returnTo));
}
