import { arrowSetStats, buildWeightCheck, defaultToleranceGr } from '@/shared/arrow-set-stats';

const set = (...weights: number[]) => weights.map((weightGr, index) => ({ number: index + 1, weightGr }));

describe('arrow-set statistics (shared/arrow-set-stats.ts)', () => {
  test('default tolerance is ±2 gr (common practice, no published source; from memory)', () => {
    expect(defaultToleranceGr).toBe(2);
  });

  test('empty and single sets', () => {
    expect(arrowSetStats([])).toEqual({ count: 0, medianGr: null, spreadGr: null, sdGr: null, flags: [] });
    const one = arrowSetStats(set(420.5));
    expect(one.medianGr).toBeCloseTo(420.5, 9);
    expect(one.spreadGr).toBeCloseTo(0, 9);
    expect(one.sdGr).toBeNull();
    expect(one.flags).toEqual([]);
  });

  test('median of an even count is the mean of the middle two; spread is heaviest minus lightest', () => {
    // Worked by hand: sorted 418, 419, 420, 421, 422, 427 → median (420 + 421) / 2 = 420.5; spread 427 − 418 = 9.
    const stats = arrowSetStats(set(421, 418, 427, 420, 422, 419));
    expect(stats.count).toBe(6);
    expect(stats.medianGr).toBeCloseTo(420.5, 9);
    expect(stats.spreadGr).toBeCloseTo(9, 9);
    // Sample SD by hand: mean 421.1667; squared deviations sum 50.8333; /5 = 10.1667; √ = 3.1885.
    expect(stats.sdGr).toBeCloseTo(3.1885, 3);
    // ±2 gr around 420.5: 427 is 6.5 heavy, 418 is 2.5 light; 419 (1.5 light) and 422 (1.5 heavy) are in.
    expect(stats.flags).toEqual([
      { number: 2, side: 'light', offGr: expect.closeTo(-2.5, 9) },
      { number: 3, side: 'heavy', offGr: expect.closeTo(6.5, 9) },
    ]);
  });

  test('flags at the edges of the tolerance: exactly at ±tolerance is in, just beyond is out', () => {
    // Median 420 (odd count). 422 and 418 are exactly 2 gr off: in.
    expect(arrowSetStats(set(418, 420, 420, 420, 422), 2).flags).toEqual([]);
    // 0.1 + 0.2 style noise must not flag an arrow at the edge.
    expect(arrowSetStats(set(420, 420, 420.3 + 1.7), 2).flags).toEqual([]);
    const beyond = arrowSetStats(set(417.99, 420, 420, 420, 422.01), 2).flags;
    expect(beyond.map((f) => [f.number, f.side])).toEqual([
      [1, 'light'],
      [5, 'heavy'],
    ]);
    // A tolerance of 0 flags anything off the median.
    expect(arrowSetStats(set(420, 420, 420.5), 0).flags.map((f) => f.number)).toEqual([3]);
  });

  test('a negative tolerance is refused', () => {
    expect(() => arrowSetStats(set(420), -1)).toThrow(RangeError);
  });

  test('the set against the build’s computed total grains', () => {
    expect(buildWeightCheck(421, 415, 2)).toEqual({ differenceGr: 6, outside: true });
    expect(buildWeightCheck(417, 415, 2)?.outside).toBe(false);
    expect(buildWeightCheck(null, 415)).toBeNull();
  });
});
