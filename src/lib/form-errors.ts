import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

/**
 * Puts the server's answer on a react-hook-form form: each field error beside its field, and the
 * server's message as the form's own error (`errors.root.server`). Field errors for fields the
 * form does not show are added to that message so nothing the server said is lost.
 *
 * @param fields the form's field names, in the server's spelling
 * @param rename server field name → form field name where they differ (e.g. mm → typed length)
 */
export function serverErrorsApply<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
  rename: Readonly<Record<string, Path<T>>> = {},
): void {
  if (!(error instanceof ApiError)) {
    setError('root.server', { type: 'server', message: 'Something went wrong. Try again.' });
    return;
  }
  const leftOver: string[] = [];
  let firstFocused = false;
  for (const [serverName, message] of Object.entries(error.fields)) {
    const name = rename[serverName] ?? (fields.includes(serverName as Path<T>) ? (serverName as Path<T>) : undefined);
    if (name === undefined) {
      leftOver.push(message);
      continue;
    }
    setError(name, { type: 'server', message }, { shouldFocus: !firstFocused });
    firstFocused = true;
  }
  const message = [error.message, ...leftOver].filter(Boolean).join(' ');
  setError('root.server', { type: 'server', message });
}
