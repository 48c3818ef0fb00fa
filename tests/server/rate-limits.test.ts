import bcrypt from 'bcrypt';

import { DEFAULT_LIMITS, type Limits } from '@/server/config';
import { DEMO_PASSWORD } from '@/seeds/demo';

import { startTestApi, type TestApi } from '../support/api';

// Small limits, so a test reaches them in a few requests; the defaults are read from the config below.
const LIMITS: Limits = {
  signIn: { failuresPerAddress: 6, failuresPerAccount: 4, windowMinutes: 15 },
  publicWrites: { perAddress: 5, windowMinutes: 10 },
  publicReads: { perAddress: 4, windowMinutes: 10 },
};

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi({ limits: LIMITS });
});
afterAll(() => api.close());

const from = (address: string) => ({ 'X-Forwarded-For': address });
const signIn = (email: string, password: string, address: string) => api.http.post('/auth/login').set(from(address)).send({ email, password });

describe('sign-in limits', () => {
  it('refuses an address past its failed sign-ins with 429, Retry-After and a message, before bcrypt runs', async () => {
    const address = '198.51.100.10';
    for (let i = 0; i < LIMITS.signIn.failuresPerAddress; i++) {
      // a different account each time, so only the address limit is reached
      expect((await signIn(`nobody${i}@feltwire.test`, 'wrong-password', address)).status).toBe(401);
    }
    const compares = jest.spyOn(bcrypt, 'compare');
    const refused = await signIn('manager@feltwire.test', DEMO_PASSWORD, address);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(refused.headers['retry-after'])).toBeLessThanOrEqual(15 * 60);
    expect(refused.body.error).toMatch(/^Too many failed sign-ins from this address\. Try again in \d+ minutes?\.$/);
    expect(compares).not.toHaveBeenCalled();
    compares.mockRestore();
    // another address signs in as usual
    expect((await signIn('manager@feltwire.test', DEMO_PASSWORD, '198.51.100.11')).status).toBe(200);
  });

  it('refuses an account past its failed sign-ins from any address, whatever the case of its e-mail', async () => {
    for (let i = 0; i < LIMITS.signIn.failuresPerAccount; i++) {
      expect((await signIn(i % 2 ? 'Tech@Feltwire.test' : 'tech@feltwire.test ', 'wrong-password', `203.0.113.${i + 1}`)).status).toBe(401);
    }
    const refused = await signIn('tech@feltwire.test', DEMO_PASSWORD, '203.0.113.99');
    expect(refused.status).toBe(429);
    expect(refused.headers['retry-after']).toBeDefined();
    expect(refused.body.error).toMatch(/^Too many failed sign-ins for this account\. Try again in \d+ minutes?\./);
    // other accounts are not held up
    expect((await signIn('floor@feltwire.test', DEMO_PASSWORD, '203.0.113.99')).status).toBe(200);
  });

  it('does not count successful sign-ins', async () => {
    for (let i = 0; i < LIMITS.signIn.failuresPerAddress * 2; i++) {
      expect((await signIn('intake@feltwire.test', DEMO_PASSWORD, '192.0.2.50')).status).toBe(200);
    }
  });

  it('refuses a burst of parallel wrong sign-ins past the limit without hashing them', async () => {
    const compares = jest.spyOn(bcrypt, 'compare');
    const statuses = await Promise.all(Array.from({ length: 40 }, (_, i) => signIn(`burst${i}@feltwire.test`, 'wrong-password', '192.0.2.77').then((r) => r.status)));
    expect(statuses.filter((s) => s === 401)).toHaveLength(LIMITS.signIn.failuresPerAddress);
    expect(statuses.filter((s) => s === 429)).toHaveLength(40 - LIMITS.signIn.failuresPerAddress);
    expect(compares).toHaveBeenCalledTimes(LIMITS.signIn.failuresPerAddress);
    compares.mockRestore();
  });
});

describe('public writes', () => {
  it('limits acknowledgements and deposits per address, with 429 and a message', async () => {
    const token = (await api.knex('disclosure_links').orderBy('piano_id').first()).token;
    const address = '198.51.100.200';
    const statuses: number[] = [];
    for (let i = 0; i < LIMITS.publicWrites.perAddress; i++) {
      const url = i % 2 ? `/api/public/disclosures/${token}/deposit` : `/api/public/disclosures/${token}/acknowledge`;
      statuses.push((await api.http.post(url).set(from(address)).send({})).status);
    }
    expect(statuses.every((s) => s === 400)).toBe(true);
    const before = await api.knex('acknowledgements').count('* as n').first();
    const refused = await api.http.post(`/api/public/disclosures/${token}/acknowledge`).set(from(address)).send({ fullName: 'Ada Brightwell', email: 'ada@example.test', read: true, digest: '0'.repeat(64) });
    expect(refused.status).toBe(429);
    expect(refused.headers['retry-after']).toBeDefined();
    expect(refused.body.error).toMatch(/^Too many requests from this address\. Try again in \d+ minutes?\.$/);
    expect(await api.knex('acknowledgements').count('* as n').first()).toEqual(before);
    // reading is not a write, and another address writes as usual
    expect((await api.http.get(`/api/public/disclosures/${token}`).set(from(address))).status).toBe(200);
    expect((await api.http.post(`/api/public/disclosures/${token}/acknowledge`).set(from('198.51.100.201')).send({})).status).toBe(400);
  });
});

describe('public reads', () => {
  it('limits the catalogue per address, with 429 and a message, and leaves other addresses alone', async () => {
    const address = '198.51.100.220';
    for (let i = 0; i < LIMITS.publicReads.perAddress; i++) expect((await api.http.get('/api/public/pianos').set(from(address))).status).toBe(200);
    const refused = await api.http.get('/api/public/pianos').set(from(address));
    expect(refused.status).toBe(429);
    expect(refused.headers['retry-after']).toBeDefined();
    expect(refused.body.error).toMatch(/^Too many requests from this address\. Try again in \d+ minutes?\.$/);
    expect((await api.http.get('/api/public/pianos').set(from('198.51.100.221'))).status).toBe(200);
  });
});

describe('the configured limits', () => {
  it('default to counts that a person who mistypes never reaches', () => {
    expect(DEFAULT_LIMITS).toEqual({ signIn: { failuresPerAddress: 20, failuresPerAccount: 10, windowMinutes: 15 }, publicWrites: { perAddress: 30, windowMinutes: 10 }, publicReads: { perAddress: 300, windowMinutes: 10 } });
  });
});
