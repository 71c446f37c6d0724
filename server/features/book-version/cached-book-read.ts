import type { JsonText } from '@server/lib/json-text';
import type { ReadCache } from '@server/lib/read-cache';

/**
 * A read of one salon's book at a version from salonAtBookVersion, answered from the cache until the
 * version moves. `key` names the read and every parameter it depends on; the salon is added here so no
 * answer crosses salons.
 */
export function cachedBookRead(
  cache: ReadCache,
  at: { salon: { id: string }; version: string },
  key: string,
  compute: () => Promise<unknown>,
): Promise<JsonText> {
  return cache.json(`${at.salon.id}|${key}`, at.version, compute);
}
