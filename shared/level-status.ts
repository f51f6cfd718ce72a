/**
 * A bow's level state, from its completed level checks and its change log.
 * Pure and dependency-free: the server computes it for every response, and the
 * rules below are the whole of it (tests/unit/level-status.test.ts).
 *
 * The rules, in order (the first that applies wins):
 *
 * 1. **none** — no completed check: "Never checked". An open (unfinished)
 *    check does not count until it is completed.
 * 2. **failed** — the last completed check left the set-up, an axis or the
 *    range step at "fail". It stays failed whatever was logged after it (a
 *    failing bow is not made any better by a new string); changes since are
 *    still listed.
 * 3. **due, incomplete** — the last completed check skipped the set-up or an
 *    axis (or left it without a result): "Incomplete — the second axis was
 *    skipped". Without the set-up (bow level in the vise, string plumb) the
 *    axis readings have no reference, so a skipped set-up counts too.
 * 4. **due, changed** — a change was logged after the last check. Full
 *    timestamps are compared, against the moment the check was *started*: a
 *    change logged later the same day makes the bow due, and so does one made
 *    while a check was open (its earlier steps did not see it). A change at
 *    exactly the start time counts as before (it was in place when the
 *    set-up was read).
 * 5. **due, age** — the check is `maxAgeDays` old or older (due when
 *    age >= limit, measured in full days of 24 h from the check's start; a
 *    check exactly 90 × 24 h old is due).
 * 6. **verified** — every bench step passed or was adjusted. The range step
 *    may be skipped: the bench axes are verified, and the reason says that a
 *    range confirmation (a long shot and a steep shot) is recommended — common
 *    practice, no published source.
 *
 * Example:
 *   levelStatus({ checks: [], changes: [], now: new Date(), maxAgeDays: 90 })
 *   → { state: 'none', reason: 'Never checked.', lastCheckId: null, … }
 */

/** The steps of a level check, in the order they are worked through. */
export const levelStepKeys = ['setup', 'first-axis', 'second-axis', 'third-axis', 'range'] as const;
export type LevelStepKey = (typeof levelStepKeys)[number];

/** Steps that must pass (or be adjusted) for a bow to be verified; the range step is recommended only. */
export const benchStepKeys: readonly LevelStepKey[] = ['setup', 'first-axis', 'second-axis', 'third-axis'];

/** Short names of the steps, as used in sentences ("the second axis was skipped"). */
export const levelStepNames: Record<LevelStepKey, string> = {
  setup: 'set-up',
  'first-axis': 'first axis',
  'second-axis': 'second axis',
  'third-axis': 'third axis',
  range: 'range confirmation',
};

/** A step's outcome; null while it has not been worked yet. */
export const levelResults = ['pass', 'adjusted', 'fail', 'skipped'] as const;
export type LevelResult = (typeof levelResults)[number];

/** What can be logged as changed on a bow. */
export const bowChangeKinds = [
  'string',
  'cables',
  'sight-moved',
  'sight-remounted',
  'rest',
  'peep',
  'arrows',
  'other',
  // Tuning changes (migration 0050): a set-up entry or a paper-tune adjustment logs one of these.
  'nock-height',
  'd-loop',
  'cams',
  'sight-radius',
] as const;
export type BowChangeKind = (typeof bowChangeKinds)[number];

/** Labels of the change kinds, as a sentence subject ("New string 12 days after the last check"). */
export const bowChangeLabels: Record<BowChangeKind, string> = {
  string: 'New string',
  cables: 'New cables',
  'sight-moved': 'Sight moved',
  'sight-remounted': 'Sight re-mounted',
  rest: 'Rest changed',
  peep: 'Peep moved',
  arrows: 'Arrows changed',
  other: 'Other change',
  'nock-height': 'Nock height changed',
  'd-loop': 'D-loop changed',
  cams: 'Cams adjusted',
  'sight-radius': 'Sight radius changed',
};

/** The states a bow's level can be in (the same four the readiness badge draws). */
export const levelStates = ['verified', 'due', 'failed', 'none'] as const;
export type LevelState = (typeof levelStates)[number];

/** Default age, in days, after which a verified bow is due again. */
export const defaultLevelMaxAgeDays = 90;

/** The fields of a check the rule reads. Only completed checks (completedAt set) count. */
export interface LevelCheckFacts {
  id: number;
  startedAt: Date;
  completedAt: Date | null;
  steps: readonly { step: LevelStepKey; result: LevelResult | null }[];
}

/** The fields of a logged change the rule reads. */
export interface BowChangeFacts {
  id: number;
  kind: BowChangeKind;
  changedAt: Date;
}

export interface LevelStatusInput {
  checks: readonly LevelCheckFacts[];
  changes: readonly BowChangeFacts[];
  now: Date;
  /** Age limit in days (>= 1). */
  maxAgeDays: number;
}

export interface LevelStatus {
  state: LevelState;
  /** One plain sentence saying why. */
  reason: string;
  /** The completed check the state rests on (null when never checked). */
  lastCheckId: number | null;
  /** Ids of the changes logged after that check, oldest first (all changes when never checked). */
  changesSinceIds: number[];
  /** Whole days since the last check started (null when never checked). */
  ageDays: number | null;
  /** True when the last check also confirmed the marks at the range. */
  rangeConfirmed: boolean;
}

const dayMs = 24 * 60 * 60 * 1000;

function daysPhrase(days: number): string {
  return days === 1 ? '1 day' : `${days} days`;
}

function joinNames(names: string[]): string {
  if (names.length <= 1) return names.join('');
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** The last completed check: latest completion, then latest start, then highest id. */
function lastCompleted(checks: readonly LevelCheckFacts[]): LevelCheckFacts | null {
  let best: LevelCheckFacts | null = null;
  for (const check of checks) {
    if (!check.completedAt) continue;
    if (
      !best ||
      check.completedAt.getTime() > best.completedAt!.getTime() ||
      (check.completedAt.getTime() === best.completedAt!.getTime() &&
        (check.startedAt.getTime() > best.startedAt.getTime() ||
          (check.startedAt.getTime() === best.startedAt.getTime() && check.id > best.id)))
    ) {
      best = check;
    }
  }
  return best;
}

function resultOf(check: LevelCheckFacts, step: LevelStepKey): LevelResult | null {
  return check.steps.find((s) => s.step === step)?.result ?? null;
}

/**
 * A bow's level state and the reason, by the rules in this file's header.
 * Example: a check with every bench step passing, started 10 days ago, no
 * changes since, limit 90 → { state: 'verified', reason: 'Verified 10 days ago; …' }
 */
export function levelStatus({ checks, changes, now, maxAgeDays }: LevelStatusInput): LevelStatus {
  if (!Number.isFinite(maxAgeDays) || maxAgeDays < 1) throw new RangeError('maxAgeDays must be at least 1');
  const byTime = [...changes].sort((a, b) => a.changedAt.getTime() - b.changedAt.getTime() || a.id - b.id);
  const last = lastCompleted(checks);

  if (!last) {
    return {
      state: 'none',
      reason: 'Never checked.',
      lastCheckId: null,
      changesSinceIds: byTime.map((c) => c.id),
      ageDays: null,
      rangeConfirmed: false,
    };
  }

  const startMs = last.startedAt.getTime();
  const since = byTime.filter((c) => c.changedAt.getTime() > startMs);
  const ageDays = Math.max(0, Math.floor((now.getTime() - startMs) / dayMs));
  const rangeResult = resultOf(last, 'range');
  const base = {
    lastCheckId: last.id,
    changesSinceIds: since.map((c) => c.id),
    ageDays,
    rangeConfirmed: rangeResult === 'pass' || rangeResult === 'adjusted',
  };

  const failing = levelStepKeys.filter((step) => resultOf(last, step) === 'fail');
  if (failing.length > 0) {
    const names = failing.map((step) => levelStepNames[step]);
    const what =
      failing.length === 1 && failing[0] === 'range'
        ? 'the range confirmation failing (the shots did not land where the tape says)'
        : failing.length === 1 && failing[0] === 'setup'
          ? 'the set-up failing (the bow or string could not be levelled)'
          : `the ${joinNames(names)} failing`;
    const after = since.length > 0 ? ` ${since.length === 1 ? 'A change was' : `${since.length} changes were`} logged since.` : '';
    return { ...base, state: 'failed', reason: `The last check left ${what}.${after}` };
  }

  const missing = benchStepKeys.filter((step) => {
    const result = resultOf(last, step);
    return result === null || result === 'skipped';
  });
  if (missing.length > 0) {
    const names = joinNames(missing.map((step) => levelStepNames[step]));
    return {
      ...base,
      state: 'due',
      reason: `Incomplete — the ${names} ${missing.length === 1 ? 'was' : 'were'} skipped on the last check.`,
    };
  }

  if (since.length > 0) {
    const first = since[0];
    const days = Math.floor((first.changedAt.getTime() - startMs) / dayMs);
    const when = days === 0 ? 'the same day as, and after, the last check' : `${daysPhrase(days)} after the last check`;
    const more = since.length > 1 ? ` (and ${since.length - 1} more ${since.length === 2 ? 'change' : 'changes'})` : '';
    return { ...base, state: 'due', reason: `${bowChangeLabels[first.kind]} ${when}${more}.` };
  }

  if (ageDays >= maxAgeDays) {
    return {
      ...base,
      state: 'due',
      reason: `Last checked ${daysPhrase(ageDays)} ago; a check is due every ${daysPhrase(maxAgeDays)}.`,
    };
  }

  const when = ageDays === 0 ? 'today' : `${daysPhrase(ageDays)} ago`;
  const reason = base.rangeConfirmed
    ? `Verified ${when}, on the bench and at the range.`
    : rangeResult === 'skipped' || rangeResult === null
      ? `Bench axes verified ${when}; the range step was skipped — a range confirmation (a long shot and a steep shot) is recommended.`
      : `Verified ${when}.`;
  return { ...base, state: 'verified', reason };
}
