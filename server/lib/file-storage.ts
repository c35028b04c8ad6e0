import { constants as fsConstants } from 'node:fs';
import fs from 'node:fs/promises';
import path from 'node:path';
import type { Readable } from 'node:stream';

export interface StoredFile {
  body: Readable;
  size: number;
}

/**
 * Where attachment files live. Keys are chosen by the server (`visits/<visitId>/<uuid>.jpg`),
 * never by the uploader, so an object store can take the disk's place without a migration.
 */
export interface FileStorage {
  /** Stores new bytes under a new key; refuses to overwrite an existing key. */
  put(key: string, data: Buffer, mimeType: string): Promise<void>;
  /** The stored bytes as a stream, or null when nothing is stored under the key. */
  get(key: string): Promise<StoredFile | null>;
  /** Removes the key; removing a key that is not there is not an error. */
  delete(key: string): Promise<void>;
}

export class StorageKeyError extends Error {
  constructor(key: string) {
    super(`Refused storage key ${JSON.stringify(key)}: keys are relative, '/'-separated names of letters, digits, '.', '_' and '-'.`);
    this.name = 'StorageKeyError';
  }
}

// Every segment starts with a letter or digit, so '.', '..' and hidden names cannot occur.
const SAFE_KEY = /^[A-Za-z0-9][A-Za-z0-9._-]*(?:\/[A-Za-z0-9][A-Za-z0-9._-]*)*$/;

export function assertSafeKey(key: string): void {
  if (key.length > 512 || !SAFE_KEY.test(key)) throw new StorageKeyError(key);
}

/** Files on the local disk under one root folder (UPLOAD_DIR). */
export class DiskStorage implements FileStorage {
  readonly root: string;

  constructor(root: string) {
    this.root = path.resolve(root);
  }

  /** The key's absolute path; a second check that it stays inside the root. */
  pathOf(key: string): string {
    assertSafeKey(key);
    const full = path.resolve(this.root, ...key.split('/'));
    if (!full.startsWith(this.root + path.sep)) throw new StorageKeyError(key);
    return full;
  }

  async put(key: string, data: Buffer, _mimeType: string): Promise<void> {
    const full = this.pathOf(key);
    await fs.mkdir(path.dirname(full), { recursive: true });
    // 'wx' fails if the file exists: a stored file is never replaced behind its row's back.
    try {
      await fs.writeFile(full, data, { flag: fsConstants.O_CREAT | fsConstants.O_EXCL | fsConstants.O_WRONLY, mode: 0o640 });
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EEXIST') await fs.rm(full, { force: true });
      throw err;
    }
  }

  async get(key: string): Promise<StoredFile | null> {
    const full = this.pathOf(key);
    let handle: fs.FileHandle;
    try {
      handle = await fs.open(full, 'r');
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw err;
    }
    try {
      const { size } = await handle.stat();
      return { body: handle.createReadStream(), size };
    } catch (err) {
      await handle.close();
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await fs.rm(this.pathOf(key), { force: true });
  }
}
