import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const LIST_FILE = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../data/common-passwords.txt');

let list: Set<string> | undefined;

/** The shipped list, lower-cased; lines starting with `#` are comments. */
export function commonPasswords(): Set<string> {
  if (!list) {
    const lines = fs.readFileSync(LIST_FILE, 'utf8').split(/\r?\n/);
    list = new Set(lines.map((l) => l.trim().toLowerCase()).filter((l) => l && !l.startsWith('#')));
  }
  return list;
}

/**
 * A password found in lists of breached or most-used passwords is refused (OWASP ASVS 5.0
 * §6.2.4; NIST SP 800-63B §3.1.1.2), compared without regard to case.
 */
export function passwordIsCommon(password: string): boolean {
  return commonPasswords().has(password.trim().toLowerCase());
}

/**
 * Why a new password is refused, or undefined when it is acceptable. Besides the common list,
 * the member's own e-mail, its local part and the studio's name are refused (ASVS 5.0 §6.2.11,
 * context-specific words).
 */
export function passwordProblem(password: string, context: { email?: string; studioName?: string }): string | undefined {
  if (passwordIsCommon(password)) return 'This password is among the most common ones; choose a less guessable one';
  const p = password.trim().toLowerCase();
  const email = context.email?.trim().toLowerCase();
  const words = [email, email?.split('@')[0], context.studioName?.trim().toLowerCase()].filter((w): w is string => !!w);
  if (words.includes(p)) return 'Password must not be your e-mail address or the studio name';
  return undefined;
}
