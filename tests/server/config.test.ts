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

describe('the request limits', () => {
  it('read their numbers from the environment', () => {
    const c = readConfig({ ...base, SIGN_IN_FAILURES_PER_ADDRESS: '50', SIGN_IN_FAILURES_PER_ACCOUNT: '5', SIGN_IN_WINDOW_MINUTES: '30', PUBLIC_WRITES_PER_ADDRESS: '100', PUBLIC_WRITE_WINDOW_MINUTES: '1', PUBLIC_READS_PER_ADDRESS: '900', PUBLIC_READ_WINDOW_MINUTES: '5' });
    expect(c.limits).toEqual({ signIn: { failuresPerAddress: 50, failuresPerAccount: 5, windowMinutes: 30 }, publicWrites: { perAddress: 100, windowMinutes: 1 }, publicReads: { perAddress: 900, windowMinutes: 5 } });
    expect(readConfig({ ...base }).limits.signIn.failuresPerAddress).toBe(20);
  });

  it.each(['0', '-3', '2.5', 'many', ''])('refuses %j as a limit', (value) => {
    expect(() => readConfig({ ...base, SIGN_IN_FAILURES_PER_ACCOUNT: value })).toThrow(/SIGN_IN_FAILURES_PER_ACCOUNT must be a whole number of at least 1/);
  });
});
