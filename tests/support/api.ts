import type { Knex } from 'knex';
import request from 'supertest';

import type { Role } from '@/modules/accounts/core/roles';
import { hashPassword } from '@/modules/accounts/server/user-service';
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '@/seeds/demo';
import { createApp } from '@/server/app';

import { createTestDatabase } from './test-db';

export const TEST_AUTH = { jwtSecret: 'test-secret-that-is-long-enough-0123456789', jwtTtlSeconds: 3600 };

export interface TestApi {
  knex: Knex;
  http: ReturnType<typeof request>;
  app: ReturnType<typeof createApp>;
  tokenFor: (role: Role) => Promise<string>;
  gql: (token: string, query: string, variables?: Record<string, unknown>) => Promise<request.Response>;
  close: () => Promise<void>;
}

/** An app on a fresh database seeded with the demo scenario, and helpers to sign in and query. */
export async function startTestApi(): Promise<TestApi> {
  const db = await createTestDatabase();
  await seedDemo(db.knex, hashPassword);
  const app = createApp({ knex: db.knex, auth: TEST_AUTH });
  const http = request(app);
  const tokens = new Map<Role, string>();
  return {
    knex: db.knex,
    http,
    app,
    tokenFor: async (role) => {
      if (!tokens.has(role)) {
        const email = DEMO_USERS.find((u) => u.role === role)!.email;
        const res = await request(app).post('/auth/login').send({ email, password: DEMO_PASSWORD });
        if (res.status !== 200) throw new Error(`login as ${role} failed: ${res.status}`);
        tokens.set(role, res.body.token);
      }
      return tokens.get(role)!;
    },
    gql: (token, query, variables) =>
      request(app).post('/graphql').set('Authorization', `Bearer ${token}`).send({ query, variables }),
    close: db.drop,
  };
}
