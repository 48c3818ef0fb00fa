import type { BrowserContext } from 'playwright-core';

import { baseUrl, newPage, openBrowser, PHONE, shot, signIn, WIDE } from './support/browser';

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(() => close());

const HOMES = [
  { role: 'intake', email: 'intake@feltwire.test', path: '/trade-ins', heading: 'Trade-ins' },
  { role: 'technician', email: 'tech@feltwire.test', path: '/bench', heading: 'Bench' },
  { role: 'floor', email: 'floor@feltwire.test', path: '/showroom', heading: 'Showroom' },
  { role: 'manager', email: 'manager@feltwire.test', path: '/stock', heading: 'Stock' },
];

describe.each([
  ['phone', PHONE],
  ['wide screen', WIDE],
])('on a %s', (label, viewport) => {
  it.each(HOMES)('$role signs in and lands on their own home', async ({ role, email, path, heading }) => {
    const page = await newPage(context, viewport);
    await signIn(page, email);
    await page.waitForURL(`**${path}`);
    await expect(page.getByTestId('home-heading').first().textContent()).resolves.toBe(heading);
    // The navigation is a bottom bar on a phone and a side column on a wide screen.
    const nav = page.getByRole('navigation').first();
    const box = (await nav.boundingBox())!;
    if (viewport === PHONE) {
      expect(box.y + box.height).toBeGreaterThan(viewport.height - 4);
      expect(box.width).toBeGreaterThan(viewport.width - 4);
    } else {
      expect(box.x).toBeLessThan(4);
      expect(box.height).toBeGreaterThan(viewport.height / 2);
      expect(box.width).toBeLessThan(viewport.width / 3);
    }
    await shot(page, `home-${role}-${label.replace(' ', '-')}`);

    await page.getByTestId('sign-out').first().click();
    await page.waitForURL('**/sign-in');
    await expect(page.getByTestId('sign-in-submit').isVisible()).resolves.toBe(true);
    await page.close();
  });
});

it('keeps the screen when a deep link is reloaded', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'floor@feltwire.test');
  await page.waitForURL('**/showroom');
  await page.goto(`${baseUrl()}/pianos/3`);
  await page.getByText('FW-0003').first().waitFor();
  await page.reload();
  await page.getByText('FW-0003').first().waitFor();
  expect(new URL(page.url()).pathname).toBe('/pianos/3');
  await page.close();
});

it('sends a visitor without a session to sign-in, and refuses a wrong password', async () => {
  const page = await newPage(context, PHONE);
  await page.goto(`${baseUrl()}/stock`);
  await page.waitForURL('**/sign-in');
  await signIn(page, 'manager@feltwire.test', 'wrong-password');
  await page.getByText('E-mail or password is not right.').waitFor();
  expect(new URL(page.url()).pathname).toBe('/sign-in');
  await page.close();
});

it('sends a role to its own home when it opens another role’s home', async () => {
  const page = await newPage(context, WIDE);
  await signIn(page, 'tech@feltwire.test');
  await page.waitForURL('**/bench');
  await page.goto(`${baseUrl()}/team`);
  await page.waitForURL('**/bench');
  await page.close();
});
