import path from 'node:path';

/** How many requests an address or an account may make in a window before it is answered 429. */
export interface Limits {
  signIn: { failuresPerAddress: number; failuresPerAccount: number; windowMinutes: number };
  publicWrites: { perAddress: number; windowMinutes: number };
  publicReads: { perAddress: number; windowMinutes: number };
}

// A person who mistypes a password a few times never reaches these; a guessing script soon does.
export const DEFAULT_LIMITS: Limits = {
  signIn: { failuresPerAddress: 20, failuresPerAccount: 10, windowMinutes: 15 },
  publicWrites: { perAddress: 30, windowMinutes: 10 },
  // A buyer paging through the catalogue and changing filters stays far below this.
  publicReads: { perAddress: 300, windowMinutes: 10 },
};

export interface Config {
  host: string;
  port: number;
  databaseUrl: string;
  databasePoolMax: number;
  jwtSecret: string;
  jwtTtlSeconds: number;
  webDir: string;
  s3: { endpoint: string; region: string; bucket: string; accessKeyId: string; secretAccessKey: string };
  seedDemo: boolean;
  publicUrl: string;
  payments: { secretKey: string; apiUrl: string | null; webhookSecret: string };
  mail: { from: string; smtpHost: string | null; smtpPort: number; smtpUser?: string; smtpPass?: string; fakePort: number };
  limits: Limits;
}

function need(env: NodeJS.ProcessEnv, name: string): string {
  const value = env[name];
  if (!value) throw new Error(`Set ${name} (see README.md, Configuration).`);
  return value;
}

function count(env: NodeJS.ProcessEnv, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined) return fallback;
  if (!/^[0-9]+$/.test(raw) || Number(raw) < 1) throw new Error(`${name} must be a whole number of at least 1 (see README.md, Operating).`);
  return Number(raw);
}

function limitsConfig(env: NodeJS.ProcessEnv): Limits {
  const d = DEFAULT_LIMITS;
  return {
    signIn: {
      failuresPerAddress: count(env, 'SIGN_IN_FAILURES_PER_ADDRESS', d.signIn.failuresPerAddress),
      failuresPerAccount: count(env, 'SIGN_IN_FAILURES_PER_ACCOUNT', d.signIn.failuresPerAccount),
      windowMinutes: count(env, 'SIGN_IN_WINDOW_MINUTES', d.signIn.windowMinutes),
    },
    publicWrites: {
      perAddress: count(env, 'PUBLIC_WRITES_PER_ADDRESS', d.publicWrites.perAddress),
      windowMinutes: count(env, 'PUBLIC_WRITE_WINDOW_MINUTES', d.publicWrites.windowMinutes),
    },
    publicReads: {
      perAddress: count(env, 'PUBLIC_READS_PER_ADDRESS', d.publicReads.perAddress),
      windowMinutes: count(env, 'PUBLIC_READ_WINDOW_MINUTES', d.publicReads.windowMinutes),
    },
  };
}

function paymentsConfig(env: NodeJS.ProcessEnv): Config['payments'] {
  // STRIPE_API_URL set to '' means the provider's real API; unset means the local stand-in.
  const apiUrl = env.STRIPE_API_URL === '' ? null : (env.STRIPE_API_URL ?? 'http://127.0.0.1:12111');
  const local = apiUrl != null && new URL(apiUrl).hostname === '127.0.0.1';
  return {
    secretKey: local ? (env.STRIPE_SECRET_KEY ?? 'sk_test_feltwire_local') : need(env, 'STRIPE_SECRET_KEY'),
    apiUrl,
    webhookSecret: local ? (env.STRIPE_WEBHOOK_SECRET ?? 'whsec_local_development_only') : need(env, 'STRIPE_WEBHOOK_SECRET'),
  };
}

export function readConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const jwtSecret = need(env, 'JWT_SECRET');
  // The local inbox shows every e-mail to anyone who opens it: never in production.
  if (env.NODE_ENV === 'production' && !env.SMTP_HOST) throw new Error('Set SMTP_HOST in production: the local mail fake and its inbox are for development only.');
  if (jwtSecret.length < 32) throw new Error('JWT_SECRET must be at least 32 characters.');
  return {
    host: env.HOST ?? '127.0.0.1',
    port: Number(env.PORT ?? 8080),
    databaseUrl: need(env, 'DATABASE_URL'),
    // Requests share this many connections; the job worker has a few of its own.
    databasePoolMax: Number(env.DATABASE_POOL_MAX ?? 10),
    jwtSecret,
    jwtTtlSeconds: Number(env.JWT_TTL_SECONDS ?? 12 * 3600),
    webDir: env.WEB_DIR ?? path.resolve(__dirname, '../dist'),
    s3: {
      endpoint: env.S3_ENDPOINT ?? 'http://127.0.0.1:4569',
      region: env.S3_REGION ?? 'us-east-1',
      bucket: env.S3_BUCKET ?? 'feltwire-photos',
      accessKeyId: env.S3_ACCESS_KEY_ID ?? 'S3RVER',
      secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
    },
    seedDemo: env.SEED_DEMO !== '0',
    publicUrl: (env.PUBLIC_URL ?? `http://${env.HOST ?? '127.0.0.1'}:${env.PORT ?? 8080}`).replace(/\/$/, ''),
    payments: paymentsConfig(env),
    mail: {
      from: env.MAIL_FROM ?? 'Larkspur Lane Pianos <hello@feltwire.test>',
      // Without an SMTP relay, the server runs the local mail fake and its inbox page at /dev/inbox.
      smtpHost: env.SMTP_HOST ?? null,
      smtpPort: Number(env.SMTP_PORT ?? 587),
      smtpUser: env.SMTP_USER,
      smtpPass: env.SMTP_PASS,
      fakePort: Number(env.MAIL_FAKE_PORT ?? 2525),
    },
    limits: limitsConfig(env),
  };
}
