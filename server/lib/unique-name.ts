import { AppError } from './app-error';

/** Runs a write whose name column is unique per salon; a clash answers 409 naming the field. */
export async function uniqueName<T>(write: Promise<T>, what: string): Promise<T> {
  try {
    return await write;
  } catch (e) {
    // 23505 is PostgreSQL's unique_violation.
    if ((e as { code?: string }).code !== '23505') throw e;
    const message = `Another ${what} already has this name.`;
    throw new AppError('CONFLICT', 409, message, { name: message });
  }
}
