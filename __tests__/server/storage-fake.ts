import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import type { S3StorageConfig } from '../../server/config';

export const FAKE_BUCKET = 'dilato-test';

export interface S3Fake {
  /** A storage configuration on the fake with a prefix of its own, so each test sees only its own objects. */
  config: (prefix: string) => S3StorageConfig;
  /** The names under a prefix and an object's bytes, read with a plain SDK client, not the store under test. */
  list: (prefix: string) => Promise<string[]>;
  read: (key: string) => Promise<Buffer>;
  /** Multipart uploads started and neither completed nor aborted. */
  pendingUploads: () => string[];
  close: () => Promise<void>;
}

/** A local S3-compatible server (s3rver) on a loopback port, keeping its objects in a temporary folder. */
export async function startS3Fake(): Promise<S3Fake> {
  const directory = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-s3-'));
  const server = new S3rver({ address: '127.0.0.1', port: 0, directory, silent: true, configureBuckets: [{ name: FAKE_BUCKET, configs: [] }] });
  const uploadsDir = teachAbort(server);
  const { port } = await server.run();
  const endpoint = `http://127.0.0.1:${port}`;
  const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
  const raw = new S3Client({ region: 'us-east-1', endpoint, forcePathStyle: true, credentials });
  return {
    list: async (prefix) => {
      const page = await raw.send(new ListObjectsV2Command({ Bucket: FAKE_BUCKET, Prefix: `${prefix}/` }));
      return (page.Contents ?? []).map((item) => item.Key!.slice(prefix.length + 1));
    },
    pendingUploads: () => (fs.existsSync(uploadsDir) ? fs.readdirSync(uploadsDir) : []),
    read: async (key) => Buffer.from(await (await raw.send(new GetObjectCommand({ Bucket: FAKE_BUCKET, Key: key }))).Body!.transformToByteArray()),
    config: (prefix) => ({
      kind: 's3',
      bucket: FAKE_BUCKET,
      prefix: `${prefix}/`,
      region: 'us-east-1',
      endpoint,
      forcePathStyle: true,
      credentials,
    }),
    close: async () => {
      raw.destroy();
      await server.close();
      fs.rmSync(directory, { recursive: true, force: true });
    },
  };
}

interface KoaContext {
  method: string;
  path: string;
  query: Record<string, unknown>;
  status: number;
}
type KoaMiddleware = (ctx: KoaContext, next: () => Promise<void>) => Promise<void>;

/**
 * s3rver 3.7 keeps a multipart upload's parts in a folder per upload but answers AbortMultipartUpload
 * (DELETE …?uploadId=) with 405; this does what S3 does, dropping the parts, so the tests can see
 * that a refused upload leaves no parts behind. Returns the folder holding the uploads in progress.
 */
function teachAbort(server: S3rver): string {
  const koa = server as unknown as { middleware: KoaMiddleware[]; store: { getResourcePath(bucket: string, key: undefined, resource: string): string } };
  const uploadsDir = koa.store.getResourcePath(FAKE_BUCKET, undefined, 'uploads');
  koa.middleware.unshift(async (ctx, next) => {
    const uploadId = ctx.query.uploadId;
    if (ctx.method !== 'DELETE' || typeof uploadId !== 'string' || !ctx.path.startsWith(`/${FAKE_BUCKET}/`)) return next();
    fs.rmSync(path.join(uploadsDir, path.basename(uploadId)), { recursive: true, force: true });
    ctx.status = 204;
  });
  return uploadsDir;
}
