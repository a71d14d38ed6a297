import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import fsp from 'node:fs/promises';
import path from 'node:path';
import { Readable } from 'node:stream';
import { s3Delete, s3Enabled, s3Get, s3Put, s3Stream } from './storage-s3';

/**
 * The one module that stores uploaded files: on local disk by default, or in an S3-compatible bucket when
 * S3_BUCKET is set (lib/storage-s3.ts). Callers hold only an opaque key that this
 * module generated; a key is never a path, so no caller can reach outside the storage root.
 */

/** Keys are lower-case UUIDs: nothing else is accepted, so "../x", "/etc" or "a/b" can never name a file. */
const KEY_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export class StorageKeyError extends Error {
  constructor(key: string) {
    super(`Not a storage key: ${JSON.stringify(key.slice(0, 80))}`);
  }
}

/**
 * Read at call time, so tests and the e2e server can point it at their own folder. The build is told not
 * to trace these paths: uploads are data, not part of the server bundle.
 */
export function storageRoot(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.env.UPLOAD_DIR ?? path.join('data', 'uploads'));
}

export function isStorageKey(key: string): boolean {
  return KEY_PATTERN.test(key);
}

function fileFor(key: string): string {
  if (!isStorageKey(key)) throw new StorageKeyError(key);
  const root = storageRoot();
  // Two-character fan-out keeps any one folder small.
  const file = path.join(/*turbopackIgnore: true*/ root, key.slice(0, 2), key);
  // Belt and braces: the pattern already rules this out.
  if (path.relative(root, file).startsWith('..')) throw new StorageKeyError(key);
  return file;
}

function checkedKey(key: string): string {
  if (!isStorageKey(key)) throw new StorageKeyError(key);
  return key;
}

export function newStorageKey(): string {
  return randomUUID();
}

const TEMP_SUFFIX = '.tmp';

/**
 * Writes the bytes under a new key and returns it. Written to a temp name then renamed, so a reader never
 * sees half a file; if the write or the rename fails (disk full, a crash of the copy), the temp file goes.
 */
export async function putObject(bytes: Uint8Array): Promise<string> {
  const key = newStorageKey();
  if (s3Enabled()) {
    await s3Put(key, bytes);
    return key;
  }
  const file = fileFor(key);
  await fsp.mkdir(path.dirname(file), { recursive: true });
  const tmp = `${file}.${process.pid}${TEMP_SUFFIX}`;
  try {
    await fsp.writeFile(tmp, bytes, { flag: 'wx' });
    await fsp.rename(tmp, file);
  } catch (err) {
    await fsp.rm(tmp, { force: true }).catch(() => undefined);
    throw err;
  }
  return key;
}

/**
 * A temp file older than this was left by a process that died mid-write (kill -9, power cut): no live
 * write takes more than a few seconds, and another server process sharing the folder may be mid-write now.
 */
export const STALE_TEMP_MS = 10 * 60 * 1000;

/** Removes temp files left behind by dead writers; run at server start (instrumentation.ts). Returns how many went. */
export async function sweepStaleTemps(now = Date.now()): Promise<number> {
  const root = storageRoot();
  let removed = 0;
  let dirs: string[];
  try {
    dirs = await fsp.readdir(root);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return 0;
    throw err;
  }
  for (const dir of dirs) {
    const folder = path.join(/*turbopackIgnore: true*/ root, dir);
    const names = await fsp.readdir(folder).catch(() => [] as string[]);
    for (const name of names) {
      if (!name.endsWith(TEMP_SUFFIX)) continue;
      const file = path.join(/*turbopackIgnore: true*/ folder, name);
      const stat = await fsp.stat(file).catch(() => null);
      if (stat && now - stat.mtimeMs > STALE_TEMP_MS) {
        await fsp.rm(file, { force: true });
        removed++;
      }
    }
  }
  return removed;
}

/** The whole object, or null when there is none under this key. */
export async function getObject(key: string): Promise<Buffer | null> {
  if (s3Enabled()) return s3Get(checkedKey(key));
  try {
    return await fsp.readFile(fileFor(key));
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw err;
  }
}

/** A web stream of the object plus its size, or null when there is none. */
export async function openObjectStream(key: string): Promise<{ stream: ReadableStream<Uint8Array>; bytes: number } | null> {
  if (s3Enabled()) return s3Stream(checkedKey(key));
  const file = fileFor(key);
  try {
    const stat = await fsp.stat(file);
    const stream = Readable.toWeb(fs.createReadStream(file)) as ReadableStream<Uint8Array>;
    return { stream, bytes: stat.size };
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw err;
  }
}

/** Removes the object; true if something was removed. */
export async function deleteObject(key: string): Promise<boolean> {
  if (s3Enabled()) return s3Delete(checkedKey(key));
  try {
    await fsp.unlink(fileFor(key));
    return true;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return false;
    throw err;
  }
}
