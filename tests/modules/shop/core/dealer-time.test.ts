import { calendarDayIn, DEFAULT_LOCALITY, formatCalendarDay, formatDay, formatDayTime, isLocale, isTimeZone } from '@/modules/shop/core/dealer-time';

// The words and orders below are CLDR's date formats (as ICU in Node 20 carries them); the offsets are the IANA
// time zone database's: EU summer time from 01:00 UTC on the last Sunday of March to 01:00 UTC on the last Sunday
// of October (Directive 2000/84/EC), US daylight time ending at 02:00 local on the first Sunday of November.
describe('a day in the shop', () => {
  it.each([
    // an evening in UTC is already the next morning east of it, and still the same day west of it
    ['2026-12-02T23:30:00Z', 'en-GB', 'Europe/London', '2 December 2026'],
    ['2026-12-02T23:30:00Z', 'en-GB', 'Europe/Berlin', '3 December 2026'],
    ['2026-12-02T23:30:00Z', 'en-US', 'America/New_York', 'December 2, 2026'],
    ['2026-12-02T23:30:00Z', 'de-DE', 'Europe/Berlin', '3. Dezember 2026'],
    ['2026-12-02T23:30:00Z', 'fr-CA', 'America/Toronto', '2 décembre 2026'],
    ['2026-12-02T23:30:00Z', 'en-AU', 'Australia/Sydney', '3 December 2026'],
    ['2026-12-02T23:30:00Z', 'ja-JP', 'Asia/Tokyo', '2026年12月3日'],
  ])('%s in %s, %s is %s', (iso, locale, timeZone, expected) => {
    expect(formatDay(iso, { locale, timeZone })).toBe(expected);
  });

  it.each([
    ['2026-12-02T23:30:00Z', 'Europe/Berlin', '2026-12-03'],
    ['2026-12-02T23:30:00Z', 'America/Los_Angeles', '2026-12-02'],
    ['2026-12-03T04:59:00Z', 'America/New_York', '2026-12-02'],
    ['2026-12-03T05:00:00Z', 'America/New_York', '2026-12-03'],
    ['2026-06-30T14:00:00Z', 'Australia/Sydney', '2026-07-01'],
    ['2026-12-02T23:30:00Z', 'UTC', '2026-12-02'],
  ])('%s falls on the calendar day in %s: %s', (iso, zone, day) => {
    expect(calendarDayIn(iso, zone)).toBe(day);
  });

  it('keeps a stored calendar day that day in every locale', () => {
    expect(formatCalendarDay('2026-11-28', 'en-GB')).toBe('28 November 2026');
    expect(formatCalendarDay('2026-11-28', 'en-US')).toBe('November 28, 2026');
    expect(formatCalendarDay('2026-11-28T23:59:59Z', 'de-DE')).toBe('28. November 2026');
    expect(formatCalendarDay('not a day', 'en-GB')).toBe('');
  });
});

describe('a time in the shop, across the summer-time changes', () => {
  it.each([
    // Berlin: 01:00 UTC on 29 March 2026 the clocks go from 02:00 CET to 03:00 CEST
    ['2026-03-29T00:30:00Z', 'en-GB', 'Europe/Berlin', '29 March 2026 at 01:30 CET'],
    ['2026-03-29T01:30:00Z', 'en-GB', 'Europe/Berlin', '29 March 2026 at 03:30 CEST'],
    // and back on 25 October 2026: 03:00 CEST becomes 02:00 CET, so 02:30 happens twice
    ['2026-10-25T00:30:00Z', 'en-GB', 'Europe/Berlin', '25 October 2026 at 02:30 CEST'],
    ['2026-10-25T01:30:00Z', 'en-GB', 'Europe/Berlin', '25 October 2026 at 02:30 CET'],
    // New York: 1 November 2026 at 02:00 EDT the clocks go back to 01:00 EST
    ['2026-11-01T05:30:00Z', 'en-US', 'America/New_York', 'November 1, 2026 at 1:30 AM EDT'],
    ['2026-11-01T06:30:00Z', 'en-US', 'America/New_York', 'November 1, 2026 at 1:30 AM EST'],
    // London in summer and winter
    ['2026-07-02T23:30:00Z', 'en-GB', 'Europe/London', '3 July 2026 at 00:30 BST'],
    ['2026-12-02T23:30:00Z', 'en-GB', 'Europe/London', '2 December 2026 at 23:30 GMT'],
    ['2026-12-02T23:30:00Z', 'de-DE', 'Europe/Berlin', '3. Dezember 2026 um 00:30 MEZ'],
    ['2026-12-02T23:30:00Z', 'en-GB', 'UTC', '2 December 2026 at 23:30 UTC'],
  ])('%s in %s, %s reads %s', (iso, locale, timeZone, expected) => {
    expect(formatDayTime(iso, { locale, timeZone })).toBe(expected);
  });

  it('writes nothing for a time it cannot read, rather than a wrong one', () => {
    expect(formatDay('soon', DEFAULT_LOCALITY)).toBe('');
    expect(formatDayTime('', DEFAULT_LOCALITY)).toBe('');
    expect(() => calendarDayIn('yesterday', 'UTC')).toThrow(RangeError);
  });
});

describe('the settings a manager may type', () => {
  it.each([
    ['Europe/Berlin', true],
    ['America/Argentina/Buenos_Aires', true],
    ['UTC', true],
    ['Mars/Olympus_Mons', false],
    ['Europe/Berlin; drop table', false],
    ['', false],
  ])('time zone %s: %p', (zone, ok) => expect(isTimeZone(zone)).toBe(ok));

  it.each([
    ['en-GB', true],
    ['de-DE', true],
    ['fr-CA', true],
    ['xx-YY', false],
    ['not a locale', false],
    ['', false],
  ])('locale %s: %p', (locale, ok) => expect(isLocale(locale)).toBe(ok));
});
