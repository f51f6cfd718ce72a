import { paperTuneRules, suggestNext, tearDirections, tearValues, tearVector, type Hand, type Tear } from '@/shared/paper-tune-rules';
import { camSystems, restKinds } from '@/shared/setup-measures';

// The rules are trade practice with no published source (written from memory);
// these tests pin down the table's behaviour for every case the set-up can name.
const hands: Hand[] = ['right', 'left'];
const ids = (
  tear: Tear,
  hand: Hand,
  rest: (typeof restKinds)[number] | null,
  cam: (typeof camSystems)[number] | null,
  lengthMm: number | null = 20,
) => suggestNext({ tear, lengthMm, hand, rest, cam }).lines.map((line) => line.ruleId);

describe('paper-tune diagnosis table (shared/paper-tune-rules.ts)', () => {
  test('every rule names its source', () => {
    for (const rule of paperTuneRules) expect(rule.source).toMatch(/Trade practice, no published source/);
  });

  test('the eight directions go round clockwise from up', () => {
    expect(tearDirections).toHaveLength(8);
    expect(tearVector('up').y).toBeCloseTo(1, 9);
    expect(tearVector('right').x).toBeCloseTo(1, 9);
    expect(tearVector('down').y).toBeCloseTo(-1, 9);
    expect(tearVector('left').x).toBeCloseTo(-1, 9);
    expect(tearVector('up-right').x).toBeCloseTo(Math.SQRT1_2, 9);
    expect(tearVector('clean')).toEqual({ x: 0, y: 0 });
  });

  // Every tear × hand × rest kind × cam system.
  const cases: [Tear, Hand, (typeof restKinds)[number], (typeof camSystems)[number]][] = [];
  for (const tear of tearValues)
    for (const hand of hands) for (const rest of restKinds) for (const cam of camSystems) cases.push([tear, hand, rest, cam]);

  test.each(cases)('%s tear, %s hand, %s rest, %s cams', (tear, hand, rest, cam) => {
    const suggestion = suggestNext({ tear, lengthMm: 20, hand, rest, cam });
    const lines = suggestion.lines.map((line) => line.ruleId);
    expect(suggestion.lines.length).toBeGreaterThan(0);
    if (tear === 'clean') {
      expect(lines).toEqual(['clean']);
      expect(suggestion.headline).toBe('Clean hole: the run can end here');
      return;
    }
    const up = tear.startsWith('up');
    const down = tear.startsWith('down');
    const side = tear.endsWith('left') ? 'left' : tear.endsWith('right') ? 'right' : null;
    // Vertical part first; the nock moves away from the tail, the rest toward it.
    if (up) {
      expect(lines).toContain('tail-high');
      expect(suggestion.headline).toMatch(/move the nock point down, or the rest up$/);
    }
    if (down) {
      expect(lines).toContain('tail-low');
      expect(suggestion.headline).toMatch(/move the nock point up, or the rest down$/);
    }
    expect(lines.includes('vertical-first')).toBe((up || down) && side !== null);
    // Cam timing is checked first on two-cam systems for a vertical tear.
    expect(lines.includes('cam-timing-first')).toBe((up || down) && cam !== 'single');
    // A pure side tear moves the rest toward the tail, worded toward / away from the riser by hand.
    if (!up && !down) {
      const towardRiser = (side === 'right') === (hand === 'right');
      expect(suggestion.headline).toContain(`move the rest ${side}, ${towardRiser ? 'toward the riser' : 'away from the riser'}`);
      expect(lines).toContain('side-rest');
      expect(lines.includes('side-yoke')).toBe(cam !== 'dual');
      expect(lines.includes('side-no-yoke')).toBe(cam === 'dual');
    } else {
      expect(lines).not.toContain('side-rest');
    }
    // Worded for the rest.
    expect(lines.includes('drop-away-high')).toBe(up && rest === 'drop-away');
    expect(lines.includes('blade-high')).toBe(up && rest === 'blade');
    expect(lines.includes('containment')).toBe(rest === 'containment');
    expect(lines).toContain('step-size');
    expect(lines).not.toContain('unknown-setup');
  });

  test('mirrored for a left-handed bow', () => {
    const right = suggestNext({ tear: 'left', lengthMm: 20, hand: 'right', rest: 'blade', cam: 'single' });
    const left = suggestNext({ tear: 'left', lengthMm: 20, hand: 'left', rest: 'blade', cam: 'single' });
    expect(right.lines[0].words).toBe('Move the rest left, away from the riser (more centre shot).');
    expect(left.lines[0].words).toBe('Move the rest left, toward the riser (less centre shot).');
  });

  test('step size follows the tear length (12 mm ≈ 1/2 in is small; from memory)', () => {
    const words = (lengthMm: number) =>
      suggestNext({ tear: 'up', lengthMm, hand: 'right', rest: 'blade', cam: 'single' }).lines.find((l) => l.ruleId === 'step-size')!.words;
    expect(words(12)).toMatch(/1\/32 in/);
    expect(words(12.1)).toMatch(/1\/16 in/);
  });

  test('without a rest kind or cam system the advice asks for them', () => {
    expect(ids('up', 'right', null, 'hybrid')).toContain('unknown-setup');
    expect(ids('right', 'left', 'blade', null)).toContain('unknown-setup');
    expect(ids('clean', 'left', null, null)).toEqual(['clean']);
  });
});
