import { readConfig as read } from '@/server/config';

const base = { JWT_SECRET: 'x'.repeat(40), DATABASE_URL: 'postgres://localhost/x' };
// The environment as the process would hand it over: plain strings, NODE_ENV only where set.
const readConfig = (env: Record<string, string>) => read(env as unknown as NodeJS.ProcessEnv);

describe('readConfig', () => {
  it('runs the local fakes by default', () => {
    const c = readConfig({ ...base });
    expect(c.mail.smtpHost).toBeNull();
    expect(c.payments).toEqual({ secretKey: 'sk_test_feltwire_local', apiUrl: 'http://127.0.0.1:12111', webhookSecret: 'whsec_local_development_only' });
    expect(c.publicUrl).toBe('http://127.0.0.1:8080');
  });

  it('refuses production without a mail relay, and the real payment API without its secrets', () => {
    expect(() => readConfig({ ...base, NODE_ENV: 'production' })).toThrow(/SMTP_HOST/);
    expect(() => readConfig({ ...base, STRIPE_API_URL: '' })).toThrow(/STRIPE_SECRET_KEY/);
    expect(() => readConfig({ ...base, STRIPE_API_URL: '', STRIPE_SECRET_KEY: 'sk_live_x' })).toThrow(/STRIPE_WEBHOOK_SECRET/);
  });

  it('refuses a short JWT secret', () => {
    expect(() => readConfig({ ...base, JWT_SECRET: 'short' })).toThrow(/at least 32/);
  });
});
