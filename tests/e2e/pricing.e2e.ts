import { readFile } from 'node:fs/promises';

import type { BrowserContext, Page } from 'playwright-core';

import { AGEING_BUCKETS, GONE_STAGES } from '@/modules/pricing/core/stock-table';
import { STAGE_LABELS } from '@/modules/pianos/core/piano';

import { baseUrl, newPage, openBrowser, shot, signIn, WIDE } from './support/browser';

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(() => close());

/** Each row's cells as the screen shows them, in order. */
async function tableCells(page: Page): Promise<string[][]> {
  return page.getByTestId('stock-row').evaluateAll((rows) => rows.map((r) => Array.from(r.querySelectorAll('[role="cell"]')).map((c) => (c.textContent ?? '').trim())));
}

// Column positions on the wide table, in the order the screen defines them.
const STOCK = 0;
const KIND = 2;
const DAYS = 4;

/** RFC 4180 lines as cells (the demo has no quoted commas in the columns read here, but quotes are honoured). */
function csvRows(text: string): string[][] {
  return text
    .trim()
    .split('\r\n')
    .map((line) => {
      const cells: string[] = [];
      let cell = '';
      let quoted = false;
      for (let i = 0; i < line.length; i++) {
        const ch = line[i];
        if (quoted) {
          if (ch === '"' && line[i + 1] === '"') {
            cell += '"';
            i++;
          } else if (ch === '"') quoted = false;
          else cell += ch;
        } else if (ch === '"') quoted = true;
        else if (ch === ',') {
          cells.push(cell);
          cell = '';
        }
        else cell += ch;
      }
      cells.push(cell);
      return cells;
    });
}

it('a manager on a wide screen sorts and filters the stock table, exports the rows shown as CSV, and reads the charts', async () => {
  const page = await newPage(context, WIDE);
  await signIn(page, 'manager@feltwire.test');
  await page.waitForURL('**/stock');
  await page.goto(`${baseUrl()}/stock/table`);
  await page.getByTestId('stock-row').first().waitFor();

  // Sorted by stock number at first, lowest first.
  const heading = await page.getByText(/^[\d,]+ pianos$/).first().textContent();
  const total = Number(heading!.replace(/\D/g, ''));
  const first = await tableCells(page);
  expect(first.length).toBeGreaterThan(3);
  const numbers = first.map((r) => r[STOCK]);
  expect(numbers).toEqual([...numbers].sort());
  // Every money column is filled or says why not: no blank cells.
  for (const row of first) for (const cell of row) expect(cell).not.toBe('');

  // A click on "Days" sorts by days in stock; the server answers, and the header says so.
  await page.getByTestId('stock-sort-daysInStock').click();
  await page.waitForFunction(() => document.querySelector('[role="columnheader"][aria-sort="ascending"] [data-testid="stock-sort-daysInStock"]') !== null);
  await page.waitForFunction((before) => document.querySelector('[data-testid="stock-row"] [role="cell"]')?.textContent?.trim() !== before, numbers[0]).catch(() => undefined);
  const byDays = (await tableCells(page)).map((r) => Number(r[DAYS]));
  expect(byDays).toEqual([...byDays].sort((a, b) => a - b));
  // Again: latest first.
  await page.getByTestId('stock-sort-daysInStock').click();
  await page.locator('[role="columnheader"][aria-sort="descending"]').waitFor();
  await page.waitForFunction(
    (lowest) => Number(document.querySelector('[data-testid="stock-row"] [role="cell"]:nth-child(5)')?.textContent) !== lowest,
    byDays[0],
  );
  const byDaysDown = (await tableCells(page)).map((r) => Number(r[DAYS]));
  expect(byDaysDown).toEqual([...byDaysDown].sort((a, b) => b - a));
  expect(byDaysDown[0]).toBe(Math.max(...byDays));
  await shot(page, 'pricing-stock-table-wide');

  // Only grands: every row left is a grand, and there are fewer rows than before.
  await page.getByTestId('stock-filters-toggle').click();
  await page.getByTestId('stock-filter-kind-grand').click();
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid="stock-row"]').length !== n, first.length);
  const grands = await tableCells(page);
  expect(grands.length).toBeGreaterThan(0);
  expect(grands.length).toBeLessThan(first.length);
  for (const row of grands) expect(row[KIND]).toMatch(/^Grand/);
  await expect(page.getByTestId('stock-filters-toggle').textContent()).resolves.toBe('Hide the filters');
  await shot(page, 'pricing-stock-table-grands');

  // The CSV holds exactly the rows shown, in the order shown.
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('stock-export').click()]);
  expect(download.suggestedFilename()).toMatch(/^stock-\d{4}-\d{2}-\d{2}\.csv$/);
  const csv = csvRows(await readFile((await download.path())!, 'utf8'));
  expect(csv[0].slice(0, 5)).toEqual(['Stock number', 'Maker', 'Model', 'Serial number', 'Kind']);
  const body = csv.slice(1);
  expect(body.map((r) => r[0])).toEqual(grands.map((r) => r[STOCK]));
  for (const r of body) expect(r[4]).toBe('grand');
  expect(body.map((r) => Number(r[7]))).toEqual(grands.map((r) => Number(r[DAYS])));

  // A search by stock number finds that piano alone.
  await page.getByTestId('stock-filters-clear').click();
  await page.getByTestId('stock-search').fill(numbers[1]);
  await page.getByTestId('stock-search').press('Enter');
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid="stock-row"]').length === 1 && document.querySelector('[data-testid="stock-row"] [role="cell"]')?.textContent?.trim() === n, numbers[1]);

  // The charts: each drawn, each with its numbers as a table.
  await page.goto(`${baseUrl()}/stock/charts`);
  for (const id of ['chart-stage', 'chart-ageing', 'chart-margins', 'chart-estimates', 'chart-deposits']) await page.getByTestId(id).waitFor();
  const tableOf = async (id: string) =>
    page.getByTestId(`${id}-row`).evaluateAll((rows) => rows.map((r) => Array.from(r.querySelectorAll('[role="cell"]')).map((c) => (c.textContent ?? '').trim())));
  const count = (text: string) => Number(text.replace(/ pianos?$/, ''));
  // Stock by stage counts every piano on record: the table's total.
  const byStage = await tableOf('chart-stage-bars');
  expect(byStage.reduce((s, r) => s + count(r[1]), 0)).toBe(total);
  // The ageing buckets are the four the trade reads, in order, and hold the pianos not yet gone.
  const ageing = await tableOf('chart-ageing-bars');
  expect(ageing.map((r) => r[0])).toEqual(AGEING_BUCKETS.map((b) => b.label));
  const gone = byStage.filter((r) => GONE_STAGES.some((g) => STAGE_LABELS[g] === r[0])).reduce((s, r) => s + count(r[1]), 0);
  expect(ageing.reduce((s, r) => s + count(r[1]), 0)).toBe(total - gone);
  // Numbers on screen on request, not colour alone.
  await page.getByTestId('chart-ageing-bars-toggle').click();
  await expect(page.getByTestId('chart-ageing-bars-table').isVisible()).resolves.toBe(true);
  await shot(page, 'pricing-stock-charts-wide');
  await page.close();
});
