import { z } from 'zod';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/** Repository root, resolved from this file so commands work from any folder. */
export const ROOT = path.resolve(import.meta.dirname, '..');

const bool = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(5170),
  PUBLIC_URL: z.url().optional(),
  DATA_DIR: z.string().default('.data'),
  MEDIA_DIR: z.string().default('media'),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().min(1).max(65535).default(3407),
  DB_NAME: z.string().regex(/^[a-z0-9_]+$/, 'lower-case letters, digits and _ only').default('grovewalk'),
  DB_USER: z.string().regex(/^[a-z0-9_]+$/, 'lower-case letters, digits and _ only').default('grovewalk'),
  DB_PASSWORD: z.string().min(8).optional(),
  /** When false the app expects an existing MariaDB at DB_HOST:DB_PORT instead of starting its own. */
  DB_MANAGED: bool.default(true),
  SESSION_SECRET: z.string().min(32).optional(),
  COOKIE_SECURE: bool.default(false),
  TRUST_PROXY: bool.default(false),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Grovewalk <no-reply@grovewalk.example>'),
  FAKE_SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2526),
  UPLOAD_LIMIT_BYTES: z.coerce.number().int().min(1024).default(4 * 1024 ** 3),
  WORKER: bool.default(true),
  WORKER_CONCURRENCY: z.coerce.number().int().min(1).max(8).default(1),
  /** Milliseconds without a heartbeat before another worker takes a running job over. */
  JOB_STALE_MS: z.coerce.number().int().min(1000).default(30_000),
  SIGN_IN_LIMIT: z.coerce.number().int().min(1).default(10),
  SEED_DEMO: bool.default(true),
  /** bcrypt work factor; tests lower it to keep sign-ups fast. */
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
});

export type Env = z.infer<typeof envSchema>;

/** Everything the server reads from its environment, parsed once at boot. */
export interface Config extends Env {
  dataDir: string;
  mediaDir: string;
  dbPassword: string;
  sessionSecret: string;
  publicUrl: string;
  /** SMTP transport URL the mailer uses; the local fake in development, demo and tests. */
  smtpUrl: string;
  useFakeSmtp: boolean;
}

/** Thrown when the environment is wrong; lists every bad variable at once. */
export class ConfigError extends Error {}

/** Secrets that must survive restarts are kept in the private data folder when not given. */
function persistedSecret(dataDir: string, name: string, bytes: number): string {
  mkdirSync(dataDir, { recursive: true });
  const file = path.join(dataDir, name);
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const value = randomBytes(bytes).toString('hex');
  writeFileSync(file, value + '\n', { mode: 0o600 });
  return value;
}

/** Parses the environment (defaults suit a developer's machine) and fails listing every problem. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new ConfigError(`Bad configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const dataDir = path.resolve(ROOT, e.DATA_DIR);
  const mediaDir = path.resolve(ROOT, e.MEDIA_DIR);
  const useFakeSmtp = !e.SMTP_URL;
  return {
    ...e,
    dataDir,
    mediaDir,
    dbPassword: e.DB_PASSWORD ?? persistedSecret(dataDir, 'db-password', 16),
    sessionSecret: e.SESSION_SECRET ?? persistedSecret(dataDir, 'session-secret', 32),
    publicUrl: (e.PUBLIC_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/$/, ''),
    smtpUrl: e.SMTP_URL ?? `smtp://127.0.0.1:${e.FAKE_SMTP_PORT}`,
    useFakeSmtp,
  };
}
