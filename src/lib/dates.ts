const DAY = /^\d{4}-\d{2}-\d{2}$/;

/**
 * "14 Mar 2026" for a calendar date (YYYY-MM-DD, read as that day wherever the reader is) or a
 * timestamp (shown as the reader's local day).
 */
export function dateFormat(value: string, locale?: string): string {
  const date = DAY.test(value) ? new Date(`${value}T12:00:00`) : new Date(value);
  if (Number.isNaN(date.getTime())) return value;
  return date.toLocaleDateString(locale ?? 'en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}
