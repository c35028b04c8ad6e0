import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-error';

/** The server's per-field messages, optionally only those under `prefix` ("inputs.x" → "x"). */
export function serverFieldErrors(error: unknown, prefix = ''): Record<string, string> {
  if (!isApiError(error)) return {};
  return Object.fromEntries(
    Object.entries(error.fields)
      .filter(([name]) => name.startsWith(prefix))
      .map(([name, message]) => [name.slice(prefix.length), message]),
  );
}

/**
 * Puts the server's per-field messages (a 400's `error.fields`) on the form's fields. The server
 * names fields by their path (returnToService.tdcAgrees), the same names the form uses. With
 * `names`, only those fields are marked. Returns whether any field was marked, so the caller knows
 * whether the message also needs a banner.
 */
export function applyServerErrors<T extends FieldValues>(form: { setError: UseFormSetError<T> }, error: unknown, names?: readonly Path<T>[]): boolean {
  let marked = false;
  for (const [name, message] of Object.entries(serverFieldErrors(error))) {
    if (names && !names.includes(name as Path<T>)) continue;
    form.setError(name as Path<T>, { message });
    marked = true;
  }
  return marked;
}
