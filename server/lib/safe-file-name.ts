/**
 * A user's file name made fit to quote back in a message: the last path segment only, no control or
 * bidirectional-override characters, at most 80 characters. It is never used to name a stored file.
 */
export function safeFileName(name: string): string {
  const last = name.split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex -- control characters are what this removes
  const clean = last.replace(/[\u0000-\u001f\u007f\u202a-\u202e\u2066-\u2069]/g, '').trim();
  if (!clean) return 'unnamed file';
  return clean.length > 80 ? `${clean.slice(0, 77)}…` : clean;
}
