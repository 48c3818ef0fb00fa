// Database chores for the shell scripts: `tsx scripts/db.ts migrate|seed <DATABASE_URL>`.
import { hashPassword } from '@/modules/accounts/server/user-service';
import { bindModels, createKnex, migrateLatest } from '@/server/db/knex';
import { seedDemo } from '@/seeds/demo';

async function run(): Promise<void> {
  const [command, url] = process.argv.slice(2);
  if (!url || !['migrate', 'seed'].includes(command)) throw new Error('usage: tsx scripts/db.ts migrate|seed <DATABASE_URL>');
  const knex = createKnex(url, { min: 0, max: 2 });
  bindModels(knex);
  try {
    const applied = await migrateLatest(knex);
    if (command === 'seed') await seedDemo(knex, hashPassword);
    console.log(`${command}: ${applied.length} migrations applied`);
  } finally {
    await knex.destroy();
  }
}

run().catch((err) => {
  console.error(err);
  process.exit(1);
});
