import {
  changeIsAfter,
  fitStaleness,
  impactChangeKinds,
  movesImpact,
  sheetNote,
  type FitFacts,
  type ImpactChange,
} from '@/shared/staleness';
import { bowChangeKinds } from '@/shared/level-status';

const fit = (id: number, date: string, savedAt: string, buildId = 1): FitFacts => ({ id, buildId, date, createdAt: new Date(savedAt) });
const change = (id: number | string, kind: ImpactChange['kind'], at: string, buildId?: number): ImpactChange => ({
  id,
  kind,
  at: new Date(at),
  buildId,
});

describe('the staleness rule (shared/staleness.ts)', () => {
  const first = fit(1, '2026-11-20', '2026-11-20T18:00:00Z');

  test('no changes: current', () => {
    expect(fitStaleness({ fit: first, fits: [first], changes: [], confirmations: [] }).state).toBe('current');
  });

  test('every kind but "other" moves the point of impact; a build edit does too', () => {
    for (const kind of bowChangeKinds) expect(movesImpact(kind)).toBe(kind !== 'other');
    expect(movesImpact('build')).toBe(true);
    expect(impactChangeKinds).not.toContain('other');
  });

  test.each(impactChangeKinds.map((kind) => [kind]))('a %s change after the sight-in asks to confirm, with the reason and date', (kind) => {
    const result = fitStaleness({ fit: first, fits: [first], changes: [change(9, kind, '2026-12-01T10:00:00Z')], confirmations: [] });
    expect(result.state).toBe('confirm');
    expect(result.reason).toMatch(/on 1 Dec 2026, after this sight-in: confirm the marks at the range\.$/);
    expect(result.since).toBe('2026-12-01T10:00:00.000Z');
    expect(result.changeIds).toEqual([9]);
  });

  test('"other" changes are not counted', () => {
    expect(
      fitStaleness({ fit: first, fits: [first], changes: [change(9, 'other', '2026-12-01T10:00:00Z')], confirmations: [] }).state,
    ).toBe('current');
  });

  test('a change before the sight-in does not count; on the same day, the moment it was saved decides', () => {
    expect(changeIsAfter(new Date('2026-11-19T23:00:00Z'), first)).toBe(false);
    expect(changeIsAfter(new Date('2026-11-20T17:59:59Z'), first)).toBe(false);
    expect(changeIsAfter(new Date('2026-11-20T18:00:00Z'), first)).toBe(false); // at the very moment: it was in place
    expect(changeIsAfter(new Date('2026-11-20T18:00:01Z'), first)).toBe(true);
    expect(changeIsAfter(new Date('2026-11-21T00:00:00Z'), first)).toBe(true);
    // A sight-in saved later with an earlier date: a change on the day after that date is after it.
    const late = fit(2, '2026-11-18', '2026-11-25T09:00:00Z');
    expect(changeIsAfter(new Date('2026-11-19T08:00:00Z'), late)).toBe(true);
  });

  test('names the first change and counts the rest', () => {
    const changes = [
      change(3, 'rest', '2026-12-02T09:00:00Z'),
      change(2, 'peep', '2026-11-28T09:00:00Z'),
      change(4, 'string', '2026-12-02T10:00:00Z'),
    ];
    const result = fitStaleness({ fit: first, fits: [first], changes, confirmations: [] });
    expect(result.reason).toBe('Peep moved on 28 Nov 2026 (and 2 more changes), after this sight-in: confirm the marks at the range.');
    expect(result.changeIds).toEqual([2, 3, 4]);
  });

  test('a newer sight-in of the same build clears it; one of another build does not', () => {
    const peep = change(9, 'peep', '2026-12-01T10:00:00Z');
    const newer = fit(2, '2026-12-02', '2026-12-02T12:00:00Z');
    expect(fitStaleness({ fit: first, fits: [first, newer], changes: [peep], confirmations: [] }).state).toBe('current');
    const otherBuild = fit(3, '2026-12-02', '2026-12-02T12:00:00Z', 2);
    expect(fitStaleness({ fit: first, fits: [first, otherBuild], changes: [peep], confirmations: [] }).state).toBe('confirm');
    // The newer sight-in itself is current.
    expect(fitStaleness({ fit: newer, fits: [first, newer], changes: [peep], confirmations: [] }).state).toBe('current');
    // A newer sight-in shot before the change does not clear it.
    const between = fit(4, '2026-11-25', '2026-11-25T12:00:00Z');
    expect(fitStaleness({ fit: first, fits: [first, between], changes: [peep], confirmations: [] }).state).toBe('confirm');
  });

  test('confirming at the range clears the changes up to that moment, not later ones', () => {
    const peep = change(9, 'peep', '2026-12-01T10:00:00Z');
    const confirmed = [{ sightInId: 1, at: new Date('2026-12-01T15:00:00Z') }];
    expect(fitStaleness({ fit: first, fits: [first], changes: [peep], confirmations: confirmed }).state).toBe('current');
    const later = change(10, 'rest', '2026-12-02T10:00:00Z');
    const result = fitStaleness({ fit: first, fits: [first], changes: [peep, later], confirmations: confirmed });
    expect(result.state).toBe('confirm');
    expect(result.changeIds).toEqual([10]);
    // Another sight-in's confirmation does not count for this one.
    expect(
      fitStaleness({ fit: first, fits: [first], changes: [peep], confirmations: [{ sightInId: 2, at: new Date('2026-12-01T15:00:00Z') }] })
        .state,
    ).toBe('confirm');
  });

  test('an arrow build edit counts for that build only', () => {
    const edit = change('build-1', 'build', '2026-12-01T10:00:00Z', 1);
    expect(fitStaleness({ fit: first, fits: [first], changes: [edit], confirmations: [] }).reason).toMatch(
      /^Arrow build edited on 1 Dec 2026/,
    );
    const other = fit(2, '2026-11-20', '2026-11-20T18:00:00Z', 2);
    expect(fitStaleness({ fit: other, fits: [first, other], changes: [edit], confirmations: [] }).state).toBe('current');
  });

  test('the printed sheet note', () => {
    const stale = fitStaleness({ fit: first, fits: [first], changes: [change(9, 'rest', '2026-12-01T10:00:00Z')], confirmations: [] });
    expect(sheetNote(stale)).toBe(
      'CONFIRM AT THE RANGE — Rest changed on 1 Dec 2026, after this sight-in: confirm the marks at the range.',
    );
    expect(sheetNote(fitStaleness({ fit: first, fits: [first], changes: [], confirmations: [] }))).toBeNull();
  });
});
