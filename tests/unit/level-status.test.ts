import {
  levelStatus,
  levelStepKeys,
  type BowChangeFacts,
  type LevelCheckFacts,
  type LevelResult,
  type LevelStepKey,
} from '@/shared/level-status';
import { changedAtFrom } from '@/shared/level';

// The rules under test are our own product decisions (see the header of
// shared/level-status.ts); the order of the steps (set-up, first, second and
// third axis, range) is common practice, no published source.

const day = 24 * 60 * 60 * 1000;
const t0 = new Date('2026-11-01T09:30:00.000Z');
const at = (ms: number) => new Date(t0.getTime() + ms);

function check(
  id: number,
  results: Partial<Record<LevelStepKey, LevelResult | null>> = {},
  startedAt: Date = t0,
  completedAt: Date | null = at(45 * 60 * 1000),
): LevelCheckFacts {
  const all: Record<LevelStepKey, LevelResult | null> = {
    setup: 'pass',
    'first-axis': 'pass',
    'second-axis': 'pass',
    'third-axis': 'pass',
    range: 'pass',
    ...results,
  };
  return { id, startedAt, completedAt, steps: levelStepKeys.map((step) => ({ step, result: all[step] })) };
}

function change(id: number, changedAt: Date, kind: BowChangeFacts['kind'] = 'string'): BowChangeFacts {
  return { id, kind, changedAt };
}

const base = { changes: [] as BowChangeFacts[], now: at(10 * day), maxAgeDays: 90 };

describe('levelStatus: never checked', () => {
  it('is "none" with no checks at all', () => {
    const status = levelStatus({ ...base, checks: [] });
    expect(status.state).toBe('none');
    expect(status.reason).toBe('Never checked.');
    expect(status.lastCheckId).toBeNull();
    expect(status.ageDays).toBeNull();
  });

  it('is "none" while the only check is still open, and lists every change as since', () => {
    const open = check(1, { range: null }, t0, null);
    const status = levelStatus({ ...base, checks: [open], changes: [change(7, at(day)), change(6, at(-day))] });
    expect(status.state).toBe('none');
    expect(status.changesSinceIds).toEqual([6, 7]);
  });
});

describe('levelStatus: verified', () => {
  it('is verified after every step passed, with the age in whole days', () => {
    const status = levelStatus({ ...base, checks: [check(1)] });
    expect(status.state).toBe('verified');
    expect(status.lastCheckId).toBe(1);
    expect(status.ageDays).toBe(10);
    expect(status.rangeConfirmed).toBe(true);
    expect(status.reason).toBe('Verified 10 days ago, on the bench and at the range.');
  });

  it('counts "adjusted" like "pass"', () => {
    const status = levelStatus({
      ...base,
      checks: [check(1, { 'first-axis': 'adjusted', 'second-axis': 'adjusted', 'third-axis': 'adjusted', range: 'adjusted' })],
    });
    expect(status.state).toBe('verified');
  });

  it('still verifies when the range step was skipped, and recommends a range confirmation', () => {
    const status = levelStatus({ ...base, checks: [check(1, { range: 'skipped' })] });
    expect(status.state).toBe('verified');
    expect(status.rangeConfirmed).toBe(false);
    expect(status.reason).toMatch(/^Bench axes verified 10 days ago/);
    expect(status.reason).toMatch(/range confirmation .* is recommended/);
  });

  it('says "today" for a check started less than a day ago', () => {
    const status = levelStatus({ ...base, now: at(23 * 60 * 60 * 1000), checks: [check(1)] });
    expect(status.reason).toBe('Verified today, on the bench and at the range.');
    expect(status.ageDays).toBe(0);
  });

  it('ignores changes logged before the check started', () => {
    const status = levelStatus({ ...base, checks: [check(1)], changes: [change(1, at(-3 * day)), change(2, at(-1))] });
    expect(status.state).toBe('verified');
    expect(status.changesSinceIds).toEqual([]);
  });

  it('treats a change at exactly the start of the check as before it', () => {
    const status = levelStatus({ ...base, checks: [check(1)], changes: [change(1, t0)] });
    expect(status.state).toBe('verified');
  });

  it('rests on the latest completed check, not an open one started later', () => {
    const done = check(1);
    const open = check(2, { 'first-axis': null, 'second-axis': null, 'third-axis': null, range: null }, at(day), null);
    const status = levelStatus({ ...base, checks: [open, done] });
    expect(status.state).toBe('verified');
    expect(status.lastCheckId).toBe(1);
  });
});

describe('levelStatus: due after a change', () => {
  it('is due when a new string was logged 12 days after the check', () => {
    const status = levelStatus({ ...base, now: at(20 * day), checks: [check(1)], changes: [change(5, at(12 * day + 3600_000))] });
    expect(status.state).toBe('due');
    expect(status.reason).toBe('New string 12 days after the last check.');
    expect(status.changesSinceIds).toEqual([5]);
  });

  it('is due for a change logged the same day, one millisecond after the check started', () => {
    const status = levelStatus({ ...base, checks: [check(1)], changes: [change(5, at(1), 'sight-moved')] });
    expect(status.state).toBe('due');
    expect(status.reason).toBe('Sight moved the same day as, and after, the last check.');
  });

  it('is due for a change made while the check was open (after it started, before it was completed)', () => {
    const status = levelStatus({ ...base, checks: [check(1, {}, t0, at(2 * day))], changes: [change(5, at(day), 'rest')] });
    expect(status.state).toBe('due');
    expect(status.reason).toBe('Rest changed 1 day after the last check.');
  });

  it('names the earliest change after the check and counts the others', () => {
    const status = levelStatus({
      ...base,
      checks: [check(1)],
      changes: [change(9, at(5 * day), 'peep'), change(8, at(2 * day), 'cables'), change(7, at(-day), 'arrows'), change(10, at(6 * day))],
    });
    expect(status.reason).toBe('New cables 2 days after the last check (and 2 more changes).');
    expect(status.changesSinceIds).toEqual([8, 9, 10]);
  });

  it('says "1 more change" in the singular', () => {
    const status = levelStatus({ ...base, checks: [check(1)], changes: [change(1, at(2 * day)), change(2, at(3 * day), 'other')] });
    expect(status.reason).toBe('New string 2 days after the last check (and 1 more change).');
  });

  it('is verified again after a new check following the change', () => {
    const first = check(1);
    const second = check(2, {}, at(13 * day), at(13 * day + 3600_000));
    const status = levelStatus({ ...base, now: at(14 * day), checks: [first, second], changes: [change(5, at(12 * day))] });
    expect(status.state).toBe('verified');
    expect(status.lastCheckId).toBe(2);
    expect(status.ageDays).toBe(1);
  });
});

describe('levelStatus: due by age', () => {
  it('is verified one millisecond before the limit', () => {
    const status = levelStatus({ ...base, now: at(90 * day - 1), checks: [check(1)] });
    expect(status.state).toBe('verified');
    expect(status.ageDays).toBe(89);
  });

  it('is due at exactly the limit (age >= limit)', () => {
    const status = levelStatus({ ...base, now: at(90 * day), checks: [check(1)] });
    expect(status.state).toBe('due');
    expect(status.reason).toBe('Last checked 90 days ago; a check is due every 90 days.');
  });

  it('uses the configured limit', () => {
    const status = levelStatus({ ...base, now: at(30 * day), maxAgeDays: 30, checks: [check(1)] });
    expect(status.state).toBe('due');
    expect(status.reason).toBe('Last checked 30 days ago; a check is due every 30 days.');
  });

  it('prefers the change as the reason when both a change and the age apply', () => {
    const status = levelStatus({ ...base, now: at(120 * day), checks: [check(1)], changes: [change(1, at(3 * day))] });
    expect(status.state).toBe('due');
    expect(status.reason).toBe('New string 3 days after the last check.');
  });

  it('refuses a limit below one day', () => {
    expect(() => levelStatus({ ...base, maxAgeDays: 0, checks: [] })).toThrow(RangeError);
  });
});

describe('levelStatus: incomplete checks', () => {
  it('is due, not verified, when the second axis was skipped', () => {
    const status = levelStatus({ ...base, checks: [check(1, { 'second-axis': 'skipped' })] });
    expect(status.state).toBe('due');
    expect(status.reason).toBe('Incomplete — the second axis was skipped on the last check.');
  });

  it('names several skipped steps', () => {
    const status = levelStatus({ ...base, checks: [check(1, { setup: 'skipped', 'third-axis': 'skipped' })] });
    expect(status.reason).toBe('Incomplete — the set-up and third axis were skipped on the last check.');
  });

  it('treats a bench step without a result as skipped', () => {
    const status = levelStatus({ ...base, checks: [check(1, { 'first-axis': null })] });
    expect(status.state).toBe('due');
    expect(status.reason).toMatch(/first axis was skipped/);
  });
});

describe('levelStatus: failed', () => {
  it('is failed when the last check left an axis failing', () => {
    const status = levelStatus({ ...base, checks: [check(1, { 'third-axis': 'fail' })] });
    expect(status.state).toBe('failed');
    expect(status.reason).toBe('The last check left the third axis failing.');
  });

  it('stays failed after a later change, and says a change was logged', () => {
    const status = levelStatus({ ...base, checks: [check(1, { 'first-axis': 'fail' })], changes: [change(3, at(day), 'sight-remounted')] });
    expect(status.state).toBe('failed');
    expect(status.reason).toBe('The last check left the first axis failing. A change was logged since.');
    expect(status.changesSinceIds).toEqual([3]);
  });

  it('counts failing over skipped on the same check', () => {
    const status = levelStatus({ ...base, checks: [check(1, { 'first-axis': 'fail', 'second-axis': 'skipped' })] });
    expect(status.state).toBe('failed');
  });

  it('names several failing axes', () => {
    const status = levelStatus({ ...base, checks: [check(1, { 'first-axis': 'fail', 'second-axis': 'fail' })] });
    expect(status.reason).toBe('The last check left the first axis and second axis failing.');
  });

  it('is failed when the range shots did not land where the tape says', () => {
    const status = levelStatus({ ...base, checks: [check(1, { range: 'fail' })] });
    expect(status.state).toBe('failed');
    expect(status.reason).toMatch(/range confirmation failing/);
  });

  it('is failed when the set-up could not be levelled', () => {
    const status = levelStatus({ ...base, checks: [check(1, { setup: 'fail' })] });
    expect(status.state).toBe('failed');
    expect(status.reason).toMatch(/set-up failing/);
  });

  it('is cleared by a later passing check', () => {
    const failedCheck = check(1, { 'second-axis': 'fail' });
    const fixed = check(2, {}, at(2 * day), at(2 * day + 1000));
    const status = levelStatus({ ...base, checks: [failedCheck, fixed] });
    expect(status.state).toBe('verified');
    expect(status.lastCheckId).toBe(2);
  });

  it('picks the later of two checks completed at the same moment by start, then id', () => {
    const done = at(day);
    const a = check(1, { 'first-axis': 'fail' }, t0, done);
    const b = check(2, {}, at(1000), done);
    expect(levelStatus({ ...base, checks: [b, a] }).lastCheckId).toBe(2);
    const c = check(3, { 'first-axis': 'fail' }, at(1000), done);
    expect(levelStatus({ ...base, checks: [b, c] }).lastCheckId).toBe(3);
  });
});

describe('changedAtFrom: a change entered as a date and an optional time', () => {
  // Local time throughout (the form's date and time are the archer's own clock).
  const now = new Date(2026, 10, 20, 15, 30, 0, 0);

  it('uses the time of day when one is given', () => {
    expect(changedAtFrom('2026-11-18', '07:45', now).getTime()).toBe(new Date(2026, 10, 18, 7, 45).getTime());
  });

  it('means "now" for today without a time', () => {
    expect(changedAtFrom('2026-11-20', '', now).getTime()).toBe(now.getTime());
  });

  it('means the end of the day for an earlier date without a time, so it counts as after a check that day', () => {
    const changedAt = changedAtFrom('2026-11-12', '', now);
    expect(changedAt.getTime()).toBe(new Date(2026, 10, 12, 23, 59, 59, 999).getTime());
    const checkThatMorning = check(1, {}, new Date(2026, 10, 12, 9, 0), new Date(2026, 10, 12, 10, 0));
    const status = levelStatus({ checks: [checkThatMorning], changes: [change(1, changedAt)], now, maxAgeDays: 90 });
    expect(status.state).toBe('due');
  });
});
