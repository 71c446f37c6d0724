import { describe, expect, it } from 'vitest';
import { createReadCache } from './read-cache';

const deferred = <T>() => {
  let resolve!: (v: T) => void;
  let reject!: (e: unknown) => void;
  const promise = new Promise<T>((res, rej) => ((resolve = res), (reject = rej)));
  return { promise, resolve, reject };
};

describe('read cache', () => {
  it('computes once per key and version, shares a computation in progress, and recomputes when the version moves', async () => {
    const cache = createReadCache();
    let runs = 0;
    const gate = deferred<void>();
    const compute = async () => {
      runs++;
      await gate.promise;
      return { runs };
    };
    const both = Promise.all([cache.json('a', '1', compute), cache.json('a', '1', compute)]);
    gate.resolve();
    const [first, second] = await both;
    expect(runs).toBe(1);
    expect(second).toBe(first);
    expect(first.body.toString()).toBe('{"runs":1}');
    expect((await cache.json('a', '1', compute)).body.toString()).toBe('{"runs":1}');
    const moved = await cache.json('a', '2', compute);
    expect(moved.body.toString()).toBe('{"runs":2}');
    expect(moved.etag).not.toBe(first.etag);
    expect((await cache.json('b', '2', compute)).body.toString()).toBe('{"runs":3}');
  });

  it('does not keep a refusal, and a slow answer for an older version never replaces a newer one', async () => {
    const cache = createReadCache();
    await expect(cache.json('a', '1', () => Promise.reject(new Error('no such service')))).rejects.toThrow('no such service');
    expect((await cache.json('a', '1', async () => 'ok')).body.toString()).toBe('"ok"');

    const slow = deferred<string>();
    const older = cache.json('k', '5', () => slow.promise);
    expect((await cache.json('k', '6', async () => 'new')).body.toString()).toBe('"new"');
    slow.resolve('old');
    expect((await older).body.toString()).toBe('"old"'); // its own caller still gets what it asked for
    expect((await cache.json('k', '6', async () => 'recomputed')).body.toString()).toBe('"new"');
  });

  it('stays within its byte budget, dropping the least recently used answers', async () => {
    const cache = createReadCache(1_000);
    for (let i = 0; i < 20; i++) await cache.json(`k${i}`, '1', async () => 'x'.repeat(200));
    expect(cache.stats().bytes).toBeLessThanOrEqual(1_000);
    expect(cache.stats().entries).toBeLessThan(20);
  });
});

describe('cached answers as bytes', () => {
  it('keeps a large answer gzip-compressed as well, decompressing to the same bytes; a small one only as it is', async () => {
    const { gunzipSync } = await import('node:zlib');
    const cache = createReadCache();
    const large = await cache.json('week', '1', async () => ({ bookings: Array.from({ length: 200 }, (_, i) => ({ id: i, client: 'Client name' })) }));
    expect(large.gzipped).not.toBeNull();
    expect(large.gzipped!.length).toBeLessThan(large.body.length / 4);
    expect(gunzipSync(large.gzipped!).equals(large.body)).toBe(true);
    expect(JSON.parse(large.body.toString('utf8')).bookings).toHaveLength(200);
    expect((await cache.json('small', '1', async () => ({ ok: true }))).gzipped).toBeNull();
  });
});
