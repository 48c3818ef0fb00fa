import { stockNumber } from '@/modules/pianos/core/piano';

import { createTestDatabase } from '../support/test-db';

describe('stock numbers from the database sequence', () => {
  let db: Awaited<ReturnType<typeof createTestDatabase>>;
  beforeAll(async () => {
    db = await createTestDatabase();
  });
  afterAll(() => db.drop());

  const insert = async () => (await db.knex('pianos').insert({ maker: 'Almsbury', kind: 'upright' }).returning('stock_number'))[0].stock_number as string;

  it('pads to four digits, and goes on past FW-9999 without cutting a digit', async () => {
    expect(await insert()).toBe('FW-0001');
    await db.knex.raw("select setval('piano_stock_seq', 9997)");
    const numbers = [await insert(), await insert(), await insert(), await insert(), await insert()];
    expect(numbers).toEqual(['FW-9998', 'FW-9999', 'FW-10000', 'FW-10001', 'FW-10002']);
    expect(numbers).toEqual([9998, 9999, 10000, 10001, 10002].map(stockNumber));
  });

  it('goes on to the largest number the sequence gives', async () => {
    await db.knex.raw("select setval('piano_stock_seq', 2147483646)");
    expect(await insert()).toBe('FW-2147483647');
  });
});
