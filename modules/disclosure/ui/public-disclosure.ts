// The buyer's side of a disclosure: the public JSON behind an unguessable link, read without signing in.
import type { AcknowledgementAnswer, DisclosureContent, DisclosureContentV1 } from '@/modules/disclosure/core/disclosure';

export interface DisclosurePhoto {
  id: number;
  area: string;
  caption: string | null;
  /** a short-lived link to the image; null when the file is gone */
  url: string | null;
}

/** Published content as the buyer's page receives it: either format, with a link to each photo. */
export type DisclosureView = (Omit<DisclosureContent, 'photos'> | Omit<DisclosureContentV1, 'photos'>) & { photos: DisclosurePhoto[] };

/** The dealer as the buyer's page names it: whom to ask, and where its dates are written. */
export interface PublicDealer {
  name: string;
  locale: string;
  timeZone: string;
  /** address lines, then telephone, e-mail and website, as far as the dealer gave them */
  contact: string[];
}

export interface PublicDisclosure {
  version: number;
  digest: string;
  /** the short code printed on the papers, checked on the check page */
  verificationCode: string;
  dealer: PublicDealer;
  publishedAt: string;
  newestVersion: number;
  /** when the newest version was published */
  changedAt: string;
  isNewest: boolean;
  /** true while the piano is on the floor and not held */
  available: boolean;
  content: DisclosureView;
  /** the deposit the server asks, when it says; otherwise the page works it out from the default rules */
  depositTerms?: { amountMinor: number; currency: string; holdDays: number } | null;
}

export type Loaded<T> = { state: 'ok'; data: T } | { state: 'missing' } | { state: 'error'; message: string };

export const UNREACHABLE = 'The server cannot be reached. Check the connection and try again.';

export function disclosureApi(token: string): string {
  return `/api/public/disclosures/${encodeURIComponent(token)}`;
}

/** The check page, with a code filled in. */
export function checkPageUrl(code?: string): string {
  return code ? `/check/${encodeURIComponent(code)}` : '/check';
}

export interface CheckedVersion {
  id: number;
  dealerName: string;
  stockNumber: string;
  piano: string;
  version: number;
  publishedOn: string;
  newestVersion: number;
  newestOn: string;
}

export type CheckOutcome = { ok: true; code: string; versions: CheckedVersion[] } | { ok: false; message: string };

/** Asks which published version a paper's code belongs to. */
export async function checkCode(code: string): Promise<CheckOutcome> {
  let response: Response;
  try {
    response = await fetch(`/api/public/check/${encodeURIComponent(code)}`, { headers: { Accept: 'application/json' }, cache: 'no-store' });
  } catch {
    return { ok: false, message: UNREACHABLE };
  }
  if (!response.ok) {
    const message = await errorMessage(response, 'The code could not be checked');
    return { ok: false, message: message.replace(/^code: (.)/, (_m, c: string) => c.toUpperCase()) };
  }
  const body = (await response.json().catch(() => null)) as { code?: string; versions?: CheckedVersion[] } | null;
  if (!body?.code || !Array.isArray(body.versions)) return { ok: false, message: 'The server sent an answer this page does not understand.' };
  return { ok: true, code: body.code, versions: body.versions };
}

/** The published page of a checked version, as it was frozen. */
export function checkedVersionUrl(code: string, id: number): string {
  return `/api/public/check/${encodeURIComponent(code)}/html?id=${id}`;
}

/** The frozen HTML of a version, for printing. */
export function printableUrl(token: string, version: number): string {
  return `${disclosureApi(token)}/html?version=${version}`;
}

/** The server's words for a refusal ({ error }), or a plain fallback with the status. */
export async function errorMessage(response: Response, fallback: string): Promise<string> {
  const body: unknown = await response.json().catch(() => null);
  const error = (body as { error?: unknown } | null)?.error;
  return typeof error === 'string' ? error : `${fallback} (${response.status}).`;
}

export async function fetchDisclosure(token: string, version: number | null): Promise<Loaded<PublicDisclosure>> {
  let response: Response;
  try {
    response = await fetch(`${disclosureApi(token)}${version != null ? `?version=${version}` : ''}`, { headers: { Accept: 'application/json' }, cache: 'no-store' });
  } catch {
    return { state: 'error', message: UNREACHABLE };
  }
  if (response.status === 404) return { state: 'missing' };
  if (!response.ok) return { state: 'error', message: await errorMessage(response, 'The disclosure could not be loaded') };
  const data = (await response.json().catch(() => null)) as PublicDisclosure | null;
  if (!data?.content || typeof data.digest !== 'string' || !data.dealer) return { state: 'error', message: 'The server sent an answer this page does not understand.' };
  return { state: 'ok', data };
}

export type { AcknowledgementAnswer };

export type AcknowledgeOutcome =
  | { ok: true; answer: AcknowledgementAnswer }
  /** status 409: the disclosure changed since it was opened; 400: a field the server blames */
  | { ok: false; status: number; field: string | null; message: string };

export async function postAcknowledgement(token: string, body: { fullName: string; email: string; read: true; digest: string }): Promise<AcknowledgeOutcome> {
  let response: Response;
  try {
    response = await fetch(`${disclosureApi(token)}/acknowledge`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, field: null, message: UNREACHABLE };
  }
  if (response.status === 201 || response.status === 200) {
    const answer = (await response.json().catch(() => null)) as AcknowledgementAnswer | null;
    if (answer?.receiptToken) return { ok: true, answer };
    return { ok: false, status: 500, field: null, message: 'The server sent an answer this page does not understand.' };
  }
  const message = await errorMessage(response, 'The acknowledgement was not recorded');
  // 400 answers read "fullName: type your full name"; the form puts the rest beside that field.
  const match = response.status === 400 ? /^(fullName|email|read|digest): (.*)$/.exec(message) : null;
  return match ? { ok: false, status: 400, field: match[1], message: match[2] } : { ok: false, status: response.status, field: null, message };
}
