import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';

import { isApiError } from '@/components/api/client';

/**
 * Puts a failed request's per-field messages under the matching form fields
 * and returns the message left for the banner (null when every message found a field).
 * Example: `const general = applyServerErrors(error, ['email', 'password'], setError);`
 */
export function applyServerErrors<TValues extends FieldValues>(
  error: unknown,
  fieldNames: readonly Path<TValues>[],
  setError: UseFormSetError<TValues>,
): string | null {
  if (!isApiError(error)) {
    return error instanceof Error && error.message ? error.message : 'Something went wrong. Try again.';
  }
  let placed = 0;
  for (const name of fieldNames) {
    const message = error.fields[name];
    if (message) {
      setError(name, { type: 'server', message });
      placed += 1;
    }
  }
  const unplaced = Object.keys(error.fields).filter((key) => !fieldNames.includes(key as Path<TValues>));
  if (placed > 0 && unplaced.length === 0) return null;
  return error.message;
}
