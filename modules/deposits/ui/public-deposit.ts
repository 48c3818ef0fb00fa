// The buyer's side of a deposit: start a checkout, then read how the payment stands. No sign-in.
import type { Balance, DepositStatus } from '@/modules/deposits/core/deposit';
import { disclosureApi, errorMessage, UNREACHABLE, type Loaded } from '@/modules/disclosure/ui/public-disclosure';

export type { DepositStatus };

export interface PublicDepositStatus {
  status: DepositStatus | string;
  amountMinor: number;
  currency: string;
  holdExpiresAt: string | null;
  buyerName: string;
  stockNumber: string;
  balance: Balance | null;
  /** the shop's locale and time zone, for the hold's end */
  dealer: { locale: string; timeZone: string };
}

export type StartOutcome = { ok: true; url: string; amountMinor: number; currency: string } | { ok: false; message: string };

/** Asks for a checkout for the deposit; the answer's url is the payment provider's page. */
export async function startDeposit(token: string, receiptToken: string): Promise<StartOutcome> {
  let response: Response;
  try {
    response = await fetch(`${disclosureApi(token)}/deposit`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: JSON.stringify({ receiptToken }),
    });
  } catch {
    return { ok: false, message: UNREACHABLE };
  }
  if (response.status === 201) {
    const body = (await response.json().catch(() => null)) as { url?: string; amountMinor?: number; currency?: string } | null;
    if (body?.url) return { ok: true, url: body.url, amountMinor: body.amountMinor ?? 0, currency: body.currency ?? '' };
    return { ok: false, message: 'The server sent an answer this page does not understand.' };
  }
  const message = await errorMessage(response, 'The deposit could not be started');
  // "receiptToken: acknowledge the disclosure first" reads better without the field's name.
  return { ok: false, message: message.replace(/^receiptToken: (.)/, (_m, c: string) => c.toUpperCase()) };
}

export async function fetchDepositStatus(token: string, sessionId: string): Promise<Loaded<PublicDepositStatus>> {
  let response: Response;
  try {
    response = await fetch(`${disclosureApi(token)}/deposit?session=${encodeURIComponent(sessionId)}`, { headers: { Accept: 'application/json' }, cache: 'no-store' });
  } catch {
    return { state: 'error', message: UNREACHABLE };
  }
  if (response.status === 404) return { state: 'missing' };
  if (!response.ok) return { state: 'error', message: await errorMessage(response, 'The payment could not be looked up') };
  const data = (await response.json().catch(() => null)) as PublicDepositStatus | null;
  if (!data?.status || !data.dealer) return { state: 'error', message: 'The server sent an answer this page does not understand.' };
  return { state: 'ok', data };
}
