import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';

/**
 * Puts the server's per-field messages beside the fields of a react-hook-form form.
 * Returns the message to show above the form: the server's general message when no
 * field of this form matched, otherwise undefined (the fields already say it).
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | undefined {
  if (!isApiError(error)) return error instanceof Error ? error.message : 'Something went wrong. Try again.';
  let matched = 0;
  for (const [field, message] of Object.entries(error.fields ?? {})) {
    if ((fieldNames as readonly string[]).includes(field)) {
      setError(field as Path<T>, { type: 'server', message });
      matched += 1;
    }
  }
  return matched > 0 ? undefined : error.message;
}
