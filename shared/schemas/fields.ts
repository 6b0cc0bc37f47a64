/** Small zod building blocks shared by the draft input schemas. */
import { z } from 'zod';

/** A numeric field: any finite number, with a message naming the field. */
export function numberField(label: string) {
  return z.number({
    error: (issue) => (issue.input === undefined ? `${label} is required` : `${label} must be a number`),
  });
}
