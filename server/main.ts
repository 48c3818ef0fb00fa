import { hashPassword } from '@/modules/accounts/server/user-service';
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '@/seeds/demo';

import { createApp } from './app';
import { readConfig } from './config';
import { bindModels, createKnex, migrateLatest } from './db/knex';
import { expireHolds } from '@/modules/deposits/server/deposit-service';
import { createStripe } from '@/modules/deposits/server/payments';
import { s3PhotoStore } from '@/modules/photos/server/photo-store';

import { smtpMailer } from './mail';
import { startMailFake, type MailFake } from './mail-fake';
import { createS3, ensureBucket } from './storage';

// Boots the product: migrate, seed the demo, check storage, serve the API and the web app.
async function main(): Promise<void> {
  const config = readConfig();
  const knex = createKnex(config.databaseUrl);
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
  const app = createApp({
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
  });
  const server = app.listen(config.port, config.host, () => {
    const url = `http://${config.host}:${config.port}`;
    console.log(`\n  Feltwire is running at ${url}\n`);
    if (mailFake) console.log(`  E-mail it sends lands in the demo inbox: ${url}/dev/inbox\n`);
    console.log(`  Demo sign-ins (demo data only), password "${DEMO_PASSWORD}":`);
    for (const u of DEMO_USERS) console.log(`    ${u.role.padEnd(11)} ${u.email}`);
    console.log('\n  Press Ctrl-C to stop.\n');
  });
  // Holds that ran out free their pianos, checked once a minute.
  const sweep = setInterval(() => {
    expireHolds({ ...payments, mailer, publicUrl: config.publicUrl }).catch((err) => console.error('[feltwire] expiring holds failed:', err));
  }, 60_000);
  (sweep as unknown as NodeJS.Timeout).unref();
  const stop = () => {
    clearInterval(sweep);
    server.close();
    void mailFake?.close();
    void knex.destroy();
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((err) => {
  console.error('[feltwire] failed to start:', err);
  process.exit(1);
});
