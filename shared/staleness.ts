import type { BowChangeKind } from './level-status';
import { bowChangeLabels } from './level-status';
import { dayWordsOf } from './day-words';

/**
 * One staleness rule for fits and tapes, used by the server (readiness, the
 * bow, the sight-in, the tape and the printed sheet) and the client. Pure and
 * dependency-free; tests/unit/staleness.test.ts is its specification.
 *
 * A sight-in's marks hold for the bow as it was when they were shot. Anything
 * that moves the point of impact afterwards (trade practice, no published
 * source) means the marks, the fit and every tape printed from them must be
 * confirmed at the range:
 *
 *  - a logged change of string, cables, rest, peep, sight moved or
 *    re-mounted, arrows, nock height, D-loop, cams or sight radius (the
 *    change log of shared/level-status.ts; "other" does not count: it is a
 *    note, not a known cause). A set-up entry that differs from the last one
 *    and a paper-tune adjustment log such a change; so does editing the bow's
 *    peep height or sight radius;
 *  - the sight-in's arrow build edited after it (that build only).
 *
 * When is a change "after" a sight-in? A sight-in carries a calendar date and
 * the moment it was saved. A change on a later calendar day (UTC) is after
 * it; on the same day, a change logged after the sight-in was saved is after
 * it; on an earlier day it is before.
 *
 * What clears it, for the changes up to that moment:
 *  - a newer sight-in with the same arrow build that the change is not after
 *    (its marks were shot on the changed bow; it supersedes this one);
 *  - the archer confirming this sight-in's marks at the range.
 *
 * A tape is stale when its sight-in is (a tape printed after the change from
 * the older marks is just as wrong).
 *
 * Example:
 *   fitStaleness({ fit: { id: 1, buildId: 2, date: '2026-11-20', createdAt: new Date('2026-11-20T18:00Z') },
 *     fits: [...], changes: [{ id: 'c9', kind: 'peep', at: new Date('2026-12-01T10:00Z') }], confirmations: [] })
 *   → { state: 'confirm', reason: 'Peep moved on 1 Dec 2026, after this sight-in: confirm the marks at the range.', … }
 */

/** The change kinds that move the point of impact. */
export const impactChangeKinds: readonly BowChangeKind[] = [
  'string',
  'cables',
  'sight-moved',
  'sight-remounted',
  'rest',
  'peep',
  'arrows',
  'nock-height',
  'd-loop',
  'cams',
  'sight-radius',
];

/** True when a logged change of this kind makes earlier marks need confirming. */
export function movesImpact(kind: BowChangeKind | 'build'): boolean {
  return kind === 'build' || impactChangeKinds.includes(kind);
}

/** A sight-in as the rule reads it. */
export interface FitFacts {
  id: number;
  buildId: number;
  /** Calendar date of the sight-in, YYYY-MM-DD. */
  date: string;
  /** When it was saved. */
  createdAt: Date;
}

/** A change as the rule reads it: a logged bow change, or an edit of an arrow build ('build', with its id). */
export interface ImpactChange {
  id: number | string;
  kind: BowChangeKind | 'build';
  at: Date;
  /** For 'build': the build edited. */
  buildId?: number | null;
  note?: string;
}

/** "Marks confirmed at the range" on a sight-in. */
export interface RangeConfirmation {
  sightInId: number;
  at: Date;
}

export interface Staleness {
  state: 'current' | 'confirm';
  /** One plain sentence; '' when current. */
  reason: string;
  /** When the first change that counts happened (ISO), or null. */
  since: string | null;
  /** The changes that count, oldest first. */
  changeIds: (number | string)[];
}

export const currentStaleness: Staleness = { state: 'current', reason: '', since: null, changeIds: [] };

const label = (change: ImpactChange) => (change.kind === 'build' ? 'Arrow build edited' : bowChangeLabels[change.kind]);

/** "1 Dec 2026" (UTC). */
export function stalenessDay(at: Date): string {
  return dayWordsOf(at);
}

/**
 * True when the change happened after the sight-in's marks were shot (rule in the header).
 * Example: changeIsAfter(new Date('2026-12-02T09:00Z'), { date: '2026-12-01', createdAt: new Date('2026-12-01T17:00Z') }) → true
 */
export function changeIsAfter(at: Date, fit: Pick<FitFacts, 'date' | 'createdAt'>): boolean {
  const day = at.toISOString().slice(0, 10);
  if (day !== fit.date) return day > fit.date;
  return at.getTime() > fit.createdAt.getTime();
}

/**
 * Whether one sight-in (and its tapes) must be confirmed at the range, and why.
 * `fits` are all the bow's sight-ins (for the "newer sight-in clears it" rule);
 * `changes` the bow's changes (any order); `confirmations` any (only those of `fit` count).
 */
export function fitStaleness(input: {
  fit: FitFacts;
  fits: readonly FitFacts[];
  changes: readonly ImpactChange[];
  confirmations: readonly RangeConfirmation[];
}): Staleness {
  const { fit, fits, changes, confirmations } = input;
  const counting = changes
    .filter((change) => movesImpact(change.kind))
    .filter((change) => change.kind !== 'build' || change.buildId === fit.buildId)
    .filter((change) => changeIsAfter(change.at, fit))
    // A newer sight-in of the same build, shot on the changed bow, supersedes this one.
    .filter(
      (change) =>
        !fits.some(
          (other) =>
            other.id !== fit.id &&
            other.buildId === fit.buildId &&
            (other.date > fit.date || (other.date === fit.date && other.createdAt.getTime() > fit.createdAt.getTime())) &&
            !changeIsAfter(change.at, other),
        ),
    )
    // Confirmed at the range after the change.
    .filter((change) => !confirmations.some((c) => c.sightInId === fit.id && c.at.getTime() >= change.at.getTime()))
    .sort((a, b) => a.at.getTime() - b.at.getTime() || String(a.id).localeCompare(String(b.id)));
  if (counting.length === 0) return currentStaleness;
  const first = counting[0];
  const more = counting.length > 1 ? ` (and ${counting.length - 1} more ${counting.length === 2 ? 'change' : 'changes'})` : '';
  return {
    state: 'confirm',
    reason: `${label(first)} on ${stalenessDay(first.at)}${more}, after this sight-in: confirm the marks at the range.`,
    since: first.at.toISOString(),
    changeIds: counting.map((change) => change.id),
  };
}

/**
 * The words for the top of a printed sheet, or null when the tape is current.
 * Example: sheetNote({ state: 'confirm', reason: 'Peep moved on 1 Dec 2026, …', … }) → 'CONFIRM AT THE RANGE — Peep moved on 1 Dec 2026, …'
 */
export function sheetNote(staleness: Staleness): string | null {
  return staleness.state === 'confirm' ? `CONFIRM AT THE RANGE — ${staleness.reason}` : null;
}
