import { DeleteObjectCommand, GetObjectCommand, ListObjectsV2Command, NoSuchKey, S3Client } from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import type { Readable } from 'node:stream';
import type { S3StorageConfig } from '../config';
import { checkKey, type ObjectStore, type StoredObject } from './object-store';

const isMissing = (err: unknown) => err instanceof NoSuchKey || (err as { name?: string }).name === 'NoSuchKey' || (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404;

/** Objects in an S3-compatible bucket under a key prefix, streamed both ways (multipart upload in 5 MB parts). */
export class S3ObjectStore implements ObjectStore {
  private readonly client: S3Client;
  private readonly bucket: string;
  private readonly prefix: string;

  constructor(config: S3StorageConfig) {
    this.bucket = config.bucket;
    this.prefix = config.prefix;
    this.client = new S3Client({
      region: config.region,
      endpoint: config.endpoint,
      forcePathStyle: config.forcePathStyle,
      credentials: config.credentials,
    });
  }

  private key(key: string) {
    return this.prefix + checkKey(key);
  }

  async put(key: string, body: Readable): Promise<void> {
    const Key = this.key(key);
    // queueSize 1: at most one 5 MB part is held while it is sent, whatever the file's size.
    const upload = new Upload({ client: this.client, params: { Bucket: this.bucket, Key, Body: body, ContentType: 'application/pdf' }, queueSize: 1, leavePartsOnError: false });
    try {
      await upload.done();
    } catch (err) {
      // A multipart upload is aborted by the SDK; a small file may already be whole, so it is deleted too.
      await upload.abort().catch(() => undefined);
      await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key })).catch(() => undefined);
      throw err;
    }
  }

  async get(key: string): Promise<StoredObject | null> {
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: this.key(key) }));
      return { body: res.Body as Readable, sizeBytes: Number(res.ContentLength ?? 0) };
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async remove(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: this.key(key) }));
  }

  async list(prefix = ''): Promise<string[]> {
    const keys: string[] = [];
    let ContinuationToken: string | undefined;
    do {
      const page = await this.client.send(new ListObjectsV2Command({ Bucket: this.bucket, Prefix: this.prefix + prefix, ContinuationToken }));
      for (const item of page.Contents ?? []) if (item.Key) keys.push(item.Key.slice(this.prefix.length));
      ContinuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (ContinuationToken);
    return keys;
  }

  close() {
    this.client.destroy();
  }
}
