import type { DeliveryKind, DeliveryStatus } from '@shared/schemas/mail';

/** What was sent, as screens say it. */
export const DELIVERY_KIND_LABEL: Record<DeliveryKind, string> = {
  invitation: 'Invitation',
  password_reset: 'Password reset',
  measurements: 'Measurements',
  tiles: 'Pattern, tiled pages',
  sheet: 'Pattern, wide sheet',
  ticket: 'Cutting ticket',
};

export const DELIVERY_STATUS_LABEL: Record<DeliveryStatus, string> = {
  sending: 'Sending',
  sent: 'Sent',
  failed: 'Not sent',
};

/** "14 Mar 2026, 10:32" in the reader's own time zone. */
export const dateTime = (iso: string) =>
  new Date(iso).toLocaleString(undefined, { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "12.4 kB": sizes to one decimal. */
export function sizeWords(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}
