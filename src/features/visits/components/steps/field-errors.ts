import { isApiError } from '@/lib/api-error';

/** The server's per-field messages for a step's inputs ("inputs.sensor_generation" → "sensor_generation"). */
export function inputErrorsFrom(error: unknown, rejected: boolean): Record<string, string> {
  if (!rejected || !isApiError(error)) return {};
  return Object.fromEntries(
    Object.entries(error.fields)
      .filter(([name]) => name.startsWith('inputs.'))
      .map(([name, message]) => [name.slice('inputs.'.length), message]),
  );
}
