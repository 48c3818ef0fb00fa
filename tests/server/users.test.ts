import type { Role } from '@/modules/accounts/core/roles';

import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

async function snapshot() {
  return api.knex('users').orderBy('id').select('id', 'email', 'role', 'active', 'password_hash');
}

describe('user management', () => {
  it('lets a manager list, create, change the role of and deactivate users', async () => {
    const token = await api.tokenFor('manager');
    const team = await api.gql(token, '{ team { email role active } }');
    expect(team.body.data.team.map((u: { email: string }) => u.email)).toEqual(
      expect.arrayContaining(['intake@feltwire.test', 'tech@feltwire.test', 'floor@feltwire.test', 'manager@feltwire.test']),
    );

    const created = await api.gql(
      token,
      'mutation($e: String!) { createUser(email: $e, name: "Nia Newhand", role: "floor", password: "a-long-password") { id email role active } }',
      { e: '  Nia@Feltwire.TEST ' },
    );
    expect(created.body.errors).toBeUndefined();
    const nia = created.body.data.createUser;
    expect(nia).toMatchObject({ email: 'nia@feltwire.test', role: 'floor', active: true });
    const stored = await api.knex('users').where({ id: nia.id }).first();
    expect(stored.password_hash).toMatch(/^\$2b\$/);
    expect(stored.password_hash).not.toContain('a-long-password');

    const promoted = await api.gql(token, `mutation { changeUserRole(userId: ${nia.id}, role: "technician") { role } }`);
    expect(promoted.body.data.changeUserRole.role).toBe('technician');

    const off = await api.gql(token, `mutation { setUserActive(userId: ${nia.id}, active: false) { active } }`);
    expect(off.body.data.setUserActive.active).toBe(false);
    expect((await api.knex('users').where({ id: nia.id }).first()).active).toBe(false);
  });

  it.each(['intake', 'technician', 'floor'] as Role[])('refuses %s every user-management call and changes nothing', async (role) => {
    const token = await api.tokenFor(role);
    const before = await snapshot();
    const calls = [
      '{ team { id } }',
      'mutation { createUser(email: "sneak@feltwire.test", name: "Sneak", role: "manager", password: "a-long-password") { id } }',
      `mutation { changeUserRole(userId: ${before[0].id}, role: "manager") { id } }`,
      `mutation { setUserActive(userId: ${before[3].id}, active: false) { id } }`,
    ];
    for (const query of calls) {
      const res = await api.gql(token, query);
      expect(res.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
      expect(res.body.errors[0].message).toMatch(/^Not allowed/);
    }
    expect(await snapshot()).toEqual(before);
  });

  it('shows a non-manager only their own account in the generated users list', async () => {
    const res = await api.gql(await api.tokenFor('floor'), '{ users { email } }');
    expect(res.body.data.users).toEqual([{ email: 'floor@feltwire.test' }]);
  });

  it.each([
    ['a malformed e-mail', { email: 'not-an-email', name: 'X', role: 'floor', password: 'a-long-password' }, 'email'],
    ['an unknown role', { email: 'x@feltwire.test', name: 'X', role: 'owner', password: 'a-long-password' }, 'role'],
    ['a short password', { email: 'x@feltwire.test', name: 'X', role: 'floor', password: 'short' }, 'password'],
    ['a blank name', { email: 'x@feltwire.test', name: '   ', role: 'floor', password: 'a-long-password' }, 'name'],
  ])('refuses %s, naming the field, and stores nothing', async (_label, vars, field) => {
    const before = await snapshot();
    const res = await api.gql(
      await api.tokenFor('manager'),
      'mutation($email: String!, $name: String!, $role: String!, $password: String!) { createUser(email: $email, name: $name, role: $role, password: $password) { id } }',
      vars,
    );
    expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field });
    expect(res.body.errors[0].message).toMatch(new RegExp(`^${field}: `));
    expect(await snapshot()).toEqual(before);
  });

  it('refuses a second account with the same e-mail', async () => {
    const res = await api.gql(
      await api.tokenFor('manager'),
      'mutation { createUser(email: "floor@feltwire.test", name: "Twin", role: "floor", password: "a-long-password") { id } }',
    );
    expect(res.body.errors[0].extensions.code).toBe('CONFLICT');
  });

  it('refuses a manager deactivating or demoting their own account', async () => {
    const token = await api.tokenFor('manager');
    const me = (await api.gql(token, '{ me { id } }')).body.data.me.id;
    const off = await api.gql(token, `mutation { setUserActive(userId: ${me}, active: false) { id } }`);
    expect(off.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'userId' });
    const demote = await api.gql(token, `mutation { changeUserRole(userId: ${me}, role: "floor") { id } }`);
    expect(demote.body.errors[0].extensions.code).toBe('BAD_INPUT');
  });

  it('answers not found for a user that does not exist', async () => {
    const res = await api.gql(await api.tokenFor('manager'), 'mutation { changeUserRole(userId: 99999, role: "floor") { id } }');
    expect(res.body.errors[0].extensions.code).toBe('NOT_FOUND');
  });
});
