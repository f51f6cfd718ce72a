import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';

import { isApiError } from '@/components/api/client';

/**
 * The server's field keys as form paths: "marks[1].scaleMm", "marks.1.scaleMm"
 * and "marks/1/scaleMm" all become "marks.1.scaleMm".
 * Example: normaliseFieldKey('marks[1].scaleMm') → 'marks.1.scaleMm'
 */
export function normaliseFieldKey(key: string): string {
  return key
    .replace(/\[(\d+)\]/g, '.$1')
    .replace(/\//g, '.')
    .replace(/^\./, '');
}

/**
 * Puts a failed save's per-field messages on the form (setError) and returns
 * what is left for a banner: null when every message found a field.
 * `toFormPath` maps a normalised server key to a form path, or null when the
 * form has no such field (then the message goes to the banner).
 * Example: `setGeneral(applyFieldErrors(error, (key) => (fields.includes(key) ? key : null), setError))`
 */
export function applyFieldErrors<TValues extends FieldValues>(
  error: unknown,
  toFormPath: (key: string) => string | null,
  setError: UseFormSetError<TValues>,
): string | null {
  if (!isApiError(error)) {
    return error instanceof Error && error.message ? error.message : 'Something went wrong. Try again.';
  }
  const left: string[] = [];
  let placed = 0;
  for (const [key, message] of Object.entries(error.fields)) {
    const path = toFormPath(normaliseFieldKey(key));
    if (path) {
      setError(path as Path<TValues>, { type: 'server', message });
      placed += 1;
    } else {
      left.push(message);
    }
  }
  if (placed > 0 && left.length === 0) return null;
  return left.length > 0 ? `${error.message} ${left.join(' ')}` : error.message;
}

/**
 * A toFormPath for flat forms: a key (or its first part, for list fields such
 * as "pinDistances.2") that is one of `fields`.
 * Example: flatFieldPath(['nickname', 'pinDistances'])('pinDistances.2') → 'pinDistances'
 */
export function flatFieldPath(fields: readonly string[]): (key: string) => string | null {
  return (key) => {
    if (fields.includes(key)) return key;
    const head = key.split('.')[0];
    return fields.includes(head) ? head : null;
  };
}
