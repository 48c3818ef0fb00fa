import { execFile } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';

import knexFactory from 'knex';

import { hashPassword } from '@/modules/accounts/server/user-service';
import { seedDemo } from '@/seeds/demo';

import { tableStates } from '../support/db-state';
import { createTestDatabase } from '../support/test-db';

const run = promisify(execFile);
const SCRIPT = path.resolve(__dirname, '../../scripts/backup.sh');

// npm run db:backup and db:restore, against databases of this test's own, into a folder of its own.
describe('db:backup and db:restore', () => {
  const dir = fs.mkdtempSync(path.join(process.env.TMPDIR ?? '/tmp', 'fw-backups-'));
  let source: Awaited<ReturnType<typeof createTestDatabase>>;
  const fresh = `fw_${process.env.TEST_RUN_ID}_restored_${process.pid}`;
  const admin = knexFactory({ client: 'pg', connection: `${process.env.TEST_PG_URL}/postgres`, pool: { min: 0, max: 1 } });
  const env = (url: string) => ({ ...process.env, DATABASE_URL: url, BACKUP_DIR: dir });

  beforeAll(async () => {
    source = await createTestDatabase();
    await seedDemo(source.knex, hashPassword);
  });
  afterAll(async () => {
    await source.drop();
    await admin.raw('drop database if exists ?? with (force)', [fresh]);
    await admin.destroy();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('round-trips the demo data into a fresh database: every table, row for row, and the stock sequence', async () => {
    const sourceUrl = source.url;
    const backup = await run('bash', [SCRIPT, 'backup'], { env: env(sourceUrl) });
    expect(backup.stderr).toMatch(/backed up .* to .*\.dump/);
    const files = fs.readdirSync(dir);
    expect(files).toHaveLength(1);
    expect(fs.readFileSync(path.join(dir, files[0])).subarray(0, 5).toString()).toBe('PGDMP');

    await admin.raw('create database ?? template template0', [fresh]);
    const freshUrl = `${process.env.TEST_PG_URL}/${fresh}`;
    // no file named: the newest backup in the folder
    const restore = await run('bash', [SCRIPT, 'restore'], { env: env(freshUrl) });
    expect(restore.stderr).toMatch(/taking the newest backup/);
    expect(restore.stderr).toMatch(/restored/);

    const restored = knexFactory({ client: 'pg', connection: freshUrl, pool: { min: 0, max: 1 } });
    try {
      const expected = await tableStates(source.knex);
      expect(Object.keys(expected)).toEqual(expect.arrayContaining(['pianos', 'users', 'assessments', 'disclosures', 'deposits', 'knex_migrations']));
      expect(expected.pianos.rows).toBeGreaterThan(10);
      expect(await tableStates(restored)).toEqual(expected);
      const seq = "select last_value from piano_stock_seq";
      expect((await restored.raw(seq)).rows).toEqual((await source.knex.raw(seq)).rows);
      // the restored database takes new pianos with the next stock number
      const next = await restored('pianos').insert({ maker: 'Almsbury', kind: 'upright' }).returning('stock_number');
      expect(next[0].stock_number).toBe(`FW-${String(Number((await source.knex.raw(seq)).rows[0].last_value) + 1).padStart(4, '0')}`);
    } finally {
      await restored.destroy();
    }
  });

  it('says so when there is nothing to restore, or the file is not a backup', async () => {
    const empty = fs.mkdtempSync(path.join(dir, 'empty-'));
    await expect(run('bash', [SCRIPT, 'restore'], { env: { ...env('postgres://127.0.0.1:1/none'), BACKUP_DIR: empty } })).rejects.toMatchObject({ stderr: expect.stringMatching(/no backup in .*make one with npm run db:backup/) });
    const junk = path.join(empty, 'junk.dump');
    fs.writeFileSync(junk, 'not a dump');
    await expect(run('bash', [SCRIPT, 'restore', junk], { env: env('postgres://127.0.0.1:1/none') })).rejects.toMatchObject({ stderr: expect.stringMatching(/is not a pg_dump custom-format backup/) });
  });
});
