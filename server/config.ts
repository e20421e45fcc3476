import net from 'node:net';
import path from 'node:path';
import { z } from 'zod';

const booleanFlag = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'], { error: 'use true or false' })
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

/** What express may trust in X-Forwarded-*: nothing, exactly N proxy hops, or proxies at these addresses. */
export type TrustProxy = false | number | string[];

const PROXY_NAMES = new Set(['loopback', 'linklocal', 'uniquelocal']);
const isProxyAddress = (item: string) => {
  if (PROXY_NAMES.has(item)) return true;
  const [address, bits, ...rest] = item.split('/');
  const family = net.isIP(address);
  return family !== 0 && rest.length === 0 && (bits === undefined || (/^\d+$/.test(bits) && Number(bits) <= (family === 4 ? 32 : 128)));
};

const trustProxySchema = z.string().transform((raw, ctx): TrustProxy => {
  const value = raw.trim().toLowerCase();
  if (['false', 'no', '0'].includes(value)) return false;
  if (/^\d+$/.test(value) && Number(value) <= 10) return Number(value);
  const items = value.split(',').map((item) => item.trim()).filter(Boolean);
  if (value !== 'true' && value !== 'yes' && items.length > 0 && items.every(isProxyAddress)) return items;
  ctx.addIssue({
    code: 'custom',
    message:
      'give the number of proxies in front of Dilato (e.g. 1), or their addresses (e.g. loopback or 10.0.0.5), or false; ' +
      '"true" is not accepted because it would let anyone reaching Dilato directly forge their address',
  });
  return z.NEVER;
});

const envSchema = z.object({
  PORT: z.coerce
    .number({ error: 'must be a number' })
    .int({ error: 'must be a whole number' })
    .min(0, { error: 'must be between 0 (any free port, printed at start) and 65535' })
    .max(65535, { error: 'must be between 0 (any free port, printed at start) and 65535' })
    .default(8080),
  DATA_DIR: z.string().min(1, { error: 'must not be empty' }).default('./data'),
  DATABASE_URL: z.string().regex(/^postgres(ql)?:\/\/.+/, { error: 'must be a postgres:// URL (leave it unset for the embedded SQLite database)' }).optional(),
  SEED_DEMO: booleanFlag.default(true),
  SEED_CATALOGUE: booleanFlag.default(true),
  SMTP_URL: z.url({ protocol: /^smtps?$/, error: 'must be an smtp:// or smtps:// URL' }).optional(),
  PUBLIC_URL: z.url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL' }).optional(),
  TRUST_PROXY: trustProxySchema.default(false),
  WEB_DIR: z.string().min(1).optional(),
  PAYMENTS_SECRET_KEY: z.string().regex(/^(sk|rk)_/, { error: 'must be the provider’s secret key (sk_… or rk_…)' }).optional(),
  PAYMENTS_WEBHOOK_SECRET: z.string().regex(/^whsec_/, { error: 'must be the webhook signing secret (whsec_…)' }).optional(),
  PAYMENTS_API_URL: z.url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL' }).optional(),
  STORAGE_URL: z
    .string()
    .regex(/^s3:\/\/[a-z0-9][a-z0-9.-]{1,61}[a-z0-9](\/.*)?$/, { error: 'must be s3://bucket or s3://bucket/prefix (leave it unset for the uploads folder in DATA_DIR)' })
    .optional(),
  STORAGE_ENDPOINT: z.url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL' }).optional(),
  AWS_ENDPOINT_URL: z.url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL' }).optional(),
  AWS_REGION: z.string().min(1).default('us-east-1'),
  AWS_ACCESS_KEY_ID: z.string().min(1).optional(),
  AWS_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  STORAGE_PATH_STYLE: booleanFlag.optional(),
});

export interface Config {
  port: number;
  dataDir: string;
  /** The SQLite file, or the PostgreSQL URL when DATABASE_URL is set. */
  databasePath: string;
  onPostgres: boolean;
  uploadsDir: string;
  storage: StorageConfig;
  webDir: string;
  seedDemo: boolean;
  seedCatalogue: boolean;
  smtpUrl?: string;
  publicUrl?: string;
  trustProxy: TrustProxy;
  /** The payment provider; absent means the embedded fake provider. */
  payments?: PaymentsConfig;
}

/** Where data sheets are kept: the uploads folder, or an S3-compatible bucket when STORAGE_URL is set. */
export type StorageConfig = { kind: 'folder'; dir: string } | S3StorageConfig;

export interface S3StorageConfig {
  kind: 's3';
  bucket: string;
  /** Put before every key: empty, or ending in "/". */
  prefix: string;
  region: string;
  /** An S3-compatible server's address; absent means AWS itself. */
  endpoint?: string;
  /** bucket in the path (http://host/bucket/key), as most self-hosted S3-compatible servers want. */
  forcePathStyle: boolean;
  /** Absent means the SDK's own credential chain (instance role, shared profile…). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
}

export interface PaymentsConfig {
  secretKey: string;
  webhookSecret: string;
  /** Where the provider's API answers; absent means the SDK's own default host. */
  apiUrl?: string;
}

export class ConfigError extends Error {}

/** Parses the environment once at start; a bad value stops the server with a message naming it. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const present = Object.fromEntries(
    Object.entries(env).filter(([key, value]) => key in envSchema.shape && value !== undefined && value !== ''),
  );
  const parsed = envSchema.safeParse(present);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new ConfigError(`Dilato cannot start: the environment has bad values\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const paymentsNamed = [e.PAYMENTS_SECRET_KEY, e.PAYMENTS_WEBHOOK_SECRET, e.PAYMENTS_API_URL].some((v) => v !== undefined);
  if (paymentsNamed && (!e.PAYMENTS_SECRET_KEY || !e.PAYMENTS_WEBHOOK_SECRET)) {
    throw new ConfigError(
      'Dilato cannot start: the environment has bad values\n  PAYMENTS_SECRET_KEY, PAYMENTS_WEBHOOK_SECRET: set both for a real payment provider, or neither for the embedded fake',
    );
  }
  if ((e.AWS_ACCESS_KEY_ID === undefined) !== (e.AWS_SECRET_ACCESS_KEY === undefined)) {
    throw new ConfigError(
      'Dilato cannot start: the environment has bad values\n  AWS_ACCESS_KEY_ID, AWS_SECRET_ACCESS_KEY: set both, or neither to use the SDK\u2019s own credentials',
    );
  }
  const dataDir = path.resolve(e.DATA_DIR);
  const uploadsDir = path.join(dataDir, 'uploads');
  return {
    port: e.PORT,
    dataDir,
    databasePath: e.DATABASE_URL ?? path.join(dataDir, 'dilato.sqlite'),
    onPostgres: e.DATABASE_URL !== undefined,
    uploadsDir,
    storage: e.STORAGE_URL ? s3Storage(e.STORAGE_URL, e) : { kind: 'folder', dir: uploadsDir },
    webDir: path.resolve(e.WEB_DIR ?? 'dist'),
    seedDemo: e.SEED_DEMO,
    seedCatalogue: e.SEED_CATALOGUE,
    smtpUrl: e.SMTP_URL,
    publicUrl: e.PUBLIC_URL,
    trustProxy: e.TRUST_PROXY,
    payments: e.PAYMENTS_SECRET_KEY && e.PAYMENTS_WEBHOOK_SECRET ? { secretKey: e.PAYMENTS_SECRET_KEY, webhookSecret: e.PAYMENTS_WEBHOOK_SECRET, apiUrl: e.PAYMENTS_API_URL } : undefined,
  };
}

function s3Storage(url: string, e: z.infer<typeof envSchema>): S3StorageConfig {
  const [bucket, ...rest] = url.slice('s3://'.length).split('/');
  const prefix = rest.filter(Boolean).join('/');
  const endpoint = e.STORAGE_ENDPOINT ?? e.AWS_ENDPOINT_URL;
  return {
    kind: 's3',
    bucket,
    prefix: prefix ? `${prefix}/` : '',
    region: e.AWS_REGION,
    endpoint,
    forcePathStyle: e.STORAGE_PATH_STYLE ?? endpoint !== undefined,
    credentials: e.AWS_ACCESS_KEY_ID && e.AWS_SECRET_ACCESS_KEY ? { accessKeyId: e.AWS_ACCESS_KEY_ID, secretAccessKey: e.AWS_SECRET_ACCESS_KEY } : undefined,
  };
}
