// Dates and times as the dealer writes them: in the shop's locale and time zone (shop settings), the
// same on every screen, page, PDF and e-mail a buyer reads. Pure: locale and zone are arguments.

/** Where the shop is: the language its dates are written in (a BCP 47 tag) and its IANA time zone. */
export interface DealerLocality {
  locale: string;
  timeZone: string;
}

/** The shop's start until a manager sets its own: British-style dates, in UTC. */
export const DEFAULT_LOCALITY: DealerLocality = { locale: 'en-GB', timeZone: 'UTC' };

/** True for a time zone this runtime knows (IANA names such as Europe/Berlin, or UTC). */
export function isTimeZone(value: string): boolean {
  if (!/^[A-Za-z][A-Za-z0-9_+\-/]{0,63}$/.test(value)) return false;
  try {
    new Intl.DateTimeFormat('en', { timeZone: value });
    return true;
  } catch {
    return false;
  }
}

/** True for a well-formed language tag that this runtime formats dates in (en-GB, de-DE, fr-CA...). */
export function isLocale(value: string): boolean {
  try {
    return Intl.getCanonicalLocales(value).length === 1 && Intl.DateTimeFormat.supportedLocalesOf(value).length === 1;
  } catch {
    return false;
  }
}

// One formatter per options, locale and zone: building them is what costs.
const cache = new Map<string, Intl.DateTimeFormat>();
function formatter(where: DealerLocality, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${where.locale}|${where.timeZone}|${JSON.stringify(options)}`;
  let f = cache.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(where.locale, { ...options, timeZone: where.timeZone });
    cache.set(key, f);
  }
  return f;
}

const instant = (iso: string): Date | null => {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? null : d;
};

const LONG_DAY: Intl.DateTimeFormatOptions = { day: 'numeric', month: 'long', year: 'numeric' };
// Some ICU versions put a narrow no-break space before "PM": a plain space reads the same and every font has it.
const plainSpaces = (text: string) => text.replace(/[\u202f\u00a0]/g, ' ');

/** The day an instant falls on in the shop, written out: "3 December 2026" (en-GB), "December 3, 2026" (en-US). */
export function formatDay(iso: string, where: DealerLocality): string {
  const d = instant(iso);
  return d ? plainSpaces(formatter(where, LONG_DAY).format(d)) : '';
}

/** Day and time in the shop, with the zone's short name: "3 December 2026 at 14:05 CET". */
export function formatDayTime(iso: string, where: DealerLocality): string {
  const d = instant(iso);
  return d ? plainSpaces(formatter(where, { ...LONG_DAY, hour: 'numeric', minute: '2-digit', timeZoneName: 'short' }).format(d)) : '';
}

/** A calendar day kept as YYYY-MM-DD (an inspection's day) in the shop's words; it is that day wherever it is read. */
export function formatCalendarDay(day: string, locale: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})/.exec(day);
  if (!m) return '';
  return plainSpaces(formatter({ locale, timeZone: 'UTC' }, LONG_DAY).format(new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])))));
}

/** The YYYY-MM-DD an instant falls on in a time zone (an intake at 23:30 UTC is the next day in Berlin). */
export function calendarDayIn(iso: string, timeZone: string): string {
  const d = instant(iso);
  if (!d) throw new RangeError(`not a time: ${iso}`);
  const parts = formatter({ locale: 'en-US', timeZone }, { year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(d);
  const part = (type: string) => parts.find((p) => p.type === type)!.value;
  return `${part('year')}-${part('month')}-${part('day')}`;
}
