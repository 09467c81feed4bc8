import path from 'node:path';
import { z } from 'zod';

const bool = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

/** Every setting the API reads, documented in .env.example. Parsed once at start-up. */
export const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.url({ protocol: /^postgres(ql)?$/ }),
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  APP_ORIGIN: z.url().optional(),
  WEB_DIST: z.string().optional(),
  TRUST_PROXY: bool.default(false),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(1025),
  SMTP_SECURE: bool.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().default('Keybed <no-reply@keybed.example>'),
  SESSION_IDLE_HOURS: z.coerce.number().positive().max(72).default(8),
  SESSION_ABSOLUTE_HOURS: z.coerce.number().positive().max(72).default(12),
  SIGN_IN_FAILURES_PER_ACCOUNT: z.coerce.number().int().min(1).default(10),
  SIGN_IN_FAILURES_PER_ADDRESS: z.coerce.number().int().min(1).default(50),
  RESET_REQUESTS_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  RESET_REQUESTS_PER_ADDRESS: z.coerce.number().int().min(1).default(30),
  WALL_PIN_FAILURES_PER_DEVICE_PER_HOUR: z.coerce.number().int().min(1).default(20),
  UPLOAD_DIR: z.string().min(1).default('.data/uploads'),
  UPLOAD_MAX_MB: z.coerce.number().positive().max(100).default(15),
  UPLOAD_MAX_FILES: z.coerce.number().int().min(1).max(50).default(10),
  S3_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().optional(),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_FORCE_PATH_STYLE: bool.default(true),
  STRIPE_SECRET_KEY: z.string().optional(),
  STRIPE_WEBHOOK_SECRET: z.string().optional(),
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_API_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  STRIPE_API_PROTOCOL: z.enum(['http', 'https']).optional(),
})
  .refine((e) => !e.S3_BUCKET || (e.S3_ACCESS_KEY_ID && e.S3_SECRET_ACCESS_KEY), { error: 'S3_BUCKET needs S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY', path: ['S3_BUCKET'] })
  .refine((e) => !e.STRIPE_SECRET_KEY || e.STRIPE_WEBHOOK_SECRET, { error: 'STRIPE_SECRET_KEY needs STRIPE_WEBHOOK_SECRET', path: ['STRIPE_WEBHOOK_SECRET'] });

export type Env = z.infer<typeof EnvSchema>;

export interface Config {
  env: Env['NODE_ENV'];
  port: number;
  host: string;
  databaseUrl: string;
  databasePoolMax: number;
  appOrigin: string;
  webDist?: string;
  trustProxy: boolean;
  logLevel: Env['LOG_LEVEL'];
  smtp: { host: string; port: number; secure: boolean; user?: string; pass?: string; from: string };
  session: { idleHours: number; absoluteHours: number };
  limits: {
    signInPerAccount: number;
    signInPerAddress: number;
    resetPerAccount: number;
    resetPerAddress: number;
    /** Wrong PINs one wall screen may send in an hour before it is refused. */
    wallPinFailuresPerDevicePerHour: number;
  };
  uploads: {
    /** Local storage folder (used when no S3 bucket is configured). */
    dir: string;
    maxBytes: number;
    maxFiles: number;
    /** S3-compatible object storage; when set, photos go there instead of `dir`. */
    s3?: { endpoint?: string; region: string; bucket: string; accessKeyId: string; secretAccessKey: string; forcePathStyle: boolean };
  };
  /** Card payments through the provider's SDK; absent when not configured (deposits are then refused). */
  payments?: { secretKey: string; webhookSecret: string; host?: string; port?: number; protocol?: 'http' | 'https' };
}

/** Parses the environment, failing with a list of every bad variable. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env): Config {
  const parsed = EnvSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  return {
    env: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST,
    databaseUrl: e.DATABASE_URL,
    databasePoolMax: e.DATABASE_POOL_MAX,
    appOrigin: (e.APP_ORIGIN ?? `http://localhost:${e.PORT}`).replace(/\/$/, ''),
    webDist: e.WEB_DIST ? path.resolve(e.WEB_DIST) : undefined,
    trustProxy: e.TRUST_PROXY,
    logLevel: e.LOG_LEVEL,
    smtp: { host: e.SMTP_HOST, port: e.SMTP_PORT, secure: e.SMTP_SECURE, user: e.SMTP_USER, pass: e.SMTP_PASS, from: e.MAIL_FROM },
    session: { idleHours: e.SESSION_IDLE_HOURS, absoluteHours: e.SESSION_ABSOLUTE_HOURS },
    limits: {
      signInPerAccount: e.SIGN_IN_FAILURES_PER_ACCOUNT,
      signInPerAddress: e.SIGN_IN_FAILURES_PER_ADDRESS,
      resetPerAccount: e.RESET_REQUESTS_PER_ACCOUNT,
      resetPerAddress: e.RESET_REQUESTS_PER_ADDRESS,
      wallPinFailuresPerDevicePerHour: e.WALL_PIN_FAILURES_PER_DEVICE_PER_HOUR,
    },
    uploads: {
      dir: e.UPLOAD_DIR,
      maxBytes: Math.round(e.UPLOAD_MAX_MB * 1024 * 1024),
      maxFiles: e.UPLOAD_MAX_FILES,
      s3: e.S3_BUCKET
        ? { endpoint: e.S3_ENDPOINT, region: e.S3_REGION, bucket: e.S3_BUCKET, accessKeyId: e.S3_ACCESS_KEY_ID!, secretAccessKey: e.S3_SECRET_ACCESS_KEY!, forcePathStyle: e.S3_FORCE_PATH_STYLE }
        : undefined,
    },
    payments: e.STRIPE_SECRET_KEY
      ? { secretKey: e.STRIPE_SECRET_KEY, webhookSecret: e.STRIPE_WEBHOOK_SECRET!, host: e.STRIPE_API_HOST, port: e.STRIPE_API_PORT, protocol: e.STRIPE_API_PROTOCOL }
      : undefined,
  };
}
