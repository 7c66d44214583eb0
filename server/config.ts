import { z } from 'zod';

// Every setting comes from the environment; `npm start` fills in local defaults
// (scripts/start.ts), production sets them explicitly (docker/.env.example).
const bool = z
  .enum(['true', 'false', '1', '0', ''])
  .optional()
  .transform((v) => v === 'true' || v === '1');

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
  TRUST_PROXY: z.string().optional(),

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
