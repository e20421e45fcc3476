import fs from 'node:fs';
import path from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { checkKey, type ObjectStore, type StoredObject } from './object-store';

const isMissing = (err: unknown) => (err as NodeJS.ErrnoException).code === 'ENOENT';

/** Objects as files in one folder (the embedded default: `DATA_DIR/uploads`). */
export class FolderObjectStore implements ObjectStore {
  constructor(private readonly dir: string) {}

  private file(key: string) {
    return path.join(this.dir, checkKey(key));
  }

  async put(key: string, body: Readable): Promise<void> {
    const target = this.file(key);
    await fs.promises.mkdir(this.dir, { recursive: true });
    // Opened apart from the copy, so a name that is already taken is refused without touching that file.
    const handle = await fs.promises.open(target, 'wx');
    try {
      await pipeline(body, handle.createWriteStream());
    } catch (err) {
      await fs.promises.rm(target, { force: true });
      throw err;
    }
  }

  async get(key: string): Promise<StoredObject | null> {
    const target = this.file(key);
    try {
      const handle = await fs.promises.open(target, 'r');
      const { size } = await handle.stat();
      return { body: handle.createReadStream(), sizeBytes: size };
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async remove(key: string): Promise<void> {
    await fs.promises.rm(this.file(key), { force: true });
  }

  async list(prefix = ''): Promise<string[]> {
    try {
      const names = await fs.promises.readdir(this.dir);
      return names.filter((name) => name.startsWith(prefix));
    } catch (err) {
      if (isMissing(err)) return [];
      throw err;
    }
  }

  close() {}
}
