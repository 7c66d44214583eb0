import { isIP } from 'node:net';
import { z } from 'zod';

// Every setting comes from the environment; `npm start` fills in local defaults
// (scripts/start.ts), production sets them explicitly (docker/.env.example).
const bool = z
  .enum(['true', 'false', '1', '0', ''])
  .optional()
  .transform((v) => v === 'true' || v === '1');

const trustProxyNames = new Set(['loopback', 'linklocal', 'uniquelocal']);
/** A valid Express "trust proxy" value that does not trust everyone. */
export function isTrustProxySetting(value: string): boolean {
  if (/^\d+$/.test(value.trim())) return true;
  return value.split(',').every((entry) => {
    const [address, prefix, ...rest] = entry.trim().split('/');
    if (rest.length) return false;
    if (trustProxyNames.has(address) && prefix === undefined) return true;
    const family = isIP(address);
    if (!family) return false;
    return prefix === undefined || (/^\d+$/.test(prefix) && Number(prefix) <= (family === 4 ? 32 : 128));
  });
}

const schema = z.object({
  NODE_ENV: z.string().default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required'),
  DATABASE_POOL_SIZE: z.coerce.number().int().min(1).default(10),
  /** The address people use to reach the app: links in e-mails and QR labels. */
  APP_URL: z.string().url().optional(),
  JWT_SECRET: z.string().min(32, 'JWT_SECRET must be at least 32 characters'),
  SESSION_HOURS: z.coerce.number().positive().default(12),
  /** Set when the app is served over HTTPS: Secure cookies with the __Host- prefix. */
  COOKIE_SECURE: bool,
  /**
   * Which proxies may name the caller's address (X-Forwarded-For): their addresses or subnets, or
   * Express's names loopback, linklocal, uniquelocal, comma-separated. A hop count is accepted but
   * is only safe when nothing can reach the app except through that many proxies; "true" (believe
   * anyone) is refused. Unset: the connection's own address is used.
   */
  TRUST_PROXY: z
    .string()
    .optional()
    .refine((v) => !v || isTrustProxySetting(v), 'TRUST_PROXY: list proxy addresses or subnets (e.g. 172.29.41.1 or 10.0.0.0/8)'),

  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().default('gridkeep'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: bool,
  UPLOAD_MAX_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(25 * 1024 * 1024),

  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().default(2525),
  SMTP_SECURE: bool,
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().default('Gridkeep <service@gridkeep.test>'),
  /** Where "new ticket" notices for the office go. */
  OFFICE_EMAIL: z.string().email().default('office@gridkeep.test'),
  /** Set only when the local SMTP fake is in use: the folder it writes received mail to. */
  DEV_MAILBOX_DIR: z.string().optional(),
  /** Run the outbound mail worker in this process (default on). */
  MAIL_WORKER: z
    .enum(['true', 'false', '1', '0'])
    .default('true')
    .transform((v) => v === 'true' || v === '1'),
  MAIL_POLL_MS: z.coerce.number().int().positive().default(2000),
});

export type Config = z.infer<typeof schema> & { APP_URL: string };

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const result = schema.safeParse(env);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Configuration is not valid:\n${lines.join('\n')}`);
  }
  const c = result.data;
  return { ...c, APP_URL: (c.APP_URL ?? `http://127.0.0.1:${c.PORT}`).replace(/\/$/, '') };
}

let current: Config | undefined;
/** The process-wide configuration, read once on first use. */
export function config(): Config {
  current ??= loadConfig();
  return current;
}
