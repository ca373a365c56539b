// Where uploaded and generated files live. Keys are made by the server (never a user's file
// name). Local folder by default; an S3 adapter can implement the same interface.
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { randomUUID } from 'node:crypto';

export interface FileStorage {
  put(key: string, body: Buffer | Uint8Array): Promise<void>;
  get(key: string): Promise<Buffer>;
  remove(key: string): Promise<void>;
}

/** A fresh key under a prefix, e.g. newKey('dems', '.tif') → 'dems/6f1c….tif'. */
export function newKey(prefix: string, ext: string): string {
  return `${prefix}/${randomUUID()}${ext}`;
}

export class LocalFileStorage implements FileStorage {
  constructor(private readonly root: string) {}

  private resolve(key: string): string {
    if (!/^[a-z0-9-]+(\/[a-z0-9-]+)*\.[a-z0-9]+$/i.test(key)) throw new Error(`invalid storage key: ${key}`);
    return path.join(this.root, key);
  }

  async put(key: string, body: Buffer | Uint8Array): Promise<void> {
    const p = this.resolve(key);
    await mkdir(path.dirname(p), { recursive: true });
    await writeFile(p, body);
  }

  get(key: string): Promise<Buffer> {
    return readFile(this.resolve(key));
  }

  async remove(key: string): Promise<void> {
    await rm(this.resolve(key), { force: true });
  }
}
