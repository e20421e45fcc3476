import type { Readable } from 'node:stream';
import type { StorageConfig } from '../config';
import { FolderObjectStore } from './folder-object-store';
import { S3ObjectStore } from './s3-object-store';

/** A stored object opened for reading: the bytes as a stream, and how many there are. */
export interface StoredObject {
  body: Readable;
  sizeBytes: number;
}

/**
 * Where data sheets (and any other uploaded file) are kept: a folder on disk, or an S3-compatible bucket.
 * Keys are flat names chosen by Dilato itself (letters, digits, dot, dash, underscore).
 */
export interface ObjectStore {
  /** Writes the stream under the key; on any failure nothing is left under the key. */
  put(key: string, body: Readable): Promise<void>;
  /** The object, or null when there is none under the key. */
  get(key: string): Promise<StoredObject | null>;
  /** Deletes the object; a key with nothing under it is not an error. */
  remove(key: string): Promise<void>;
  /** Every key that starts with the prefix, in no particular order. */
  list(prefix?: string): Promise<string[]>;
  /** Releases connections (S3); the folder store has nothing to release. */
  close(): void;
}

const KEY = /^[A-Za-z0-9_-][A-Za-z0-9._-]*$/;

export function checkKey(key: string): string {
  if (!KEY.test(key)) throw new Error(`Not a storage key: ${JSON.stringify(key)}`);
  return key;
}

/** The store the configuration names; also used by scripts that move a shop's files. */
export function openObjectStore(config: StorageConfig): ObjectStore {
  return config.kind === 's3' ? new S3ObjectStore(config) : new FolderObjectStore(config.dir);
}
