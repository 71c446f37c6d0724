import { createHash } from 'node:crypto';
import { LRUCache } from 'lru-cache';
import { JsonText } from './json-text';

export interface ReadCache {
  /**
   * The answer for `key` at `version`, serialised once: computed on a miss, shared by every request that
   * asks for the same key and version while it is being computed, kept until the version moves on or
   * the cache needs the room. Keys must name the salon and every parameter the answer depends on.
   */
  json(key: string, version: string, compute: () => Promise<unknown>): Promise<JsonText>;
  /** Entries, bytes held, hits and misses: for tests and diagnostics. */
  stats(): { entries: number; bytes: number; hits: number; misses: number };
}

/** Bounded by bytes of JSON held (a busy salon's week is a few hundred kilobytes). */
export function createReadCache(maxBytes = 64 * 1024 * 1024): ReadCache {
  const done = new LRUCache<string, { version: string; body: JsonText }>({
    maxSize: maxBytes,
    sizeCalculation: (entry) => Math.max(1, entry.body.size),
  });
  const computing = new Map<string, Promise<JsonText>>();
  let hits = 0;
  let misses = 0;
  return {
    async json(key, version, compute) {
      const held = done.get(key);
      if (held?.version === version) {
        hits++;
        return held.body;
      }
      const flightKey = `${version}\u0000${key}`;
      const inFlight = computing.get(flightKey);
      if (inFlight) {
        hits++;
        return inFlight;
      }
      misses++;
      const promise = compute()
        .then(async (value) => {
          const body = await JsonText.of(value, etagFor(key, version));
          // A slower computation for an older version must not replace a newer answer.
          const current = done.get(key);
          if (!current || BigInt(current.version) <= BigInt(version)) done.set(key, { version, body });
          return body;
        })
        .finally(() => computing.delete(flightKey));
      computing.set(flightKey, promise);
      return promise;
    },
    stats: () => ({ entries: done.size, bytes: done.calculatedSize, hits, misses }),
  };
}

/** Weak: the same answer may be serialised differently by another server. */
function etagFor(key: string, version: string): string {
  return `W/"${version}-${createHash('sha1').update(key).digest('base64url').slice(0, 16)}"`;
}
