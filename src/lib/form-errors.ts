import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-error';

/**
 * Puts a failed submit's messages where the person will look: per-field messages
 * from a 400 on their fields, anything else on the form as a whole (`root.server`).
 */
export function showServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): void {
  if (!isApiError(error)) {
    setError('root.server', { message: 'Something went wrong. Please try again.' });
    return;
  }
  let placed = false;
  for (const name of fieldNames) {
    const message = error.fields[name];
    if (message) {
      setError(name, { type: 'server', message });
      placed = true;
    }
  }
  if (!placed) setError('root.server', { message: error.message });
}
