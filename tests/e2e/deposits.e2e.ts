// A deposit end to end: the buyer acknowledges on their phone, pays on the payment provider's page,
// comes back to a confirmed hold; floor staff see the piano held; the receipt is in the inbox.
import type { BrowserContext } from 'playwright-core';

import { gql, login, TABLET, waitForMail } from './support/api';
import { baseUrl, newPage, openBrowser, payWithTestCard, PHONE, shot, signIn } from './support/browser';

let staff: { context: BrowserContext; close: () => Promise<void> };
let buyer: { context: BrowserContext; close: () => Promise<void> };
beforeAll(async () => {
  staff = await openBrowser();
  buyer = await openBrowser();
});
afterAll(async () => {
  await staff?.close();
  await buyer?.close();
});

it('holds a piano for a buyer who acknowledged the disclosure and paid the deposit', async () => {
  const floorToken = await login('floor@feltwire.test');
  const { pianos } = await gql<{ pianos: { id: number; stockNumber: string }[] }>(floorToken, '{ pianos(stageEq: on_floor) { id stockNumber } }');
  // The second piano on the floor: the disclosure journey uses the first.
  const piano = [...pianos].sort((a, b) => a.id - b.id)[1];
  expect(piano).toBeTruthy();
  const { disclosures } = await gql<{ disclosures: { token: string } }>(floorToken, `{ disclosures(pianoId: ${piano.id}) { token versions { version digest } } }`);

  const phone = await buyer.context.newPage();
  await phone.setViewportSize(PHONE);
  await phone.goto(`${baseUrl()}/d/${disclosures.token}`);
  await phone.getByTestId('disclosure-code').waitFor();
  // No deposit before the buyer acknowledged the current version.
  expect(await phone.getByTestId('deposit-start').count()).toBe(0);
  const email = `e2e-deposit-${Date.now()}@buyers.test`;
  await phone.getByTestId('ack-name').fill('Tamsin Okonkwo-Reyes');
  await phone.getByTestId('ack-email').fill(email);
  await phone.getByTestId('ack-read').click();
  await phone.getByTestId('ack-submit').click();
  await phone.getByTestId('ack-done').waitFor();
  await phone.getByTestId('deposit-start').scrollIntoViewIfNeeded();
  const amount = (await phone.getByTestId('deposit-amount').textContent())!.trim();
  expect(amount).toMatch(/^USD [\d,]+\.\d\d$/);
  // The buyer reads the terms, and no advice meant for the dealer.
  await phone.getByText('holds it for you for', { exact: false }).last().waitFor();
  expect(await phone.getByText(/template|legal advice/i).count()).toBe(0);
  await shot(phone, 'disc-e2e-deposit-offer');

  // Off to the payment provider's page; it pays with the test card that succeeds.
  await phone.getByTestId('deposit-start').click();
  await payWithTestCard(phone);

  // Back on Feltwire: the page waits for the payment's webhook, then shows the hold.
  await phone.waitForURL(`**/d/${disclosures.token}/deposit?session=*`);
  await phone.getByTestId('deposit-held').waitFor({ timeout: 30_000 });
  expect(await phone.getByTestId('deposit-held').textContent()).toContain('Held for you until');
  expect(await phone.getByTestId('deposit-held').textContent()).toContain(amount);
  expect((await phone.getByTestId('deposit-balance-due').textContent())?.trim()).toMatch(/^USD [\d,]+\.\d\d$/);
  await shot(phone, 'disc-e2e-deposit-held');

  // The disclosure no longer offers a deposit to anyone, and leads this buyer back to the hold.
  await phone.goto(`${baseUrl()}/d/${disclosures.token}`);
  await phone.getByTestId('disclosure-availability').waitFor();
  expect(await phone.getByTestId('disclosure-availability').textContent()).toContain('Not available');
  await phone.getByTestId('deposit-see-hold').waitFor();
  expect(await phone.getByTestId('deposit-start').count()).toBe(0);

  // Floor staff see the piano held, on its page and on the tablet view with the buyer's name.
  const tablet = await newPage(staff.context, TABLET);
  await signIn(tablet, 'floor@feltwire.test');
  await tablet.waitForURL('**/showroom');
  await tablet.goto(`${baseUrl()}/pianos/${piano.id}`);
  await tablet.getByTestId('piano-stage').waitFor();
  expect(await tablet.getByTestId('piano-stage').textContent()).toBe('Held');
  await tablet.goto(`${baseUrl()}/present/${piano.id}`);
  await tablet.getByTestId('deposits-holding').waitFor();
  expect(await tablet.getByTestId('present-stage').textContent()).toBe('Held');
  expect(await tablet.getByTestId('deposits-holding').textContent()).toContain('Tamsin Okonkwo-Reyes');
  await tablet.getByTestId('deposits-holding').scrollIntoViewIfNeeded();
  await shot(tablet, 'disc-e2e-deposit-staff');

  // The receipt is in the inbox.
  const receipt = await waitForMail((m) => m.to.includes(email) && m.subject.startsWith('Receipt'));
  expect(receipt.subject).toContain(piano.stockNumber);
  await tablet.close();
  await phone.close();
});
