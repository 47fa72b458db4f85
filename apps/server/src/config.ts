import { randomBytes } from 'node:crypto';
import { availableParallelism } from 'node:os';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';

const packageDir = resolve(dirname(fileURLToPath(import.meta.url)), '..');

const booleanFromEnv = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'], { message: 'must be true or false' })
  .transform((value) => value === 'true' || value === '1' || value === 'yes');

const portFromEnv = (fallback: number) =>
  z.coerce
    .number({ message: 'must be a whole number between 1 and 65535' })
    .int('must be a whole number between 1 and 65535')
    .min(1, 'must be a whole number between 1 and 65535')
    .max(65535, 'must be a whole number between 1 and 65535')
    .default(fallback);

const urlFromEnv = z.url({ message: 'must be an absolute URL such as http://localhost:3000' });

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test'], { message: 'must be development, production or test' }).default('development'),
  PORT: portFromEnv(3000),
  HOST: z.string().min(1).optional(),
  DATA_DIR: z.string().min(1, 'must be a folder path').default('./data'),
  DATABASE_FILE: z.string().min(1).optional(),
  PUBLIC_URL: urlFromEnv.optional(),
  SESSION_SECRET: z.string().min(32, 'must be at least 32 characters (e.g. `openssl rand -hex 32`)').optional(),
  SESSION_TTL_HOURS: z.coerce.number({ message: 'must be a number of hours' }).positive('must be a positive number of hours').default(24 * 7),
  TRUST_PROXY: booleanFromEnv.default(false),
  GOOGLE_CLIENT_ID: z.string().min(1).optional(),
  GOOGLE_CLIENT_SECRET: z.string().min(1).optional(),
  GOOGLE_AUTH_URL: urlFromEnv.optional(),
  GOOGLE_TOKEN_URL: urlFromEnv.optional(),
  GOOGLE_USERINFO_URL: urlFromEnv.optional(),
  OAUTH_FAKE_PORT: portFromEnv(3001),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, 'must start with smtp:// or smtps://').optional(),
  MAIL_FROM: z.string().min(3).default('Demandscape <no-reply@demandscape.example>'),
  MAIL_TRANSPORT: z.enum(['smtp', 'capture'], { message: 'must be smtp or capture' }).optional(),
  MAIL_CATCHER_SMTP_PORT: portFromEnv(1025),
  MAIL_CATCHER_WEB_PORT: portFromEnv(1080),
  START_STANDINS: booleanFromEnv.optional(),
  DEMO_SEED: booleanFromEnv.optional(),
  DEMO_CUSTOMERS: booleanFromEnv.default(true),
  RATE_LIMIT_AUTH_PER_MINUTE: z.coerce.number({ message: 'must be a whole number' }).int().min(1, 'must be at least 1').default(10),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  WEB_DIST: z.string().min(1).optional(),
  STRIPE_SECRET_KEY: z.string().regex(/^(sk|rk)_/, 'must be a secret key starting with sk_ (or a restricted key rk_)').optional(),
  STRIPE_WEBHOOK_SECRET: z.string().regex(/^whsec_/, 'must be a webhook signing secret starting with whsec_').optional(),
  STRIPE_API_HOST: z.string().min(1).optional(),
  STRIPE_API_PORT: portFromEnv(3002),
  STRIPE_API_PROTOCOL: z.enum(['http', 'https'], { message: 'must be http or https' }).optional(),
  RUNNER_CONCURRENCY: z.coerce.number({ message: 'must be a whole number' }).int('must be a whole number').min(1, 'must be at least 1').max(64, 'must be at most 64').optional(),
  UPLOAD_MAX_BYTES: z.coerce.number({ message: 'must be a whole number of bytes' }).int('must be a whole number of bytes').min(1, 'must be at least 1 byte').default(200 * 1024 * 1024),
});

/** Validated server settings; every field has a safe local default except production secrets. */
export interface AppConfig {
  nodeEnv: 'development' | 'production' | 'test';
  port: number;
  host: string | undefined;
  dataDir: string;
  /** SQLite file path, or ':memory:' in tests. */
  databaseFile: string;
  publicUrl: string;
  secureCookies: boolean;
  sessionSecret: string;
  sessionTtlMs: number;
  trustProxy: boolean;
  google: {
    enabled: boolean;
    clientId: string;
    clientSecret: string;
    authorizationUrl: string;
    tokenUrl: string;
    userInfoUrl: string;
    callbackUrl: string;
  };
  oauthFakePort: number;
  mail: { transport: 'smtp' | 'capture'; smtpUrl: string; from: string; catcherSmtpPort: number; catcherWebPort: number };
  startStandIns: boolean;
  demoSeed: boolean;
  /** With demoSeed: also the invented demo customer file and one queued surface (DEMO_CUSTOMERS, default true). */
  demoCustomers: boolean;
  rateLimitAuthPerMinute: number;
  logLevel: string;
  webDist: string;
  /** Payments through the provider's SDK; outside production it points at the local stand-in (infra/stripe-fake). */
  billing: {
    /** False in production until STRIPE_SECRET_KEY is set (billing routes then answer 503). */
    enabled: boolean;
    secretKey: string;
    webhookSecret: string;
    /** Unset = the SDK's default (the real provider). */
    apiHost: string | undefined;
    apiPort: number | undefined;
    apiProtocol: 'http' | 'https' | undefined;
    /** True when the API settings point at the local stand-in, which the dev starter then runs. */
    usesLocalFake: boolean;
  };
  /** Demand surfaces computed at a time by this process (RUNNER_CONCURRENCY, default the CPU count). */
  runnerConcurrency: number;
  /** Largest customer-file upload in bytes (UPLOAD_MAX_BYTES, default 200 MB). */
  uploadMaxBytes: number;
  /** Raw customer-file uploads waiting for import: `${DATA_DIR}/uploads`. */
  uploadsDir: string;
}

/** Thrown when environment variables are invalid; the message lists every bad variable. */
export class ConfigError extends Error {
  readonly problems: { variable: string; message: string }[];

  constructor(problems: { variable: string; message: string }[]) {
    super(
      `Invalid server configuration (${problems.length} problem${problems.length === 1 ? '' : 's'}):\n` +
        problems.map((p) => `  - ${p.variable}: ${p.message}`).join('\n') +
        '\nFix these environment variables and start again.',
    );
    this.name = 'ConfigError';
    this.problems = problems;
  }
}

/**
 * Reads and validates the server configuration from environment variables.
 * In development an unset SESSION_SECRET is generated once and kept in `${DATA_DIR}/session-secret`.
 * @param env - usually `process.env`
 * @returns the validated configuration
 * @throws ConfigError listing every invalid variable
 * @example
 * const config = configFromEnv({ PORT: '8080' });
 */
export function configFromEnv(env: Record<string, string | undefined>): AppConfig {
  const cleaned = Object.fromEntries(Object.entries(env).filter(([, value]) => value !== undefined && value !== ''));
  const parsed = envSchema.safeParse(cleaned);
  if (!parsed.success) {
    throw new ConfigError(parsed.error.issues.map((issue) => ({ variable: String(issue.path[0] ?? '?'), message: issue.message })));
  }
  const e = parsed.data;
  const production = e.NODE_ENV === 'production';
  const problems: { variable: string; message: string }[] = [];
  if (production && !e.SESSION_SECRET) {
    problems.push({ variable: 'SESSION_SECRET', message: 'is required when NODE_ENV=production (at least 32 random characters)' });
  }
  const googleVars = ['GOOGLE_CLIENT_ID', 'GOOGLE_CLIENT_SECRET', 'GOOGLE_AUTH_URL', 'GOOGLE_TOKEN_URL', 'GOOGLE_USERINFO_URL'] as const;
  const googleSet = googleVars.filter((name) => e[name] !== undefined);
  if (production && googleSet.length > 0 && googleSet.length < googleVars.length) {
    for (const name of googleVars.filter((n) => e[n] === undefined)) {
      problems.push({ variable: name, message: 'is required in production once any GOOGLE_* variable is set' });
    }
  }
  if (production && e.STRIPE_SECRET_KEY && !e.STRIPE_WEBHOOK_SECRET) {
    problems.push({ variable: 'STRIPE_WEBHOOK_SECRET', message: 'is required in production once STRIPE_SECRET_KEY is set (the webhook signing secret, whsec_…)' });
  }
  if (problems.length > 0) throw new ConfigError(problems);

  const dataDir = resolve(e.DATA_DIR);
  const publicUrl = (e.PUBLIC_URL ?? `http://localhost:${e.PORT}`).replace(/\/+$/, '');
  const fakeBase = `http://localhost:${e.OAUTH_FAKE_PORT}`;
  return {
    nodeEnv: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST,
    dataDir,
    databaseFile: e.DATABASE_FILE === ':memory:' ? ':memory:' : resolve(e.DATABASE_FILE ?? join(dataDir, 'demandscape.sqlite')),
    publicUrl,
    secureCookies: publicUrl.startsWith('https://'),
    sessionSecret: e.SESSION_SECRET ?? sessionSecretForDevelopment(dataDir, e.NODE_ENV),
    sessionTtlMs: e.SESSION_TTL_HOURS * 3600_000,
    trustProxy: e.TRUST_PROXY,
    google: {
      // In production Google sign-in is offered only when it is configured; elsewhere the local fake stands in.
      enabled: production ? googleSet.length === googleVars.length : true,
      clientId: e.GOOGLE_CLIENT_ID ?? 'demandscape-local',
      clientSecret: e.GOOGLE_CLIENT_SECRET ?? 'demandscape-local-secret',
      authorizationUrl: e.GOOGLE_AUTH_URL ?? `${fakeBase}/authorize`,
      tokenUrl: e.GOOGLE_TOKEN_URL ?? `${fakeBase}/token`,
      userInfoUrl: e.GOOGLE_USERINFO_URL ?? `${fakeBase}/userinfo`,
      callbackUrl: `${publicUrl}/api/auth/google/callback`,
    },
    oauthFakePort: e.OAUTH_FAKE_PORT,
    mail: {
      transport: e.MAIL_TRANSPORT ?? (e.NODE_ENV === 'test' ? 'capture' : 'smtp'),
      smtpUrl: e.SMTP_URL ?? `smtp://localhost:${e.MAIL_CATCHER_SMTP_PORT}`,
      from: e.MAIL_FROM,
      catcherSmtpPort: e.MAIL_CATCHER_SMTP_PORT,
      catcherWebPort: e.MAIL_CATCHER_WEB_PORT,
    },
    startStandIns: e.START_STANDINS ?? e.NODE_ENV === 'development',
    demoSeed: e.DEMO_SEED ?? e.NODE_ENV === 'development',
    demoCustomers: e.DEMO_CUSTOMERS,
    rateLimitAuthPerMinute: e.RATE_LIMIT_AUTH_PER_MINUTE,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === 'test' ? 'silent' : 'info'),
    webDist: resolve(e.WEB_DIST ?? join(packageDir, '..', 'web', 'dist')),
    billing: billingConfig(e, production),
    runnerConcurrency: e.RUNNER_CONCURRENCY ?? availableParallelism(),
    uploadMaxBytes: e.UPLOAD_MAX_BYTES,
    uploadsDir: join(dataDir, 'uploads'),
  };
}

function sessionSecretForDevelopment(dataDir: string, nodeEnv: string): string {
  if (nodeEnv === 'test') return randomBytes(32).toString('hex');
  const file = join(dataDir, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const secret = randomBytes(32).toString('hex');
  mkdirSync(dirname(file), { recursive: true });
  writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

function billingConfig(e: z.infer<typeof envSchema>, production: boolean): AppConfig['billing'] {
  const local = !production && !e.STRIPE_API_HOST;
  const apiHost = e.STRIPE_API_HOST ?? (production ? undefined : 'localhost');
  const apiProtocol = e.STRIPE_API_PROTOCOL ?? (production ? undefined : 'http');
  return {
    enabled: production ? Boolean(e.STRIPE_SECRET_KEY) : true,
    secretKey: e.STRIPE_SECRET_KEY ?? 'sk_test_demandscape_local',
    webhookSecret: e.STRIPE_WEBHOOK_SECRET ?? 'whsec_demandscape_local',
    apiHost,
    apiPort: apiHost ? e.STRIPE_API_PORT : undefined,
    apiProtocol,
    usesLocalFake: local || (!production && (apiHost === 'localhost' || apiHost === '127.0.0.1') && apiProtocol === 'http'),
  };
}
