/**
 * The screens' dates in words, each from one formatter made once (not a new
 * Intl formatter per call, which a CPU profile of the Bench's first render
 * showed). Expected strings follow the en-GB patterns of the Unicode CLDR
 * data that Node's ICU ships: "4 Oct 2026", "2 Dec 2026, 14:05".
 */
import { formatDay } from '@/components/bows/readiness-words';
import { formatDate, formatWhen } from '@/components/level/level-words';

it('writes a calendar date as entered, with no time-zone shift', () => {
  expect(formatDay('2026-10-04')).toBe('4 Oct 2026');
  expect(formatDay('2026-01-31T23:59:59Z')).toBe('31 Jan 2026');
  expect(formatDay('not a date')).toBe('not a date');
});

it('writes a moment in the device time zone, day first', () => {
  const at = new Date(2026, 11, 2, 14, 5); // 2 Dec 2026, 14:05 local time
  expect(formatWhen(at.toISOString())).toBe('2 Dec 2026, 14:05');
  expect(formatDate(at.toISOString())).toBe('2 Dec 2026');
  expect(formatWhen('garbled')).toBe('garbled');
  expect(formatDate('')).toBe('');
});
