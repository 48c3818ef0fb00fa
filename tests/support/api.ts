import { randomBytes } from 'node:crypto';

import { ListObjectsV2Command, type S3Client } from '@aws-sdk/client-s3';
import type { Knex } from 'knex';
import request from 'supertest';

import type { Role } from '@/modules/accounts/core/roles';
import { hashPassword } from '@/modules/accounts/server/user-service';
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '@/seeds/demo';
import { s3PhotoStore, type PhotoStore } from '@/modules/photos/server/photo-store';
import { createApp } from '@/server/app';
import type { Limits } from '@/server/config';
import { createStripe } from '@/modules/deposits/server/payments';
import type { JobWorker } from '@/modules/jobs/server/worker';
import { startAppJobs } from '@/server/job-tasks';
import { smtpMailer } from '@/server/mail';
import { startStripeFake, type StripeFake } from '@/stripe-fake/stripe-fake';
import { startMailFake, type MailFake } from '@/server/mail-fake';
import { createS3, ensureBucket } from '@/server/storage';

import { testClock, type TestClock } from './clock';
import { createTestDatabase } from './test-db';
import { wholeAnswers } from './whole-answers';

export const TEST_AUTH = { jwtSecret: 'test-secret-that-is-long-enough-0123456789', jwtTtlSeconds: 3600 };

export interface TestApi {
  knex: Knex;
  s3: S3Client;
  bucket: string;
  photos: PhotoStore;
  mail: MailFake;
  stripeFake: StripeFake;
  webhookSecret: string;
  /** The clock the services and jobs run on. */
  clock: TestClock;
  /** The job worker running in this test's server: `settle()` waits for the jobs due now. */
  jobs: JobWorker;
  /** Moves the clock on and runs every job that came due meanwhile. */
  advance: (ms: number) => Promise<void>;
  /** Serves the app on a loopback port and points the payment stand-in's webhooks at it. */
  listen: () => Promise<string>;
  /** Every object key in this file's bucket. */
  objectKeys: () => Promise<string[]>;
  http: ReturnType<typeof request>;
  app: ReturnType<typeof createApp>;
  tokenFor: (role: Role) => Promise<string>;
  /** A GraphQL call; a hand-written answer asked without a selection comes whole (tests/support/whole-answers.ts). */
  gql: (token: string, query: string, variables?: Record<string, unknown>) => Promise<request.Response>;
  close: () => Promise<void>;
}

/** A GraphQL call over real HTTP to a listening server (races need two requests truly in flight). */
export async function postGql(base: string, token: string, query: string, variables?: Record<string, unknown>): Promise<{ data?: any; errors?: { message: string; extensions: { code: string } }[] }> {
  const res = await fetch(`${base}/graphql`, { method: 'POST', headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` }, body: JSON.stringify({ query: wholeAnswers(query), variables }) });
  return (await res.json()) as never;
}

/** An app on a fresh database seeded with the demo scenario, and helpers to sign in and query. */
export async function startTestApi(options: { limits?: Limits } = {}): Promise<TestApi> {
  const db = await createTestDatabase();
  await seedDemo(db.knex, hashPassword);
  // Each test file has a bucket of its own in the storage fake that scripts/test.sh started.
  const s3Endpoint = process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4579';
  const s3 = createS3({ endpoint: s3Endpoint, region: 'us-east-1', bucket: '', accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' });
  const bucket = `fw-test-${randomBytes(4).toString('hex')}`;
  await ensureBucket(s3, bucket);
  const photos = s3PhotoStore(s3, bucket);
  const mail = await startMailFake(0);
  const mailer = smtpMailer({ host: '127.0.0.1', port: mail.port, from: 'Test Dealer <dealer@feltwire.test>' });
  const stripeFake = await startStripeFake({ port: 0, retryDelaysMs: [50, 100, 200] });
  const webhookSecret = `whsec_test_${randomBytes(12).toString('hex')}`;
  const payments = { stripe: createStripe('sk_test_feltwire', stripeFake.url), webhookSecret };
  const clock = testClock();
  const deps = { knex: db.knex, auth: TEST_AUTH, photos, mailer, mailFake: mail, payments, publicUrl: 'http://feltwire.test', clock, limits: options.limits, photoOrigin: new URL(s3Endpoint).origin };
  const app = createApp(deps);
  // Real jobs, as in the server: API tests see refunds and e-mails made by them.
  const jobs = await startAppJobs(deps);
  let server: import('node:http').Server | undefined;
  const http = request(app);
  const tokens = new Map<Role, string>();
  return {
    knex: db.knex,
    s3,
    bucket,
    photos,
    mail,
    stripeFake,
    webhookSecret,
    clock,
    jobs,
    advance: (ms) => jobs.runDue(clock.advance(ms)),
    listen: async () => {
      if (server) return `http://127.0.0.1:${(server.address() as import('node:net').AddressInfo).port}`;
      server = await new Promise((resolve) => {
        const s = app.listen(0, '127.0.0.1', () => resolve(s));
      });
      const address = server!.address() as import('node:net').AddressInfo;
      const url = `http://127.0.0.1:${address.port}`;
      stripeFake.setWebhook(`${url}/api/webhooks/payments`, webhookSecret);
      return url;
    },
    objectKeys: async () => ((await s3.send(new ListObjectsV2Command({ Bucket: bucket }))).Contents ?? []).map((o) => o.Key!),
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
      request(app).post('/graphql').set('Authorization', `Bearer ${token}`).send({ query: wholeAnswers(query), variables }),
    close: async () => {
      await jobs.stop();
      s3.destroy();
      await mail.close();
      await stripeFake.idle();
      await stripeFake.close();
      if (server) await new Promise((resolve) => server!.close(resolve));
      await db.drop();
    },
  };
}
