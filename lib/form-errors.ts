// Server answers mapped onto a form: field errors go beside their inputs, the rest into a banner.
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api';

/** Puts what belongs to a field on that field; returns the message for the banner, if any. */
export function applyServerError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldsByCode: Partial<Record<string, Path<T>>> = {},
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Please try again.';
  const field = fieldsByCode[error.code];
  if (field) {
    setError(field, { type: 'server', message: error.message });
    return null;
  }
  const entries = Object.entries(error.fields);
  for (const [name, message] of entries) setError(name as Path<T>, { type: 'server', message });
  return entries.length > 0 ? null : error.message;
}
