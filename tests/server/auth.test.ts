import jwt from 'jsonwebtoken';

import { LOGIN_FAILED, signToken } from '@/server/auth';
import { DEMO_PASSWORD } from '@/seeds/demo';

import { startTestApi, TEST_AUTH, type TestApi } from '../support/api';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

const ME = '{ me { id email name role } }';

describe('POST /auth/login', () => {
  it('answers a token and the user for the right password', async () => {
    const res = await api.http.post('/auth/login').send({ email: 'Floor@Feltwire.test ', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual({ id: expect.any(Number), email: 'floor@feltwire.test', name: 'Fern Adeyemi-Holt', role: 'floor' });
    const claims = jwt.verify(res.body.token, TEST_AUTH.jwtSecret) as jwt.JwtPayload;
    expect(claims.sub).toBe(String(res.body.user.id));
    expect(claims.exp! - claims.iat!).toBe(TEST_AUTH.jwtTtlSeconds);
    expect(res.body.user).not.toHaveProperty('passwordHash');
  });

  it.each([
    ['a wrong password', { email: 'floor@feltwire.test', password: 'not-the-password' }],
    ['an unknown e-mail', { email: 'nobody@feltwire.test', password: DEMO_PASSWORD }],
    ['a password of the wrong type', { email: 'floor@feltwire.test', password: 12345 }],
    ['an empty body', {}],
  ])('answers the same 401 for %s', async (_label, body) => {
    const res = await api.http.post('/auth/login').send(body);
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: LOGIN_FAILED });
  });

  it('answers 400 for a body that is not JSON', async () => {
    const res = await api.http.post('/auth/login').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
  });
});

describe('the token guarding /graphql', () => {
  it('lets a signed-in user read me', async () => {
    const res = await api.gql(await api.tokenFor('technician'), ME);
    expect(res.status).toBe(200);
    expect(res.body.data.me).toEqual({ id: expect.any(Number), email: 'tech@feltwire.test', name: 'Tomas Reyval', role: 'technician' });
  });

  it('refuses a request without a token', async () => {
    const res = await api.http.post('/graphql').send({ query: ME });
    expect(res.status).toBe(401);
    expect(res.body.errors[0].extensions.code).toBe('UNAUTHENTICATED');
  });

  it('refuses a tampered token', async () => {
    const token = await api.tokenFor('floor');
    const [head, body, sig] = token.split('.');
    const claims = JSON.parse(Buffer.from(body, 'base64url').toString());
    const forged = Buffer.from(JSON.stringify({ ...claims, sub: '4', role: 'manager' })).toString('base64url');
    const res = await api.gql(`${head}.${forged}.${sig}`, ME);
    expect(res.status).toBe(401);
  });

  it('refuses a token signed with another secret', async () => {
    const token = signToken({ id: 1, role: 'intake' }, { ...TEST_AUTH, jwtSecret: 'another-secret-of-enough-length-abcdefghij' });
    expect((await api.gql(token, ME)).status).toBe(401);
  });

  it('refuses an expired token', async () => {
    const token = jwt.sign({ role: 'intake' }, TEST_AUTH.jwtSecret, {
      subject: '1',
      issuer: 'feltwire',
      audience: 'feltwire-staff',
      expiresIn: -10,
    });
    expect((await api.gql(token, ME)).status).toBe(401);
  });

  it('refuses the token of a user deactivated after signing in, and their next login', async () => {
    const manager = await api.tokenFor('manager');
    const created = await api.gql(manager, 'mutation { createUser(email: "leaver@feltwire.test", name: "Lee Ver", role: "intake", password: "long-enough-1") { id } }');
    const id = created.body.data.createUser.id;
    const login = await api.http.post('/auth/login').send({ email: 'leaver@feltwire.test', password: 'long-enough-1' });
    expect(login.status).toBe(200);
    expect((await api.gql(login.body.token, ME)).status).toBe(200);

    const off = await api.gql(manager, `mutation { setUserActive(userId: ${id}, active: false) { active } }`);
    expect(off.body.data.setUserActive.active).toBe(false);
    expect((await api.gql(login.body.token, ME)).status).toBe(401);
    const again = await api.http.post('/auth/login').send({ email: 'leaver@feltwire.test', password: 'long-enough-1' });
    expect(again.status).toBe(401);
    expect(again.body).toEqual({ error: LOGIN_FAILED });
  });
});

describe('GET /healthz', () => {
  it('answers ok when the database answers', async () => {
    const res = await api.http.get('/healthz');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });
});
