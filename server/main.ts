import { hashPassword } from '@/modules/accounts/server/user-service';
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '@/seeds/demo';
import { createStripe } from '@/modules/deposits/server/payments';
import { s3PhotoStore } from '@/modules/photos/server/photo-store';

import { createApp, type AppDeps } from './app';
import { readConfig } from './config';
import { bindModels, createKnex, migrateLatest } from './db/knex';
import { startAppJobs } from './job-tasks';
import { smtpMailer } from './mail';
import { startMailFake, type MailFake } from './mail-fake';
import { createS3, ensureBucket } from './storage';

// Boots the product: migrate, seed the demo, check storage, serve the API and the web app.
async function main(): Promise<void> {
  const config = readConfig();
  const knex = createKnex(config.databaseUrl, { min: 0, max: config.databasePoolMax });
  bindModels(knex);
  const applied = await migrateLatest(knex);
  if (applied.length) console.log(`[feltwire] migrations applied: ${applied.length}`);
  if (config.seedDemo) {
    const seeded = await seedDemo(knex, hashPassword);
    console.log(`[feltwire] demo data: ${seeded.users} users and ${seeded.pianos} pianos added`);
  }
  const s3 = createS3(config.s3);
  await ensureBucket(s3, config.s3.bucket);

  let mailFake: MailFake | undefined;
  const m = config.mail;
  if (!m.smtpHost) mailFake = await startMailFake(m.fakePort);
  const mailer = smtpMailer({ host: m.smtpHost ?? '127.0.0.1', port: mailFake?.port ?? m.smtpPort, from: m.from, user: m.smtpUser, pass: m.smtpPass });

  const stripe = createStripe(config.payments.secretKey, config.payments.apiUrl);
  const payments = { stripe, webhookSecret: config.payments.webhookSecret };
  const deps: AppDeps = {
    knex,
    payments,
    auth: { jwtSecret: config.jwtSecret, jwtTtlSeconds: config.jwtTtlSeconds },
    photos: s3PhotoStore(s3, config.s3.bucket),
    mailer,
    mailFake,
    publicUrl: config.publicUrl,
    webDir: config.webDir,
    limits: config.limits,
    photoOrigin: new URL(config.s3.endpoint).origin,
  };
  const app = createApp(deps);
  // Refunds, e-mails and the end of holds run here, from the job queue in PostgreSQL.
  const jobs = await startAppJobs(deps, { verbose: true });
  const server = app.listen(config.port, config.host, () => {
    const url = `http://${config.host}:${config.port}`;
    console.log(`\n  Feltwire is running at ${url}\n`);
    if (mailFake) console.log(`  E-mail it sends lands in the demo inbox: ${url}/dev/inbox\n`);
    console.log(`  Demo sign-ins (demo data only), password "${DEMO_PASSWORD}":`);
    for (const u of DEMO_USERS) console.log(`    ${u.role.padEnd(11)} ${u.email}`);
    console.log('\n  Press Ctrl-C to stop.\n');
  });
  const stop = () => {
    server.close();
    // Jobs in hand finish before the database goes away.
    void jobs
      .stop()
      .catch((err) => console.error('[feltwire] stopping the job worker failed:', err))
      .finally(() => {
        void mailFake?.close();
        void knex.destroy();
      });
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((err) => {
  console.error('[feltwire] failed to start:', err);
  process.exit(1);
});
