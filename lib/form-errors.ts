import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';

/**
 * Puts the server's 422 field issues back on the form fields they belong to; returns the message
 * to show above the form for everything else (or an empty string when every issue found its field).
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): string {
  if (!isApiError(error)) return 'Something went wrong. Please try again.';
  let unplaced = false;
  for (const issue of error.issues) {
    const field = fields.find((name) => name === issue.path);
    if (field) setError(field, { type: 'server', message: issue.message }, { shouldFocus: true });
    else unplaced = true;
  }
  if (error.issues.length > 0 && !unplaced) return '';
  return error.message;
}
