// Copies the data-sheet files from one store to another and checks them by count and sha256. A store
// is only list/get/put over streams, so an S3 bucket can stand in for either folder later.
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { ObjectStore } from '../../server/storage/object-store';

export interface FileStore {
  /** Names of the stored files, sorted. */
  list(): Promise<string[]>;
  get(name: string): Promise<Readable>;
  put(name: string, body: Readable): Promise<void>;
  /** Where the store is, for messages. */
  describe?: string;
}

export function folderStore(dir: string): FileStore {
  return {
    describe: dir,
    list: async () => (fs.existsSync(dir) ? fs.readdirSync(dir, { withFileTypes: true }).filter((e) => e.isFile()).map((e) => e.name).sort() : []),
    get: async (name) => fs.createReadStream(path.join(dir, name)),
    put: async (name, body) => {
      fs.mkdirSync(dir, { recursive: true });
      // Written under a temporary name first, so an interrupted copy leaves no half file under the real one.
      const partial = path.join(dir, `.${name}.partial`);
      await pipeline(body, fs.createWriteStream(partial, { flags: 'wx' }));
      fs.renameSync(partial, path.join(dir, name));
    },
  };
}

/** The product's own object store (an S3-compatible bucket under STORAGE_URL) as a copy target or source. */
export function objectStoreFiles(store: ObjectStore, describe: string): FileStore {
  return {
    describe,
    list: async () => (await store.list()).sort(),
    get: async (name) => {
      const found = await store.get(name);
      if (!found) throw new Error(`data sheet ${name} is missing from ${describe}`);
      return found.body;
    },
    put: (name, body) => store.put(name, body),
  };
}

async function sha256(store: FileStore, name: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of await store.get(name)) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

export interface UploadsReport {
  files: number;
  bytes: number;
}

/** Copies every file of `from` into the empty store `to`, then reads both back and compares names and sha256. */
export async function copyUploads(from: FileStore, to: FileStore): Promise<UploadsReport> {
  const existing = await to.list();
  if (existing.length) throw new Error(`the target uploads ${to.describe ?? ""} already hold ${existing.length} files; copy into an empty one`);
  const names = await from.list();
  let bytes = 0;
  for (const name of names) {
    const body = await from.get(name);
    body.on('data', (chunk: Buffer) => (bytes += chunk.length));
    await to.put(name, body);
  }
  const copied = await to.list();
  if (copied.length !== names.length || copied.some((n, i) => n !== names[i])) {
    throw new Error(`the target uploads hold ${copied.length} files, the source ${names.length}`);
  }
  for (const name of names) {
    const [a, b] = [await sha256(from, name), await sha256(to, name)];
    if (a !== b) throw new Error(`data sheet ${name} differs after copying (sha256 ${a.slice(0, 12)} vs ${b.slice(0, 12)})`);
  }
  return { files: names.length, bytes };
}
