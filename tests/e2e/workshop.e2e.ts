import type { BrowserContext } from 'playwright-core';

import { readClimate } from '@/modules/shop/core/climate';
import { CAUTION_FOOTER } from '@/modules/shop/core/cautions';

import { baseUrl, newPage, openBrowser, PHONE, shot, signIn, WIDE } from './support/browser';

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(() => close());

// Shared by the journeys below, in file order: the item the technician works and its piano.
let itemId: number;
let pianoId: number;

it('a technician works an item of FW-0005 at the bench on a phone', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'tech@feltwire.test');
  await page.waitForURL('**/bench');
  await expect(page.getByTestId('home-heading').first().textContent()).resolves.toBe('Bench');

  // The seed gives FW-0005 open items; one with a caution shows the cautions first.
  const cards = page.locator('[data-testid^="queue-item-"]', { hasText: 'FW-0005' });
  await cards.first().waitFor();
  const withCaution = cards.filter({ hasText: 'Safety caution' });
  const hasCaution = (await withCaution.count()) > 0;
  const card = hasCaution ? withCaution.first() : cards.first();
  itemId = Number((await card.getAttribute('data-testid'))!.replace('queue-item-', ''));
  await shot(page, 'shop-e2e-bench-phone');
  await card.click();
  await page.waitForURL(`**/workshop/items/${itemId}`);
  await page.getByTestId('item-heading').first().waitFor();

  if (hasCaution) {
    const cautions = page.getByTestId('item-cautions');
    await cautions.waitFor();
    await expect(cautions.textContent()).resolves.toContain(CAUTION_FOOTER);
    // The cautions come before anything the technician can press.
    const cautionBox = (await cautions.boundingBox())!;
    const timerBox = (await page.getByTestId('timer-start').boundingBox())!;
    expect(cautionBox.y).toBeLessThan(timerBox.y);
    expect(cautionBox.y).toBeLessThan(PHONE.height);
  }
  await shot(page, 'shop-e2e-item-open');
  pianoId = Number((await page.getByTestId('item-piano-link').getAttribute('href'))!.split('/').pop());

  // Start the timer, see it run, stop it.
  await page.getByTestId('timer-start').click();
  await page.getByTestId('timer-stop').waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="timer-clock"]')?.textContent !== '0:00:00');
  await shot(page, 'shop-e2e-timer-running');
  await page.getByTestId('timer-stop').click();
  await page.getByTestId('timer-start').waitFor();
  await page.getByText('Timer stopped: the time is logged.').waitFor();

  // 30 minutes by hand, with a note.
  await page.getByTestId('log-open').click();
  await page.getByTestId('log-minutes').fill('30');
  await page.getByTestId('log-note').fill('Levelled the treble section by hand');
  await page.getByTestId('log-submit').click();
  await page.getByText('30 min logged.').waitFor();
  await page.getByTestId('entries-list').getByText('Levelled the treble section by hand').waitFor();

  // A part: two at 9.50 each.
  await page.getByTestId('part-open').click();
  await page.getByTestId('part-description').fill('Treble string, size 17');
  await page.getByTestId('part-quantity').fill('2');
  await page.getByTestId('part-cost').fill('9.50');
  await page.getByTestId('part-add').click();
  await page.locator('[data-testid="parts-total"]', { hasText: 'USD 19.00' }).waitFor();
  await page.getByTestId('parts-list').getByText('Treble string, size 17').waitFor();

  // Done: the button turns to reopen, and the item leaves the bench.
  await page.getByTestId('item-done').click();
  await page.getByTestId('done-feedback').getByText('Marked done.').waitFor();
  await page.locator('[data-testid="item-done"]', { hasText: 'Reopen the item' }).waitFor();
  await shot(page, 'shop-e2e-item-done');
  await page.goto(`${baseUrl()}/bench`);
  await page.getByTestId('home-heading').first().waitFor();
  await page.locator('[data-testid^="queue-item-"], [data-testid="queue-empty"], [data-testid="queue-scope-empty"]').first().waitFor();
  await expect(page.getByTestId(`queue-item-${itemId}`).count()).resolves.toBe(0);
  await page.close();
});

it('a manager sees that piano’s estimate against actual on a wide screen', async () => {
  const page = await newPage(context, WIDE);
  await signIn(page, 'manager@feltwire.test');
  await page.waitForURL('**/stock');
  await page.goto(`${baseUrl()}/workshop/pianos/${pianoId}`);
  await expect(page.getByTestId('workshop-heading').first().textContent()).resolves.toBe('FW-0005');
  const table = page.getByTestId('plan-items');
  await table.waitFor();
  await page.getByText('Estimate against actual, by item').waitFor();

  // The worked item: done, with its logged hours, and money on both sides.
  const row = page.getByTestId(`plan-item-${itemId}`);
  await row.waitFor();
  const rowText = (await row.textContent())!;
  expect(rowText).toContain('Done');
  expect(rowText).toMatch(/\d+(\.\d+)? h/);
  expect(rowText).toMatch(/USD [\d,]+\.\d\d/);
  const total = (await page.getByTestId('plan-total').textContent())!;
  expect(total).toContain('All items');
  // The seed logs the first item of FW-0005 past its estimate: it is marked over, in words.
  const over = await page.locator('[data-testid^="plan-item-"]', { hasText: ' over' }).count();
  expect(over).toBeGreaterThan(0);
  await page.getByTestId('plan-by-task').waitFor();
  await shot(page, 'shop-e2e-estimate-vs-actual');
  await page.close();
});

it('a technician logs dry air and sees the warning and the wood’s moisture content', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'tech@feltwire.test');
  await page.waitForURL('**/bench');
  await page.getByTestId('bench-climate').click();
  await page.waitForURL('**/workshop/climate');
  await page.getByTestId('climate-temp').fill('21');
  await page.getByTestId('climate-rh').fill('32');
  await page.getByTestId('climate-preview').waitFor();
  await page.getByTestId('climate-submit').click();

  const warning = page.getByTestId('climate-warning');
  await warning.waitFor();
  await expect(warning.textContent()).resolves.toContain('Dry air (32 % RH, below 40 %)');
  // The moisture content the server computed (Hailwood-Horrobin, USDA Wood Handbook ch. 4), as the core computes it.
  const emc = readClimate(21, 32).emcPct.toFixed(1);
  await expect(page.getByTestId('climate-result-emc').textContent()).resolves.toContain(`${emc} %`);
  await page.getByTestId('climate-list').getByText('21 deg C · 32 % RH').first().waitFor();
  await shot(page, 'shop-e2e-climate-dry');
  await page.close();
});
