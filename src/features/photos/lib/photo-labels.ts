import type { PhotoKind } from '@shared/schemas/photo';

export const KIND_LABEL: Record<PhotoKind, string> = { front: 'Front', side: 'Side', back: 'Back', other: 'Other' };

const DAY = /^\d{4}-\d{2}-\d{2}$/;

/** "14 Mar 2026" for a calendar date, read as that day wherever the reader is. */
export function dayFormat(value: string): string {
  const date = DAY.test(value) ? new Date(`${value}T12:00:00`) : new Date(value);
  if (Number.isNaN(date.getTime())) return value;
  return date.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}

/** Today as YYYY-MM-DD in the reader's own time zone (a fitting's date is the studio's day). */
export function todayLocal(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** "2.4 MB", "820 KB". */
export function bytesFormat(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} KB`;
}
