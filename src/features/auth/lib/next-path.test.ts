import { describe, expect, it } from 'vitest';
import { NEXT_FALLBACK, nextPathSafe, signInHrefFor } from './next-path';

// Open-redirect cases from the OWASP Unvalidated Redirects and Forwards Cheat Sheet and the
// WHATWG URL Standard's parsing of slashes, backslashes and control characters.
describe('nextPathSafe', () => {
  it('keeps a path on this site with its query and hash', () => {
    expect(nextPathSafe('/account')).toBe('/account');
    expect(nextPathSafe('/clients/12?tab=sets#latest')).toBe('/clients/12?tab=sets#latest');
  });

  it.each([
    ['nothing', null],
    ['an empty string', ''],
    ['an absolute URL to another site', 'https://evil.example/account'],
    ['a protocol-relative URL', '//evil.example/account'],
    ['a backslash that browsers read as a slash', '/\\evil.example'],
    ['a tab inside the slashes', '/\t/evil.example'],
    ['a javascript: URL', 'javascript:alert(1)'],
    ['a relative path', 'account'],
    ['an API address', '/api/auth/me'],
    ['the sign-in page itself', '/sign-in?next=/account'],
  ])('falls back to the overview for %s', (_label, raw) => {
    expect(nextPathSafe(raw)).toBe(NEXT_FALLBACK);
  });

  it('resolves dot segments before judging the path', () => {
    expect(nextPathSafe('/a/../studio')).toBe('/studio');
    expect(nextPathSafe('/a/../api/auth/me')).toBe(NEXT_FALLBACK);
  });
});

describe('signInHrefFor', () => {
  it('carries the page asked for, encoded', () => {
    expect(signInHrefFor('/studio?tab=members')).toBe('/sign-in?next=%2Fstudio%3Ftab%3Dmembers');
  });

  it('asks for no return path when the overview was asked for', () => {
    expect(signInHrefFor('/')).toBe('/sign-in');
  });
});
