/**
 * Dates in words as the app writes them: "2 Dec 2026", in UTC (British order,
 * short month, as CLDR's en-GB medium date writes them, "Sept" included).
 *
 * Written out by hand rather than with Intl.DateTimeFormat: a page's first
 * Intl date formatter loads the locale's data, about 100 ms on a phone-speed
 * CPU (Chromium at 4× CPU throttling), and the Bench's bow cards were where it
 * happened, inside their first render. tests/unit/day-words.test.ts checks
 * this against Intl's en-GB output day by day.
 *
 * Example: dayWordsOf(new Date('2026-12-01T10:00Z')) → '1 Dec 2026'; calendarDayWords('2026-10-24') → '24 Oct 2026'
 */
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sept', 'Oct', 'Nov', 'Dec'] as const;

/** The UTC calendar day of a moment, in words. An invalid date throws a RangeError, as Intl's formatter does. */
export function dayWordsOf(at: Date): string {
  if (Number.isNaN(at.getTime())) throw new RangeError('Invalid time value');
  return `${at.getUTCDate()} ${MONTHS[at.getUTCMonth()]} ${at.getUTCFullYear()}`;
}

/** "24 Oct 2026" from "2026-10-24" (a calendar date: no zone shift); anything that is not a date comes back as given. */
export function calendarDayWords(isoDate: string): string {
  const date = new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDate;
  return dayWordsOf(date);
}
