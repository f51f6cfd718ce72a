/**
 * The live checks of the marks table (shared/mark-checks.ts): each problem
 * named by its mark, the falling reading past the short-range turning point,
 * and which rows the fit may use.
 */
import { checkMarks, turningPointDistance, type MarkCheckContext, type MarkRowInput } from '@/shared/mark-checks';

const yd: MarkCheckContext = { unit: 'yd', scaleDirection: 'down', peepHeightMm: 110 };
const row = (distance: string, scaleMm: string): MarkRowInput => ({ distance, scaleMm, arrowsShot: '', note: '' });

describe('turningPointDistance', () => {
  it('is √(2·h·v²/g): 110 mm peep, 350 fps → 17.5 yd (16.0 m)', () => {
    // Hand arithmetic: v = 350 × 0.3048 = 106.68 m/s; 2 × 0.110 × 106.68² / 9.80665 = 255.3 m²; √ = 15.98 m = 17.47 yd.
    expect(Math.abs(turningPointDistance(110, 350, 'yd') - 17.47)).toBeLessThan(0.01);
    expect(Math.abs(turningPointDistance(110, 350, 'm') - 15.98)).toBeLessThan(0.01);
    // Slower arrow, nearer turning point: it scales with v.
    expect(Math.abs(turningPointDistance(110, 175, 'yd') - 17.47 / 2)).toBeLessThan(0.01);
  });
});

describe('checkMarks', () => {
  it('names the falling reading of 20/30/40 yd at 15/19/17 mm on its row, and leaves it out of the fit', () => {
    const result = checkMarks([row('20', '15.0'), row('30', '19.0'), row('40', '17.0')], yd);
    expect(result.problems).toHaveLength(1);
    const [problem] = result.problems;
    expect(problem).toMatchObject({ row: 2, mark: 3, kind: 'falling', field: 'scaleMm' });
    expect(problem.message).toMatch(/^Mark 3 \(40 yd\): 17 mm is less than the 30 yd mark’s 19 mm/);
    expect(result.usable.map((mark) => mark.row)).toEqual([0, 1]);
    expect(result.falling.map((mark) => mark.row)).toEqual([2]);
  });

  it('lets a reading dip inside the turning point (10 yd reads more than 20 yd) and ignores reading noise', () => {
    expect(checkMarks([row('10', '16.2'), row('20', '15.0'), row('40', '24.0')], yd).problems).toEqual([]);
    // 0.1 mm lower at 25 than at 20 yd is within the reading's precision (0.2 mm).
    expect(checkMarks([row('20', '15.0'), row('25', '14.9'), row('60', '33')], yd).problems).toEqual([]);
  });

  it('reverses the rule for a scale that grows upward', () => {
    const up: MarkCheckContext = { ...yd, scaleDirection: 'up' };
    expect(checkMarks([row('20', '40'), row('40', '30'), row('60', '20')], up).problems).toEqual([]);
    const result = checkMarks([row('20', '40'), row('40', '30'), row('60', '35')], up);
    expect(result.problems.map((problem) => [problem.mark, problem.kind])).toEqual([[3, 'falling']]);
    expect(result.problems[0].message).toMatch(/35 mm is more than the 40 yd mark’s 30 mm/);
  });

  it('names a letter in a reading, an empty or negative distance and a duplicate, each on its own mark', () => {
    const result = checkMarks([row('20', '1g.0'), row('', '20'), row('-20', '21'), row('40', '23'), row('40', '23.4'), row('60', '')], yd);
    expect(result.problems.map((problem) => problem.message)).toEqual([
      'Mark 1: “1g.0” is not a number; enter the reading in mm',
      'Mark 2: enter the distance',
      'Mark 3: enter a distance between 5 and 150 yd (not -20)',
      'Mark 5: 40 yd is entered twice (also mark 4); each distance once',
      'Mark 6: enter the reading',
    ]);
    expect(result.usable.map((mark) => mark.row)).toEqual([3]);
  });

  it('skips blank rows, accepts a decimal comma and refuses a reading over 200 mm', () => {
    const result = checkMarks([row('', ''), row('20', '14,9'), undefined, row('60', '250')], { ...yd, unit: 'm' });
    expect(result.usable).toEqual([{ row: 1, distance: 20, scaleMm: 14.9 }]);
    expect(result.problems.map((problem) => problem.message)).toEqual(['Mark 4: enter a reading between 0 and 200 mm (not 250)']);
  });

  it('uses the chronographed speed when known: a slow arrow turns nearer, so a fall at 15 yd is named', () => {
    // 200 fps → D* ≈ 10 yd (17.47 × 200/350): 12 and 15 yd are beyond it. At 350 fps both are inside.
    const rows = [row('12', '10.0'), row('15', '9.0'), row('40', '25')];
    expect(checkMarks(rows, yd).problems).toEqual([]);
    expect(checkMarks(rows, { ...yd, speedFps: 200 }).problems.map((problem) => problem.mark)).toEqual([2]);
  });
});
