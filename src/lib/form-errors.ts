import { get, type FieldErrors, type FieldValues, type Path, type UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-error';

/**
 * Puts a failed submit's messages where the person will look: per-field messages
 * from a 400 on their fields, anything else on the form as a whole (`root.server`).
 */
export function showServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fieldNames: readonly Path<T>[]): void {
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

/** The message of a nested field's error by its dotted path (field arrays), if any. */
export function fieldError(errors: FieldErrors, path: string): string | undefined {
  const found = get(errors, path) as { message?: unknown } | undefined;
  return typeof found?.message === 'string' ? found.message : undefined;
}
