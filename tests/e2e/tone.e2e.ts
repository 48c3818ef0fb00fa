import fs from 'node:fs';
import path from 'node:path';

import type { BrowserContext, Page } from 'playwright-core';

import { encodeWav } from '@/modules/tone/core/wav';

import { run, silence, concat } from '../support/tone-signals';
import { gql, login, TABLET } from './support/api';
import { baseUrl, newPage, openBrowser, PHONE, shot, signIn, WIDE } from './support/browser';

// Only this journey records on FW-0004 (the journeys share one seeded server); recordings change no stage.
const KEYS = [28, 33, 37, 40, 44, 45, 47, 49, 52, 56, 61, 64];
const dir = path.join(process.cwd(), '.tmp');
const wavPath = path.join(dir, 'e2e-play-test.wav');
// A run played 25 cents flat, key 45 louder than the rest: the report must call for a pitch raise and flag key 45.
const SOUND = concat(silence(0.6), run(KEYS, { noteS: 0.8, gapS: 0.35, centsOff: () => -25, amplitude: (k) => (k === 45 ? 0.8 : 0.3) }));

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  fs.mkdirSync(dir, { recursive: true });
  fs.writeFileSync(wavPath, encodeWav(SOUND, 44100));
  ({ context, close } = await openBrowser({
    args: ['--use-fake-device-for-media-stream', `--use-file-for-fake-audio-capture=${wavPath}%noloop`, '--autoplay-policy=no-user-gesture-required'],
    permissions: ['microphone'],
  }));
});
afterAll(() => close());

async function pianoId(stockNumber: string): Promise<number> {
  const token = await login('manager@feltwire.test');
  const data = await gql<{ pianos: { id: number; stockNumber: string }[] }>(token, '{ pianos(limit: 100) { id stockNumber } }');
  return data.pianos.find((p) => p.stockNumber === stockNumber)!.id;
}

async function storedKeys(id: number): Promise<number[][]> {
  const token = await login('manager@feltwire.test');
  const data = await gql<{ toneRecordings: { notes: { key: number; cents: number }[] }[] }>(token, `{ toneRecordings(where: { pianoId: ${id} }) { notes { key cents } } }`);
  return data.toneRecordings.map((r) => r.notes.map((n) => n.key));
}

async function expectReport(page: Page) {
  const report = page.locator('[data-testid$="-report"]').first();
  await report.waitFor({ timeout: 30_000 });
  await report.getByTestId(/-pitch-raise$/).waitFor();
  expect(await report.getByTestId(/-pitch-raise$/).textContent()).toContain('eye protection');
  await report.getByTestId(/-chart-svg$/).waitFor();
  // The chart's numbers are a table too; key 45 stands out in level.
  expect(await report.getByTestId(/-chart-row-49$/).textContent()).toMatch(/49A4−2[4-6]\.\d/);
  expect(await report.getByTestId(/-stand-out$/).textContent()).toContain('Key 45 (F4)');
  return report;
}

it('a technician records a piano through the microphone on a phone: a live level and note, then the results and the chart', async () => {
  const id = await pianoId('FW-0004');
  const page = await newPage(context, PHONE);
  await signIn(page, 'tech@feltwire.test');
  await page.waitForURL('**/bench');
  await page.goto(`${baseUrl()}/pianos/${id}`);
  await page.getByTestId('tone-recorder-record').click();
  const started = Date.now();
  await page.getByTestId('tone-recorder-live').waitFor();
  // The analysis runs in the browser too: the last note heard, while recording.
  await page.getByText(/Last note heard: .* \(key \d+\), 2\d(\.\d)? cents flat/).waitFor({ timeout: 15_000 });
  await page.getByTestId('tone-recorder-live').scrollIntoViewIfNeeded();
  await shot(page, 'tone-recording-phone');
  expect(await page.getByTestId('tone-recorder-level').textContent()).toMatch(/Level (−?\d+|below −60) dB/);
  // The whole run is 14.4 s long; stop once it has played.
  // Counted from the start: the screenshot's accessibility check takes time of its own, and the fake microphone loops.
  await page.waitForTimeout(Math.max(0, started + (SOUND.length / 44100) * 1000 + 500 - Date.now()));
  await page.getByTestId('tone-recorder-stop').click();
  const report = await expectReport(page);
  await report.scrollIntoViewIfNeeded();
  await shot(page, 'tone-report-phone');
  await report.getByTestId(/-chart-toggle$/).click();
  await report.getByTestId(/-chart-table$/).scrollIntoViewIfNeeded();
  await shot(page, 'tone-table-phone');

  const [keys] = await storedKeys(id);
  expect(keys).toEqual(KEYS);

  // The same page on a tablet and a wide screen: the recordings sit in the main column.
  for (const [size, name] of [[TABLET, 'tablet'], [WIDE, 'wide']] as const) {
    await page.setViewportSize(size);
    // From 900 px the page re-lays itself in two columns: wait for the recordings to settle there.
    await page.waitForTimeout(500);
    await page.locator('[data-testid$="-chart-svg"]').first().waitFor();
    await page.locator('[data-testid$="-pitch-raise"]').first().scrollIntoViewIfNeeded();
    await shot(page, `tone-piano-${name}`);
  }
  await page.close();
});

it('intake staff fill the play test of a correction from an uploaded WAV, on a wide screen', async () => {
  const id = await pianoId('FW-0004');
  const page = await newPage(context, WIDE);
  await signIn(page, 'intake@feltwire.test');
  await page.waitForURL('**/trade-ins');
  await page.goto(`${baseUrl()}/pianos/${id}/correct`);
  await page.getByTestId('step-title').waitFor();
  for (let i = 0; i < 8 && (await page.getByTestId('step-title').textContent()) !== 'Play and pitch'; i++) await page.getByTestId('step-next').click();
  await page.getByTestId('tone-recorder-upload-file').setInputFiles(wavPath);
  await expectReport(page);
  await page.locator('[data-testid$="-fill"]').first().click();
  await page.locator('[data-testid$="-fill-confirm"]').first().click();
  // 25 cents below 440 Hz is 433.7 Hz (A. J. Ellis, 1885: the cent); key 45 stands out
  await expect(page.getByTestId('field-a4Hz').inputValue()).resolves.toMatch(/^433\.[5-9]$/);
  await expect(page.getByTestId('field-notesStickingOut').inputValue()).resolves.toBe('45');
  await page.getByTestId('play-recording').scrollIntoViewIfNeeded();
  await shot(page, 'tone-correction-wide');
  // Not submitted: the draft recording stays the user's own, off the piano.
  expect((await storedKeys(id)).length).toBe(1);
  await page.getByTestId('discard-draft').click();
  await page.getByTestId('confirm-discard').click();
  await page.close();
});

it('says plainly when the microphone is refused', async () => {
  const page = await newPage(context, PHONE);
  await context.clearPermissions();
  await signIn(page, 'floor@feltwire.test');
  await page.waitForURL('**/showroom');
  await page.goto(`${baseUrl()}/pianos/${await pianoId('FW-0004')}`);
  await page.getByTestId('tone-recorder-record').click();
  await page.getByTestId('tone-recorder-problem').waitFor();
  expect(await page.getByTestId('tone-recorder-problem').textContent()).toContain('not allowed to use the microphone');
  await page.getByTestId('tone-recorder-problem').scrollIntoViewIfNeeded();
  await shot(page, 'tone-refused-phone');
  await context.grantPermissions(['microphone']);
  await page.close();
});
