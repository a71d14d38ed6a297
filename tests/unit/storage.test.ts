import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { deleteObject, getObject, isStorageKey, openObjectStream, putObject, storageRoot, StorageKeyError } from '@/lib/storage';

describe('local storage module', () => {
  it('round-trips bytes by an opaque key inside UPLOAD_DIR', async () => {
    const bytes = new Uint8Array([0, 1, 2, 250, 251, 255]);
    const key = await putObject(bytes);
    expect(isStorageKey(key)).toBe(true);
    expect(storageRoot()).toBe(path.resolve(process.env.UPLOAD_DIR!));
    expect(Array.from((await getObject(key))!)).toEqual([0, 1, 2, 250, 251, 255]);

    const opened = (await openObjectStream(key))!;
    expect(opened.bytes).toBe(6);
    const streamed = new Uint8Array(await new Response(opened.stream).arrayBuffer());
    expect(Array.from(streamed)).toEqual([0, 1, 2, 250, 251, 255]);

    expect(await deleteObject(key)).toBe(true);
    expect(await getObject(key)).toBeNull();
    expect(await deleteObject(key)).toBe(false);
  });

  it('gives a new key for every write, even for the same bytes', async () => {
    const a = await putObject(new Uint8Array([7]));
    const b = await putObject(new Uint8Array([7]));
    expect(a).not.toBe(b);
  });

  it('refuses keys that could walk out of the root', async () => {
    // A file outside the root that a traversal would reach.
    const outside = path.join(path.dirname(storageRoot()), 'secret.txt');
    fs.mkdirSync(path.dirname(outside), { recursive: true });
    fs.writeFileSync(outside, 'do not read');
    for (const key of ['../secret.txt', '..%2fsecret.txt', '/etc/passwd', 'ab/../../secret.txt', '', 'A1B2C3D4-0000-0000-0000-000000000000x']) {
      expect(isStorageKey(key)).toBe(false);
      await expect(getObject(key)).rejects.toBeInstanceOf(StorageKeyError);
      await expect(deleteObject(key)).rejects.toBeInstanceOf(StorageKeyError);
      await expect(openObjectStream(key)).rejects.toBeInstanceOf(StorageKeyError);
    }
    expect(fs.readFileSync(outside, 'utf8')).toBe('do not read');
  });

  it('answers null for a well-formed key with nothing stored', async () => {
    expect(await getObject('00000000-0000-4000-8000-000000000000')).toBeNull();
    expect(await openObjectStream('00000000-0000-4000-8000-000000000000')).toBeNull();
  });
});
