import type { BrowserContext, Page } from 'playwright-core';

import { baseUrl, newPage, openBrowser, PHONE, shot, signIn, WIDE } from './support/browser';

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(() => close());

const text = async (page: Page, testID: string) => ((await page.getByTestId(testID).first().textContent()) ?? '').trim();

/** Waits until an element's text is `wanted` (the preview and the version change after a render or a round trip). */
async function waitForText(page: Page, testID: string, wanted: (t: string) => boolean, what: string): Promise<string> {
  for (let i = 0; i < 100; i += 1) {
    const t = await text(page, testID);
    if (wanted(t)) return t;
    await page.waitForTimeout(100);
  }
  throw new Error(`${testID} never showed ${what}; it shows “${await text(page, testID)}”`);
}

async function saveRules(page: Page, before: string): Promise<string> {
  await page.getByTestId('grading-save').click();
  await page.getByTestId('grading-feedback').getByText('Saved as version').waitFor();
  return waitForText(page, 'grading-version', (t) => t !== before && t.length > 0, 'a new version');
}

it('lets a manager tighten side play, see the sample grade move, save a new version, and save the defaults back', async () => {
  const page = await newPage(context, WIDE);
  await signIn(page, 'manager@feltwire.test');
  await page.waitForURL('**/stock');
  await page.goto(`${baseUrl()}/workshop`);
  await page.getByTestId('workshop-grading').first().click();
  await page.waitForURL('**/workshop/grading');
  await page.getByTestId('grading-heading').first().waitFor();

  const first = await waitForText(page, 'grading-version', (t) => t.length > 0, 'a version');
  const field = page.getByTestId('grading-keySidePlayNormalMm').first();
  await expect(field.inputValue()).resolves.toBe('2');
  // The sample's keys move 1.8 mm sideways: fine under 2 mm, noted (easing the front rail pins) under 1.5 mm.
  await waitForText(page, 'grading-with-changes', (t) => t === 'Your changes do not move this sample.', 'no change');
  await expect(page.getByTestId('finding-keys.sidePlay').first().textContent()).resolves.toContain('Fine');
  // The hours appear once the rate card has loaded beside the rules.
  const before = await waitForText(page, 'grading-in-force', (t) => t.endsWith('h of work.'), 'the sample under the rules in force, with its hours');
  expect(before).toMatch(/^Under the rules in force: Needs work first; .* h of work\.$/);
  await field.fill('1.5');
  const after = await waitForText(page, 'grading-with-changes', (t) => t.startsWith('With your changes:'), 'the changed sample');
  // one finding moves from fine to noted, and easing the front rail pins (1.5 h on the demo card) is added
  const hoursOf = (t: string) => Number(/ ([\d.]+) h of work/.exec(t)![1]);
  expect(hoursOf(after)).toBeCloseTo(hoursOf(before) + 1.5, 6);
  await expect(page.getByTestId('finding-keys.sidePlay').first().textContent()).resolves.toContain('Noted');
  await shot(page, 'set-e2e-grading-preview-wide');

  const second = await saveRules(page, first);
  await expect(field.inputValue()).resolves.toBe('1.5');
  await shot(page, 'set-e2e-grading-saved-wide');

  // A value out of order is refused beside its field before anything is sent.
  const groove = page.getByTestId('grading-hammerGrooveReplaceMm').first();
  await groove.fill('0.5');
  await page.getByTestId('grading-save').click();
  await page.getByTestId('grading-feedback').getByText('need fixing').waitFor();
  await expect(text(page, 'grading-version')).resolves.toBe(second);

  // Leave the shop's defaults in force for the other journeys.
  await page.getByTestId('grading-defaults').click();
  await expect(field.inputValue()).resolves.toBe('2');
  await expect(groove.inputValue()).resolves.toBe('3');
  await saveRules(page, second);
  await page.reload();
  await page.getByTestId('grading-heading').first().waitFor();
  await expect(page.getByTestId('grading-keySidePlayNormalMm').first().inputValue()).resolves.toBe('2');
  await page.close();
});

it('lets a manager on a phone change the warranty text, and put the original back', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'manager@feltwire.test');
  await page.waitForURL('**/stock');
  await page.goto(`${baseUrl()}/present/texts`);
  await page.getByTestId('texts-heading').first().waitFor();
  const warranty = page.getByTestId('texts-warranty').first();
  await warranty.waitFor();
  const dealer = await page.getByTestId('texts-dealer-name').first().inputValue();
  const original = await warranty.inputValue();
  expect(original.length).toBeGreaterThan(0);
  await expect(page.getByTestId('texts-legal').first().textContent()).resolves.toContain('not legal advice');

  const edited = `${original} Keys and keytops are covered for six months.`;
  await warranty.fill(edited);
  await page.getByTestId('texts-save').first().click();
  await page.getByTestId('texts-feedback').getByText('Saved.').waitFor();
  await shot(page, 'set-e2e-texts-saved-phone');
  await page.reload();
  await page.getByTestId('texts-heading').first().waitFor();
  await expect(page.getByTestId('texts-warranty').first().inputValue()).resolves.toBe(edited);

  await page.getByTestId('texts-warranty').first().fill(original);
  await page.getByTestId('texts-save').first().click();
  await page.getByTestId('texts-feedback').getByText('Saved.').waitFor();
  await page.reload();
  await page.getByTestId('texts-heading').first().waitFor();
  await expect(page.getByTestId('texts-warranty').first().inputValue()).resolves.toBe(original);
  await expect(page.getByTestId('texts-dealer-name').first().inputValue()).resolves.toBe(dealer);
  await page.close();
});

it('sends a floor user who opens the settings to their own home', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'floor@feltwire.test');
  await page.waitForURL('**/showroom');
  await page.goto(`${baseUrl()}/workshop/grading`);
  await page.waitForURL('**/showroom');
  await page.goto(`${baseUrl()}/present/texts`);
  await page.waitForURL('**/showroom');
  await page.close();
});
