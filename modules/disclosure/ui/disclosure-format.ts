import { formatCalendarDay, formatDay, formatDayTime, type DealerLocality } from '@/modules/shop/core/dealer-time';

import type { DisclosureView } from './public-disclosure';

// Buyers read the dealer's dates: in the shop's locale and time zone, whatever the phone's own are.

/** "1 December 2026" from an ISO time, the shop's day. */
export function longDay(iso: string | null | undefined, where: DealerLocality): string {
  return (iso && formatDay(iso, where)) || '—';
}

/** A calendar day written as YYYY-MM-DD stays that day wherever it is read. */
export function calendarDay(day: string | null | undefined, where: DealerLocality): string {
  return (day && formatCalendarDay(day, where.locale)) || '—';
}

/** "1 December 2026 at 14:05 CET", in the shop's time zone. */
export function dayAndTime(iso: string | null | undefined, where: DealerLocality): string {
  return (iso && formatDayTime(iso, where)) || '—';
}

/** The reader's own zone, for staff screens on the shop's own devices. */
export function deviceLocality(): DealerLocality {
  return { locale: 'en-GB', timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC' };
}

export { isCurrency, moneyText as money } from '@/modules/shop/core/money';

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
