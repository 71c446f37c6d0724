import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { assertValidKey, type Storage } from './storage';

/**
 * Files under one root folder, outside the web root. Writes go to a temporary name and are renamed into
 * place, so a reader never sees half a file and a crash leaves no truncated photo behind.
 */
export function createDiskStorage(root: string): Storage {
  const absoluteRoot = path.resolve(root);
  const fileFor = (key: string) => {
    assertValidKey(key);
    const file = path.resolve(absoluteRoot, key);
    // The key pattern already forbids '..'; this is the second lock on the same door.
    if (!file.startsWith(absoluteRoot + path.sep)) throw new Error('Storage key escapes the root');
    return file;
  };
  return {
    async put(key, bytes) {
      const file = fileFor(key);
      await mkdir(path.dirname(file), { recursive: true, mode: 0o700 });
      const temporary = `${file}.${randomBytes(6).toString('hex')}.part`;
      await writeFile(temporary, bytes, { mode: 0o600, flag: 'wx' });
      await rename(temporary, file);
    },
    async get(key) {
      try {
        return await readFile(fileFor(key));
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw error;
      }
    },
    async delete(key) {
      await rm(fileFor(key), { force: true });
    },
  };
}
