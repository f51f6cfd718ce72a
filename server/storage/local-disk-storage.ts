import { randomBytes } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import type { PhotoStorage } from './photo-storage';

/** A key is 32 hex digits and a short extension; anything else is refused (no path tricks). */
const keyPattern = /^[0-9a-f]{32}\.(jpg|png|webp)$/;

/**
 * Photos as files in one folder (created on first write), under random names
 * from 128 bits of crypto randomness, so a name reveals nothing and cannot be guessed.
 * Example: const key = await localDiskStorage('/srv/uploads').put(bytes, 'jpg') → 'a1b2….jpg'
 */
export function localDiskStorage(dir: string): PhotoStorage {
  const fileOf = (key: string) => {
    if (!keyPattern.test(key)) throw new Error(`Not a storage key: ${key}`);
    return path.join(dir, key);
  };
  return {
    async put(bytes, extension) {
      await fs.mkdir(dir, { recursive: true });
      const key = `${randomBytes(16).toString('hex')}.${extension}`;
      // 'wx': never overwrite (a collision of 128 random bits would be a bug elsewhere).
      await fs.writeFile(fileOf(key), bytes, { flag: 'wx', mode: 0o640 });
      return key;
    },
    async get(key) {
      try {
        return await fs.readFile(fileOf(key));
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw error;
      }
    },
    async remove(key) {
      await fs.rm(fileOf(key), { force: true });
    },
  };
}
