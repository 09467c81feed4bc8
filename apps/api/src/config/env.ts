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
});

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
    webDist: e.WEB_DIST,
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
  };
}
