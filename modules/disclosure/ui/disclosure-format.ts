import { CURRENCY_DIGITS, formatMoney, type Currency } from '@/modules/shop/core/money';

import type { DisclosureView } from './public-disclosure';

const DAY = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' });
const DAY_UTC = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
const DAY_TIME = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "1 December 2026" from an ISO time, in the reader's time zone. */
export function longDay(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : DAY.format(date);
}

/** A calendar day written as YYYY-MM-DD stays that day wherever it is read. */
export function calendarDay(day: string | null | undefined): string {
  if (!day) return '—';
  const date = new Date(`${day.slice(0, 10)}T00:00:00Z`);
  return Number.isNaN(date.getTime()) ? day : DAY_UTC.format(date);
}

export function dayAndTime(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : DAY_TIME.format(date);
}

export function isCurrency(value: string): value is Currency {
  return Object.prototype.hasOwnProperty.call(CURRENCY_DIGITS, value);
}

/** Money as the shop writes it (USD 4,275.00); an unknown currency still shows its number. */
export function money(minor: number, currency: string): string {
  return isCurrency(currency) ? formatMoney(minor, currency) : `${currency} ${minor}`;
}

export function pianoTitle(piano: DisclosureView['piano']): string {
  return piano.model ? `${piano.maker} ${piano.model}` : piano.maker;
}

const capital = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "Upright, 125 cm tall · made in 2008 · satin oak" */
export function pianoLine(piano: DisclosureView['piano']): string {
  const known = piano.year && piano.year !== 'year unknown';
  const year = known ? (/^\d{4}$/.test(piano.year) ? `made in ${piano.year}` : `made ${piano.year}`) : 'year of making not known';
  return [capital(piano.size), year, piano.finish].filter(Boolean).join(' · ');
}
