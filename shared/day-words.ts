/**
 * Dates in words as the app writes them: "2 Dec 2026", in UTC (British order,
 * short month). One formatter, made once: Date.prototype.toLocaleDateString
 * builds a new one on every call, which was about a tenth of the bow list's
 * own time on the server under load (a CPU profile; tests/benchmarks/api-read.ts).
 *
 * Example: dayWordsOf(new Date('2026-12-01T10:00Z')) → '1 Dec 2026'; calendarDayWords('2026-10-24') → '24 Oct 2026'
 */
const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

/** The UTC calendar day of a moment, in words. */
export function dayWordsOf(at: Date): string {
  return dayFormat.format(at);
}

/** "24 Oct 2026" from "2026-10-24" (a calendar date: no zone shift); anything that is not a date comes back as given. */
export function calendarDayWords(isoDate: string): string {
  const date = new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDate;
  return dayFormat.format(date);
}
