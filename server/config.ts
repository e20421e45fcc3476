import path from 'node:path';
import { z } from 'zod';

const booleanFlag = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'], { error: 'use true or false' })
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const envSchema = z.object({
  PORT: z.coerce
    .number({ error: 'must be a number' })
    .int({ error: 'must be a whole number' })
    .min(1, { error: 'must be between 1 and 65535' })
    .max(65535, { error: 'must be between 1 and 65535' })
    .default(8080),
  DATA_DIR: z.string().min(1, { error: 'must not be empty' }).default('./data'),
  SEED_DEMO: booleanFlag.default(true),
  SEED_CATALOGUE: booleanFlag.default(true),
  SMTP_URL: z.url({ protocol: /^smtps?$/, error: 'must be an smtp:// or smtps:// URL' }).optional(),
  PUBLIC_URL: z.url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL' }).optional(),
  TRUST_PROXY: booleanFlag.default(false),
  WEB_DIR: z.string().min(1).optional(),
});

export interface Config {
  port: number;
  dataDir: string;
  databasePath: string;
  uploadsDir: string;
  webDir: string;
  seedDemo: boolean;
  seedCatalogue: boolean;
  smtpUrl?: string;
  publicUrl?: string;
  trustProxy: boolean;
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
  const dataDir = path.resolve(e.DATA_DIR);
  return {
    port: e.PORT,
    dataDir,
    databasePath: path.join(dataDir, 'dilato.sqlite'),
    uploadsDir: path.join(dataDir, 'uploads'),
    webDir: path.resolve(e.WEB_DIR ?? 'dist'),
    seedDemo: e.SEED_DEMO,
    seedCatalogue: e.SEED_CATALOGUE,
    smtpUrl: e.SMTP_URL,
    publicUrl: e.PUBLIC_URL,
    trustProxy: e.TRUST_PROXY,
  };
}
