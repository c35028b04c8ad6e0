import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from '@/lib/api-error';

/** Puts the server's per-field messages on the matching fields. */
export function applyServerFieldErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, names: readonly Path<T>[]) {
  if (!isApiError(error)) return;
  for (const name of names) {
    const message = error.fields[name];
    if (message) setError(name, { message });
  }
}
