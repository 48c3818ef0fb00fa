import path from 'node:path';

import type { BrowserContext, Page } from 'playwright-core';

import { AREAS, READINESS_WORDS, gradeAssessment, type Grade } from '@/modules/assessment/core/grade';

import { baseUrl, newPage, openBrowser, PHONE, shot, signIn, WIDE } from './support/browser';

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(() => close());

const JPEG = path.join(__dirname, '../fixtures/keys-photo.jpg');

const fill = (page: Page, id: string, value: string) => page.getByTestId(id).fill(value);
const pick = (page: Page, id: string) => page.getByTestId(id).click();
// The verdict a condition panel shows: the live one while grading, the stored one on the piano's page.
const verdict = (page: Page, panel: string) => page.getByTestId(panel).first().getByTestId('readiness-verdict').textContent();
const says = (g: Grade) => READINESS_WORDS[g.readiness];

async function next(page: Page, title: string) {
  await page.getByTestId('step-next').click();
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe(title);
}

it('intake staff log a whole trade-in on a phone, with a photo, keep the draft over a reload, and see the grade', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');
  await pick(page, 'start-trade-in');
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Piano and seller');

  await fill(page, 'field-seller-name', 'Odile Ferncastle');
  await fill(page, 'field-seller-phone', '+1 555 0142');
  await pick(page, 'choice-acquisition-trade_in');
  await pick(page, 'choice-inspectedAt-customer_home');
  await fill(page, 'field-maker', 'Marrowfield');
  await fill(page, 'field-model', 'Console 112');
  await pick(page, 'choice-kind-upright');
  await fill(page, 'field-sizeCm', '112');
  await fill(page, 'field-year', '1986');

  await next(page, 'Keys');
  await fill(page, 'field-keySidePlayMm', '2.4');
  await fill(page, 'field-keyLevelDeviationMm', '1.2');

  // A reload mid-way keeps the draft: same step, same values.
  await page.waitForTimeout(600);
  await page.reload();
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Keys');
  await expect(page.getByTestId('field-keySidePlayMm').inputValue()).resolves.toBe('2.4');

  await next(page, 'Hammers');
  await fill(page, 'field-hammerGrooveDepthMm', '2');
  await next(page, 'Strings');
  await pick(page, 'choice-steelCorrosion-light');
  await pick(page, 'choice-bassWinding-dull');
  await next(page, 'Soundboard');
  await pick(page, 'add-crack');
  await fill(page, 'crack-0-lengthCm', '30');
  await fill(page, 'crack-0-widestGapMm', '0.8');
  await next(page, 'Play and pitch');
  await fill(page, 'field-a4Hz', '436.5');
  await pick(page, 'choice-tuningPins-firm');
  for (const [field, value] of [['bassEvenness', 4], ['middleEvenness', 4], ['trebleEvenness', 4], ['dynamicRange', 4], ['overallImpression', 4]]) {
    await pick(page, `choice-${field}-${value}`);
  }
  await next(page, 'Photos');
  const chooser = page.waitForEvent('filechooser');
  await pick(page, 'photo-add');
  await (await chooser).setFiles(JPEG);
  await page.getByTestId('photo-thumb').first().waitFor({ timeout: 20000 });

  await next(page, 'Review');
  // The same pure grade the server stores, computed here from the values typed above.
  const expected = gradeAssessment({
    keySidePlayMm: 2.4,
    keyLevelDeviationMm: 1.2,
    hammerGrooveDepthMm: 2,
    steelCorrosion: 'light',
    bassWinding: 'dull',
    soundboardCracks: [{ lengthCm: 30, widestGapMm: 0.8, crossesRib: false, buzzes: false, hurtsTuning: false }],
    a4Hz: 436.5,
    tuningPins: 'firm',
    bassEvenness: 4,
    middleEvenness: 4,
    trebleEvenness: 4,
    dynamicRange: 4,
    overallImpression: 4,
  });
  await expect(verdict(page, 'live-condition')).resolves.toBe(says(expected));
  await page.getByText('a wide crack (a payment card fits in it)').first().waitFor();
  // Every area measured: none is said to be not inspected.
  await expect(page.getByTestId('review-inspected').textContent()).resolves.toContain('6 of 6 areas inspected');
  await shot(page, 'intake-review-phone');

  await pick(page, 'submit-intake');
  await page.waitForURL(/\/pianos\/\d+$/);
  await expect(verdict(page, 'assessment-condition')).resolves.toBe(says(expected));
  await page.getByText('Marrowfield').first().waitFor();
  await page.getByTestId('photo-thumb').first().waitFor();
  await shot(page, 'intake-piano-phone');

  // The trade-in offer, worked back from the expected asking price, line by line, for the seller.
  const offer = page.getByTestId('offer-panel');
  await offer.scrollIntoViewIfNeeded();
  const lines = await offer.getByTestId('offer-lines-line').allTextContents();
  expect(lines[0]).toMatch(/^(Expected asking price|Wholesale figure)/);
  expect(lines.some((l) => l.startsWith('Target margin'))).toBe(true);
  if (lines[0].startsWith('Expected asking price')) expect(lines.some((l) => l.startsWith('Reconditioning estimate'))).toBe(true);
  const amount = await offer.getByTestId('offer-amount').textContent();
  expect(amount).toMatch(/^[A-Z]{3} [\d,]+(\.\d\d)?$/);
  await expect(offer.getByTestId('offer-lines-total').textContent()).resolves.toBe(amount);
  await expect(offer.getByTestId('offer-answer-form').count()).resolves.toBe(1);
  await shot(page, 'intake-offer-phone');
  await page.close();
});

it('shows the form beside the live findings on a wide screen', async () => {
  const page = await newPage(context, WIDE);
  await signIn(page, 'manager@feltwire.test');
  await page.waitForURL('**/stock');
  await page.goto(page.url().replace('/stock', '/trade-ins/new'));
  await page.getByTestId('step-title').waitFor();
  const form = (await page.getByTestId('intake-form').boundingBox())!;
  const live = (await page.getByTestId('live-grade').boundingBox())!;
  expect(live.x).toBeGreaterThan(form.x + form.width - 1);
  await shot(page, 'intake-wide');
  await page.close();
});

// A piano with a submitted intake, made through the API as the given user: the starting point of a correction.
async function intakeThroughApi(page: Page, email: string, measurements: Record<string, unknown>): Promise<number> {
  const login = await page.request.post(`${baseUrl()}/auth/login`, { data: { email, password: 'feltwire-demo' } });
  const { token } = (await login.json()) as { token: string };
  const input = {
    seller: { name: 'Wenna Clodfelter' },
    acquisition: 'purchase',
    receivedOn: '2026-11-30',
    inspectedAt: 'showroom',
    piano: { maker: 'Quillby', model: 'Studio 118', kind: 'upright', sizeCm: 118 },
    measurements,
    photoIds: [],
  };
  const res = await page.request.post(`${baseUrl()}/graphql`, {
    headers: { Authorization: `Bearer ${token}` },
    data: { query: 'mutation($input: IntakeInput!) { submitIntake(input: $input) { pianoId } }', variables: { input } },
  });
  const body = (await res.json()) as { data?: { submitIntake: { pianoId: number } }; errors?: unknown };
  expect(body.errors).toBeUndefined();
  return body.data!.submitIntake.pianoId;
}

it('lets a manager correct an assessment with a reason, and the history shows version 2 with the changed field', async () => {
  const page = await newPage(context, WIDE);
  const before = { keySidePlayMm: 2.4, keyLevelDeviationMm: 0.4, tuningPins: 'firm' } as const;
  const pianoId = await intakeThroughApi(page, 'intake@feltwire.test', before);
  await signIn(page, 'manager@feltwire.test');
  await page.waitForURL('**/stock');
  await page.goto(`${baseUrl()}/pianos/${pianoId}`);
  await expect(verdict(page, 'assessment-condition')).resolves.toBe(says(gradeAssessment(before)));
  await page.getByTestId('assessment-condition').getByTestId('readiness-provisional').waitFor();

  await pick(page, 'correct-assessment');
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Keys');
  // The steps open with the latest version's values.
  await expect(page.getByTestId('field-keySidePlayMm').inputValue()).resolves.toBe('2.4');
  await fill(page, 'field-keySidePlayMm', '3.1');
  for (const title of ['Hammers', 'Strings', 'Soundboard', 'Play and pitch', 'Photos', 'Review']) await next(page, title);
  await page.getByTestId('correction-changes').getByText('Key side play: 2.4 mm → 3.1 mm').waitFor();

  // A correction needs a reason: without one nothing is sent.
  await pick(page, 'submit-correction');
  await page.getByText('Reason for the correction is required').first().waitFor();
  expect(new URL(page.url()).pathname).toBe(`/pianos/${pianoId}/correct`);

  await fill(page, 'field-changeNote', 'Re-measured key side play in daylight.');
  await pick(page, 'submit-correction');
  await page.waitForURL(new RegExp(`/pianos/${pianoId}$`));
  const after = { ...before, keySidePlayMm: 3.1 };
  await expect(verdict(page, 'assessment-condition')).resolves.toBe(says(gradeAssessment(after)));
  const v2 = page.getByTestId('history-version-2');
  await v2.waitFor();
  const text = await v2.textContent();
  expect(text).toContain('Key side play: 2.4 mm → 3.1 mm');
  expect(text).toContain('Re-measured key side play in daylight.');
  expect(text).toContain('Mara Quillfeather');
  await page.getByTestId('history-version-1').waitFor();
  await shot(page, 'correction-history-wide');
  await page.close();
});

it('refuses a wrong value on the phone: the field is named, the step does not advance, nothing is submitted', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');
  await pick(page, 'start-trade-in');
  await fill(page, 'field-seller-name', 'Odile Ferncastle');
  await pick(page, 'choice-acquisition-consignment');
  await pick(page, 'choice-inspectedAt-showroom');
  await fill(page, 'field-maker', 'Marrowfield');
  await pick(page, 'choice-kind-upright');
  await next(page, 'Keys');

  await fill(page, 'field-keySidePlayMm', '12');
  await page.getByTestId('step-next').click();
  await page.getByText('Key side play must be at most 10 mm').first().waitFor();
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Keys');

  // Fixed, the form moves on; broken again from the review, it cannot jump back to the review or submit.
  await fill(page, 'field-keySidePlayMm', '1.5');
  for (const title of ['Hammers', 'Strings', 'Soundboard', 'Play and pitch', 'Photos', 'Review']) await next(page, title);
  await pick(page, 'review-change-keys');
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Keys');
  await fill(page, 'field-keySidePlayMm', '12');
  await pick(page, 'step-jump-review');
  await page.getByText('Key side play must be at most 10 mm').first().waitFor();
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Keys');
  await expect(page.getByTestId('submit-intake').count()).resolves.toBe(0);
  expect(new URL(page.url()).pathname).toBe('/trade-ins/new');
  await shot(page, 'intake-refused-phone');

  // Throwing the draft away asks first, then starts afresh.
  await pick(page, 'discard-draft');
  await pick(page, 'confirm-discard');
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Piano and seller');
  await expect(page.getByTestId('field-seller-name').inputValue()).resolves.toBe('');
  await page.close();
});

it('keeps an intake submitted without a connection and sends it when the connection is back', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');
  await pick(page, 'start-trade-in');
  await fill(page, 'field-seller-name', 'Tamsin Orrick');
  await pick(page, 'choice-acquisition-purchase');
  await pick(page, 'choice-inspectedAt-workshop');
  await fill(page, 'field-maker', 'Hollowmere');
  await pick(page, 'choice-kind-grand');
  await fill(page, 'field-sizeCm', '170');
  for (const title of ['Keys', 'Hammers', 'Strings', 'Soundboard', 'Play and pitch']) await next(page, title);
  await fill(page, 'field-a4Hz', '440');
  await next(page, 'Photos');
  await next(page, 'Review');

  await context.setOffline(true);
  try {
    await pick(page, 'submit-intake');
    await page.getByTestId('offline-kept').waitFor();
    expect(new URL(page.url()).pathname).toBe('/trade-ins/new');
    await shot(page, 'intake-offline-phone');
  } finally {
    await context.setOffline(false);
  }
  await page.waitForURL(/\/pianos\/\d+$/, { timeout: 40000 });
  await page.getByText('Hollowmere').first().waitFor();
  // Sent once, the draft is gone: a new trade-in starts empty.
  await page.goto(`${baseUrl()}/trade-ins/new`);
  await expect(page.getByTestId('field-maker').inputValue()).resolves.toBe('');
  await page.close();
});

// The server is the judge: its refusals (a field it names, a correction that collides) are shown where they belong.
async function refuseOnce(page: Page, mutation: string, error: { message: string; extensions: Record<string, string> }) {
  let refused = false;
  await page.route('**/graphql', async (route) => {
    const body = route.request().postDataJSON() as { query?: string } | null;
    if (!refused && body?.query?.includes(mutation)) {
      refused = true;
      await route.fulfill({ status: 200, contentType: 'application/json', body: JSON.stringify({ data: null, errors: [error] }) });
      return;
    }
    await route.continue();
  });
}

it('shows the server’s refusal beside the field it names, and a colliding correction as such', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');
  await pick(page, 'start-trade-in');
  await fill(page, 'field-seller-name', 'Odile Ferncastle');
  await pick(page, 'choice-acquisition-trade_in');
  await pick(page, 'choice-inspectedAt-customer_home');
  await fill(page, 'field-maker', 'Marrowfield');
  await pick(page, 'choice-kind-upright');
  await next(page, 'Keys');
  await fill(page, 'field-keySidePlayMm', '4');
  for (const title of ['Hammers', 'Strings', 'Soundboard', 'Play and pitch', 'Photos', 'Review']) await next(page, title);

  await refuseOnce(page, 'submitIntake', { message: 'measurements.keySidePlayMm: must be at most 3 mm', extensions: { code: 'BAD_INPUT', field: 'measurements.keySidePlayMm' } });
  await pick(page, 'submit-intake');
  await page.getByTestId('field-keySidePlayMm').waitFor();
  await page.getByText('Key side play must be at most 3 mm').first().waitFor();
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Keys');
  expect(new URL(page.url()).pathname).toBe('/trade-ins/new');
  await shot(page, 'intake-server-refusal-phone');
  await page.unrouteAll();

  // The draft stays whole: the same intake goes through once the server takes it.
  await fill(page, 'field-keySidePlayMm', '2');
  for (const title of ['Hammers', 'Strings', 'Soundboard', 'Play and pitch', 'Photos', 'Review']) await next(page, title);
  await pick(page, 'submit-intake');
  await page.waitForURL(/\/pianos\/\d+$/);
  const pianoPath = new URL(page.url()).pathname;

  await pick(page, 'correct-assessment');
  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Keys');
  for (const title of ['Hammers', 'Strings', 'Soundboard', 'Play and pitch', 'Photos', 'Review']) await next(page, title);
  await fill(page, 'field-changeNote', 'Hammer grooves measured again.');
  await refuseOnce(page, 'correctAssessment', { message: 'Someone else corrected this assessment at the same moment: reload and try again.', extensions: { code: 'CONFLICT' } });
  await pick(page, 'submit-correction');
  await page.getByText('Someone else corrected this assessment at the same moment').first().waitFor();
  expect(new URL(page.url()).pathname).toBe(`${pianoPath}/correct`);
  await page.unrouteAll();
  await page.close();
});

// The id of a seeded piano by its stock number, asked through the API as the given user.
async function pianoIdOf(page: Page, email: string, stockNumber: string): Promise<number> {
  const login = await page.request.post(`${baseUrl()}/auth/login`, { data: { email, password: 'feltwire-demo' } });
  const { token } = (await login.json()) as { token: string };
  const res = await page.request.post(`${baseUrl()}/graphql`, {
    headers: { Authorization: `Bearer ${token}` },
    data: { query: 'query($stockNumber: String) { piano(stockNumberEq: $stockNumber) { id } }', variables: { stockNumber } },
  });
  const body = (await res.json()) as { data?: { piano: { id: number } | null }; errors?: unknown };
  expect(body.errors).toBeUndefined();
  return body.data!.piano!.id;
}

// Only this journey touches FW-0001 (the journeys share one seeded server): a piano logged before its inspection.
it('intake staff assess a piano logged before its inspection from its page, its details filled in, without losing another draft unasked', async () => {
  const page = await newPage(context, PHONE);
  const pianoId = await pianoIdOf(page, 'intake@feltwire.test', 'FW-0001');
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');

  // A new trade-in already begun on this device is not overwritten by the assessment.
  await pick(page, 'start-trade-in');
  await fill(page, 'field-seller-name', 'Odile Ferncastle');
  await page.waitForTimeout(600);

  await page.goto(`${baseUrl()}/pianos/${pianoId}`);
  await pick(page, 'assess-piano');
  await page.getByTestId('other-draft').waitFor();
  expect(new URL(page.url()).pathname).toBe('/trade-ins/new');
  await pick(page, 'confirm-discard');

  await expect(page.getByTestId('step-title').textContent()).resolves.toBe('Piano and seller');
  await expect(page.getByTestId('field-maker').inputValue()).resolves.toBe('Almsbury');
  await expect(page.getByTestId('field-model').inputValue()).resolves.toBe('Parlour 118');
  await expect(page.getByTestId('field-seller-name').inputValue()).resolves.toBe('');
  await page.getByText('Assessing FW-0001').first().waitFor();
  await shot(page, 'intake-assess-piano-phone');

  await fill(page, 'field-seller-name', 'Bertram Hollins');
  await pick(page, 'choice-acquisition-purchase');
  await pick(page, 'choice-inspectedAt-showroom');
  await next(page, 'Keys');
  await fill(page, 'field-keySidePlayMm', '1.8');
  for (const title of ['Hammers', 'Strings', 'Soundboard', 'Play and pitch', 'Photos', 'Review']) await next(page, title);
  const expected = gradeAssessment({ keySidePlayMm: 1.8 });
  await expect(verdict(page, 'live-condition')).resolves.toBe(says(expected));

  await pick(page, 'submit-intake');
  await page.waitForURL(new RegExp(`/pianos/${pianoId}$`));
  await expect(verdict(page, 'assessment-condition')).resolves.toBe(says(expected));
  await expect(page.getByTestId('piano-flash').textContent()).resolves.toContain('FW-0001');
  await expect(page.getByTestId('assess-piano').count()).resolves.toBe(0);
  await page.close();
});

it('an intake with every step left empty shows every area not inspected, claims no quality, and cannot be submitted', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');
  await pick(page, 'start-trade-in');
  await fill(page, 'field-seller-name', 'Perpetua Hallsworth');
  await pick(page, 'choice-acquisition-purchase');
  await pick(page, 'choice-inspectedAt-showroom');
  await fill(page, 'field-maker', 'Hollowmere');
  await pick(page, 'choice-kind-upright');
  for (const title of ['Keys', 'Hammers', 'Strings', 'Soundboard', 'Play and pitch', 'Photos', 'Review']) await next(page, title);

  // The review says so, area by area, and the live panel gives no verdict of quality.
  await expect(page.getByTestId('review-inspected').textContent()).resolves.toContain('Nothing is measured yet');
  for (const area of AREAS) {
    await expect(page.getByTestId('live-condition').getByTestId(`area-mark-${area}`).textContent()).resolves.toBe('Not inspected');
    await page.getByTestId(`review-not-inspected-${area}`).waitFor();
  }
  await expect(verdict(page, 'live-condition')).resolves.toBe('Not judged yet');
  const panel = (await page.getByTestId('live-condition').textContent()) ?? '';
  for (const claim of ['Ready for the floor', 'Fine', 'Excellent', 'of 100']) expect(panel).not.toContain(claim);
  await expect(page.getByTestId('grade-chip').textContent()).resolves.toContain('0 of 6 areas');
  await shot(page, 'intake-empty-review-phone');

  await pick(page, 'submit-intake');
  await page.getByText('The inspection has nothing measured yet').first().waitFor();
  expect(new URL(page.url()).pathname).toBe('/trade-ins/new');
  await pick(page, 'discard-draft');
  await pick(page, 'confirm-discard');
  await page.close();
});

it('warns at intake, before submit, of a piano taken in before with the same maker, model and serial', async () => {
  const page = await newPage(context, PHONE);
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');
  await pick(page, 'start-trade-in');
  // FW-0002 in the demo: the same maker, model and serial, typed another way
  await fill(page, 'field-maker', 'Thornquist & Hale');
  await fill(page, 'field-model', 'Studio B');
  await fill(page, 'field-serialNumber', 'th 88213');
  const notice = page.getByTestId('same-piano');
  await notice.waitFor();
  await expect(notice.textContent()).resolves.toContain('FW-0002');
  const open = page.getByTestId('same-piano-open-FW-0002');
  expect(await open.getAttribute('href')).toMatch(/^\/pianos\/\d+$/);
  await notice.scrollIntoViewIfNeeded();
  await shot(page, 'intake-same-piano-phone');
  await pick(page, 'same-piano-confirm-FW-0002');
  await expect(notice.textContent()).resolves.toContain('Confirmed');
  // Another serial: the warning goes, and so does the confirmation.
  await fill(page, 'field-serialNumber', 'TH-88214');
  await notice.waitFor({ state: 'detached' });
  await pick(page, 'discard-draft');
  await pick(page, 'confirm-discard');
  await page.close();
});
