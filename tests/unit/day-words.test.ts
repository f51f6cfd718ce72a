/**
 * Dates in words, written out by hand (shared/day-words.ts), against the
 * reference: the JavaScript engine's own Intl.DateTimeFormat with the Unicode
 * CLDR en-GB data that Node's ICU ships (ECMA-402), day by day.
 */
import fc from 'fast-check';
import { calendarDayWords, dayWordsOf } from '@/shared/day-words';

const reference = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

it('matches en-GB from Intl for every day from 1990 to 2060', () => {
  const day = 24 * 60 * 60 * 1000;
  let checked = 0;
  for (let t = Date.UTC(1990, 0, 1); t <= Date.UTC(2060, 11, 31); t += day) {
    expect(dayWordsOf(new Date(t))).toBe(reference.format(t));
    checked++;
  }
  expect(checked).toBe(25933); // 71 years of 365 days, and 18 leap days
});

it('takes the UTC day of any moment from year 1000 to 9999, as Intl with timeZone UTC does', () => {
  fc.assert(
    fc.property(fc.integer({ min: Date.UTC(1000, 0, 1), max: Date.UTC(9999, 11, 31) }), (t) => {
      expect(dayWordsOf(new Date(t))).toBe(reference.format(t));
    }),
  );
  expect(dayWordsOf(new Date('2026-12-01T23:59:59-05:00'))).toBe('2 Dec 2026');
});

it('writes September as CLDR’s en-GB does, and refuses an invalid date as Intl does', () => {
  expect(dayWordsOf(new Date('2026-09-05T12:00Z'))).toBe('5 Sept 2026');
  expect(() => dayWordsOf(new Date(Number.NaN))).toThrow(RangeError);
  expect(() => reference.format(Number.NaN)).toThrow(RangeError);
});

it('reads a calendar date without a zone shift, and gives back what is not a date', () => {
  expect(calendarDayWords('2026-10-24')).toBe('24 Oct 2026');
  expect(calendarDayWords('2026-10-24T23:30:00-08:00')).toBe('24 Oct 2026');
  expect(calendarDayWords('not a date')).toBe('not a date');
  expect(calendarDayWords('')).toBe('');
});
