// A buyer on a phone finds a piano in the public catalogue by a filter, reads its disclosure and holds
// it with a deposit; the piano then leaves the catalogue. Uses FW-0013 only (no other journey's piano).
import type { BrowserContext } from 'playwright-core';

import { TABLET } from './support/api';
import { baseUrl, newPage, openBrowser, payWithTestCard, PHONE, shot, WIDE } from './support/browser';

let buyer: { context: BrowserContext; close: () => Promise<void> };
beforeAll(async () => {
  buyer = await openBrowser();
});
afterAll(async () => {
  await buyer?.close();
});

it('shows the catalogue on a tablet and a wide screen', async () => {
  for (const [name, size] of [['tablet', TABLET], ['wide', WIDE]] as const) {
    const page = await newPage(buyer.context, size);
    await page.goto(`${baseUrl()}/pianos-for-sale`);
    await page.getByTestId('catalogue-count').waitFor();
    expect(await page.getByTestId('catalogue-piano-FW-0013').count()).toBe(1);
    expect(await page.getByTestId('buyer-dealer').textContent()).toBe('Larkspur Lane Pianos');
    await shot(page, `catalogue-${name}`);
    await page.getByTestId('catalogue-piano-FW-0013').scrollIntoViewIfNeeded();
    await shot(page, `catalogue-${name}-cards`);
    await page.close();
  }
});

it('lets a buyer find a piano by size, read its disclosure and hold it with a deposit', async () => {
  const phone = await newPage(buyer.context, PHONE);
  await phone.goto(`${baseUrl()}/pianos-for-sale`);
  await phone.getByTestId('catalogue-count').waitFor();
  const before = Number((await phone.getByTestId('catalogue-count').textContent())!.match(/\d+/)![0]);
  expect(before).toBeGreaterThanOrEqual(2);
  await shot(phone, 'catalogue-phone');

  // Uprights from 100 to 119 cm: the demo's 114 cm upright alone.
  await phone.getByTestId('catalogue-kind-upright').click();
  await phone.getByTestId('catalogue-size-from100').click();
  await phone.waitForFunction(() => document.querySelector('[data-testid="catalogue-count"]')?.textContent === '1 piano');
  const card = phone.getByTestId('catalogue-piano-FW-0013');
  await card.waitFor();
  expect(await card.textContent()).toContain('Almsbury Study 114');
  expect(await card.textContent()).toContain('Upright, 114 cm tall');
  const price = (await card.getByTestId('catalogue-price-text').textContent())!.trim();
  expect(price).toMatch(/^USD [\d,]+\.\d\d$/);
  await card.scrollIntoViewIfNeeded();
  await shot(phone, 'catalogue-phone-filtered');

  // The disclosure opens from the card, with the same price.
  await card.getByTestId('catalogue-open').click();
  await phone.waitForURL('**/d/*');
  await phone.getByTestId('disclosure-code').waitFor();
  expect(await phone.locator('body').textContent()).toContain(price);
  const disclosureUrl = phone.url();

  // "Hold it with a deposit" leads to the acknowledgement the deposit follows.
  await phone.goto(`${baseUrl()}/pianos-for-sale`);
  await phone.getByTestId('catalogue-piano-FW-0013').getByTestId('catalogue-deposit').click();
  await phone.waitForURL(`${disclosureUrl}#hold`);
  await phone.getByTestId('ack-name').waitFor();
  await phone.getByTestId('ack-name').fill('Oriel Vantongeren');
  await phone.getByTestId('ack-email').fill(`e2e-catalogue-${Date.now()}@buyers.test`);
  await phone.getByTestId('ack-read').click();
  await phone.getByTestId('ack-submit').click();
  await phone.getByTestId('ack-done').waitFor();
  await phone.getByTestId('deposit-start').scrollIntoViewIfNeeded();
  await phone.getByTestId('deposit-start').click();
  await payWithTestCard(phone);
  await phone.waitForURL('**/d/*/deposit?session=*');
  await phone.getByTestId('deposit-held').waitFor({ timeout: 30_000 });
  expect(await phone.getByTestId('deposit-held').textContent()).toContain('Held for you until');

  // Held: it leaves the catalogue at once.
  await phone.goto(`${baseUrl()}/pianos-for-sale`);
  await phone.getByTestId('catalogue-count').waitFor();
  expect(await phone.getByTestId('catalogue-piano-FW-0013').count()).toBe(0);
  expect(Number((await phone.getByTestId('catalogue-count').textContent())!.match(/\d+/)![0])).toBeLessThan(before);
  await phone.close();
});
