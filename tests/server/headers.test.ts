import { createApp } from '@/server/app';

import request from 'supertest';

import { startTestApi, TEST_AUTH, type TestApi } from '../support/api';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

function directives(header: string | undefined): Record<string, string> {
  return Object.fromEntries((header ?? '').split(';').map((d) => d.trim().split(/\s+/)).filter((d) => d[0]).map(([name, ...values]) => [name, values.join(' ')]));
}

describe('security headers', () => {
  it.each(['/healthz', '/api/public/disclosures/none', '/graphql', '/dev/inbox'])('%s carries the policy, nosniff, no framing and no referrer', async (url) => {
    const res = await api.http.get(url);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-frame-options']).toBe('DENY');
    const csp = directives(res.headers['content-security-policy']);
    expect(csp['frame-ancestors']).toBe("'none'");
    expect(csp['default-src']).toBe("'self'");
    expect(csp['script-src']).toBe("'self'");
    expect(csp['object-src']).toBe("'none'");
    expect(csp['form-action']).toBe("'self'");
    // photos are shown from the storage's own origin through presigned links
    expect(csp['img-src'].split(' ')).toEqual(expect.arrayContaining(["'self'", new URL(process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4579').origin]));
    // the app runs on plain http locally: nothing may be upgraded to https behind its back
    expect(csp).not.toHaveProperty('upgrade-insecure-requests');
  });
});

describe('the demo inbox', () => {
  it('opens on this machine: a loopback connection with no proxy in between', async () => {
    const res = await api.http.get('/dev/inbox.json');
    expect(res.status).toBe(200);
    expect(res.body).toEqual([]);
  });

  it.each(['/dev/inbox', '/dev/inbox.json', '/dev/inbox/0/attachments/0'])('%s refuses a request that came through a proxy, and staff who are not managers', async (url) => {
    const proxied = await api.http.get(url).set('X-Forwarded-For', '203.0.113.9');
    expect(proxied.status).toBe(403);
    expect(proxied.body.error).toMatch(/demo inbox/);
    const floor = await api.http.get(url).set('X-Forwarded-For', '203.0.113.9').set('Authorization', `Bearer ${await api.tokenFor('floor')}`);
    expect(floor.status).toBe(403);
  });

  it('opens for a manager from anywhere', async () => {
    const res = await api.http.get('/dev/inbox.json').set('X-Forwarded-For', '203.0.113.9').set('Authorization', `Bearer ${await api.tokenFor('manager')}`);
    expect(res.status).toBe(200);
  });

  it('is not there at all without the mail fake', async () => {
    const app = createApp({ knex: api.knex, auth: TEST_AUTH, photos: api.photos, mailer: { send: async () => undefined }, payments: { stripe: {} as never, webhookSecret: 'x' }, publicUrl: 'http://feltwire.test' });
    const res = await request(app).get('/dev/inbox.json').set('Authorization', `Bearer ${await api.tokenFor('manager')}`);
    expect(res.status).toBe(404);
  });
});
