import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createDiskStorage } from './disk-storage';
import { isValidKey, newKey } from './storage';

let root: string;
beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'dwell-storage-'));
});
afterEach(() => rm(root, { recursive: true, force: true }));

describe('storage keys', () => {
  it('accepts the keys newKey makes', () => {
    expect(isValidKey(newKey('3f8e2c1a-0000-4000-8000-000000000001', 'jpg'))).toBe(true);
  });
  it.each(['../etc/passwd.jpg', 'a/../../b.jpg', '/abs/x.jpg', 'a\\b.jpg', 'A.JPG', 'photo.gif', 'x.jpg.exe', 'a//b.jpg', ''])('refuses %j', (key) =>
    expect(isValidKey(key)).toBe(false),
  );
});

describe('createDiskStorage', () => {
  it('round-trips bytes, leaves no temporary files, and deletes idempotently', async () => {
    const storage = createDiskStorage(root);
    const key = newKey('salon-1', 'png');
    await storage.put(key, Buffer.from('bytes'));
    expect((await storage.get(key))?.toString()).toBe('bytes');
    expect(await readdir(path.join(root, 'salon-1'))).toEqual([key.split('/')[1]]);
    await storage.delete(key);
    await storage.delete(key);
    expect(await storage.get(key)).toBeNull();
  });
  it('refuses a key that would leave the root, before touching the disk', async () => {
    const storage = createDiskStorage(root);
    await expect(storage.put('../outside.jpg', Buffer.from('x'))).rejects.toThrow(/Invalid storage key/);
    await expect(storage.get('../../etc/passwd.jpg')).rejects.toThrow(/Invalid storage key/);
    expect(await readdir(root)).toEqual([]);
  });
});
