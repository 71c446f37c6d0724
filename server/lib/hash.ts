import { createHash } from 'node:crypto';

/** Hex SHA-256: how one-time secrets (reset links, hold secrets, offer links) are stored, never in clear. */
export const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');
