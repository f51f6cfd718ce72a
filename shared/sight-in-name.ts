/**
 * One name for a sight-in wherever one is named (bow lists, Before a
 * trip, Predict's "carried on the sight of", the tape and sight-in screens,
 * the server's trip warnings), so that two of one day can be told apart:
 * the day, then the time it was recorded when another sight-in of the bow has
 * the same day, then the place and the arrow build.
 *
 * Example: sightInName({ id: 7, date: '2026-12-02', placeLabel: 'Larch Hollow range', buildId: 3, createdAt: '2026-12-02T14:05:00Z' },
 *   { builds: [{ id: 3, name: 'Elk heavy' }], siblings, timeZone: 'UTC' })
 *   → '2 Dec 2026, 14:05 UTC · Larch Hollow range · Elk heavy' (when a sibling is of 2 Dec 2026 too)
 */
import { calendarDayWords } from './day-words';

/** What naming a sight-in needs: its day, place, build and when it was recorded. */
export interface NameableSightIn {
  id: number;
  date: string;
  placeLabel: string;
  buildId: number;
  /** ISO time the sight-in was recorded (its date is a calendar day only). */
  createdAt?: string;
}

export interface SightInNameOptions {
  /** The bow's builds (to name the sight-in's), or the build name itself. */
  builds?: readonly { id: number; name: string }[];
  buildName?: string;
  /** The bow's other sight-ins: the time is added when one of them has the same day. */
  siblings?: readonly NameableSightIn[];
  /** Time zone for the time of day (IANA name); default: the runtime's own. "UTC" is written out. */
  timeZone?: string;
  /** Leave the build out (e.g. in a list already under the build's name). */
  withoutBuild?: boolean;
}

/** "2 Dec 2026" from "2026-12-02" (a calendar date: no zone shift). */
export function sightInDay(isoDate: string): string {
  return calendarDayWords(isoDate);
}

/** "14:05" (24-hour) of an ISO time in `timeZone`, or '' when it is not a time. */
function timeOfDay(iso: string | undefined, timeZone?: string): string {
  if (!iso) return '';
  const when = new Date(iso);
  if (Number.isNaN(when.getTime())) return '';
  const words = when.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit', hour12: false, ...(timeZone ? { timeZone } : {}) });
  return timeZone === 'UTC' ? `${words} UTC` : words;
}

/** The parts of the name: the day (with the time when needed), the place, the build and "(2 of 2)" for twins of one minute. */
export function sightInNameParts(
  sightIn: NameableSightIn,
  options: SightInNameOptions = {},
): { day: string; place: string; build: string; ordinal: string } {
  const sameDay = (options.siblings ?? []).filter(
    (other) => other.id !== sightIn.id && other.date.slice(0, 10) === sightIn.date.slice(0, 10),
  );
  let day = sightInDay(sightIn.date);
  if (sameDay.length > 0) {
    const time = timeOfDay(sightIn.createdAt, options.timeZone);
    if (time) day += `, ${time}`;
  }
  const build = options.withoutBuild ? '' : (options.buildName ?? options.builds?.find((b) => b.id === sightIn.buildId)?.name ?? '');
  // Same day, place, build and minute: number them in the order they were recorded.
  const twins = sameDay.filter(
    (other) =>
      other.placeLabel.trim() === sightIn.placeLabel.trim() &&
      other.buildId === sightIn.buildId &&
      timeOfDay(other.createdAt, options.timeZone) === timeOfDay(sightIn.createdAt, options.timeZone),
  );
  let ordinal = '';
  if (twins.length > 0) {
    const order = [...twins, sightIn].sort((a, b) => (a.createdAt ?? '').localeCompare(b.createdAt ?? '') || a.id - b.id);
    ordinal = `(${order.indexOf(sightIn) + 1} of ${order.length})`;
  }
  return { day, place: sightIn.placeLabel.trim(), build, ordinal };
}

/** The sight-in's name (see the module comment). */
export function sightInName(sightIn: NameableSightIn, options: SightInNameOptions = {}): string {
  const { day, place, build, ordinal } = sightInNameParts(sightIn, options);
  const name = [day, place, build].filter(Boolean).join(' · ');
  return ordinal ? `${name} ${ordinal}` : name;
}
