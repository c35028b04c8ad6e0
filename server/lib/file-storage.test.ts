import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { text } from 'node:stream/consumers';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DiskStorage, StorageKeyError } from './file-storage';

let root: string;
let storage: DiskStorage;

beforeEach(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-storage-'));
  storage = new DiskStorage(path.join(root, 'uploads'));
});
afterEach(() => fs.rmSync(root, { recursive: true, force: true }));

describe('DiskStorage', () => {
  it('stores bytes under the upload folder and reads them back with their size', async () => {
    await storage.put('visits/7/a1.jpg', Buffer.from('picture bytes'), 'image/jpeg');
    expect(fs.readFileSync(path.join(root, 'uploads', 'visits', '7', 'a1.jpg'), 'utf8')).toBe('picture bytes');
    const stored = await storage.get('visits/7/a1.jpg');
    expect(stored?.size).toBe(13);
    expect(await text(stored!.body)).toBe('picture bytes');
  });

  it('answers null for a key with nothing stored', async () => {
    expect(await storage.get('visits/7/none.jpg')).toBeNull();
  });

  it('never overwrites a stored file', async () => {
    await storage.put('visits/7/a1.jpg', Buffer.from('first'), 'image/jpeg');
    await expect(storage.put('visits/7/a1.jpg', Buffer.from('second'), 'image/jpeg')).rejects.toMatchObject({ code: 'EEXIST' });
    expect(fs.readFileSync(path.join(root, 'uploads', 'visits', '7', 'a1.jpg'), 'utf8')).toBe('first');
  });

  it('deletes a file, and deleting it again is not an error', async () => {
    await storage.put('visits/7/a1.jpg', Buffer.from('x'), 'image/jpeg');
    await storage.delete('visits/7/a1.jpg');
    await storage.delete('visits/7/a1.jpg');
    expect(fs.existsSync(path.join(root, 'uploads', 'visits', '7', 'a1.jpg'))).toBe(false);
  });

  it.each(['../outside.jpg', 'visits/../../outside.jpg', '/etc/passwd', 'visits/7/..', 'visits//7.jpg', 'visits\\7.jpg', '.hidden', 'visits/7/.jpg', '', 'visits/7/a b.jpg'])(
    'refuses the key %j on every operation, so nothing is written or read outside the folder',
    async (key) => {
      await expect(storage.put(key, Buffer.from('x'), 'image/jpeg')).rejects.toBeInstanceOf(StorageKeyError);
      await expect(storage.get(key)).rejects.toBeInstanceOf(StorageKeyError);
      await expect(storage.delete(key)).rejects.toBeInstanceOf(StorageKeyError);
      expect(fs.readdirSync(root)).toEqual([]);
    },
  );
});
