import { fitSight, FitInputError, isFitInputError } from '@/math';
import { describeFitIssue, fitInputSchema, type FitInput } from '@/shared/fit';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';

const good = inputWith(marksOf(TRUE_MODEL, [20, 60]));

function refusal(input: unknown): FitInputError {
  try {
    fitSight(input as FitInput);
  } catch (error) {
    expect(isFitInputError(error)).toBe(true);
    return error as FitInputError;
  }
  throw new Error('expected the input to be refused');
}

describe('bad input is refused with a message naming the field', () => {
  it('one mark, or none', () => {
    // One mark needs a chronographed speed (none in `good`).
    expect(refusal({ ...good, marks: [good.marks[0]] }).message).toBe(
      'marks: enter at least two marks, or one mark and the chronographed speed (arrow.speedFps)',
    );
    expect(refusal({ ...good, marks: [] }).field).toBe('marks');
    const { marks: _marks, ...withoutMarks } = good;
    expect(refusal(withoutMarks).message).toBe('marks: enter at least two marks');
  });

  it('duplicate distances', () => {
    const error = refusal({ ...good, marks: [good.marks[0], { distance: 20, markMm: 15.1 }] });
    expect(error.field).toBe('marks[1].distance');
    expect(error.message).toBe('marks[1].distance: each distance may appear only once');
  });

  it.each([
    [{ sight: { radiusMm: -820, peepHeightMm: 110 } }, 'sight.radiusMm', /sight radius between 300 and 1200 mm/],
    [{ sight: { radiusMm: 820, peepHeightMm: 5000 } }, 'sight.peepHeightMm', /peep height/],
    [{ arrow: { massGr: -420, diameterMm: 6.5 } }, 'arrow.massGr', /arrow mass/],
    [{ arrow: { massGr: 420, diameterMm: 65 } }, 'arrow.diameterMm', /shaft diameter/],
    [{ arrow: { massGr: 420, diameterMm: 6.5, speedFps: 2850 } }, 'arrow.speedFps', /chronographed speed between 120 and 500 fps/],
    [{ arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 0 } }, 'arrow.dragCoefficient', /drag coefficient/],
    [{ air: { altitudeM: 40000 } }, 'air.altitudeM', /altitude/],
    [{ air: { temperatureC: 90 } }, 'air.temperatureC', /temperature/],
    [
      {
        marks: [
          { distance: -20, markMm: 14.9 },
          { distance: 60, markMm: 32.6 },
        ],
      },
      'marks[0].distance',
      /distance between 5 and 150/,
    ],
    [
      {
        marks: [
          { distance: 20, markMm: 14.9 },
          { distance: 6000, markMm: 32.6 },
        ],
      },
      'marks[1].distance',
      /distance between 5 and 150/,
    ],
    [
      {
        marks: [
          { distance: 20, markMm: 'x' },
          { distance: 60, markMm: 32.6 },
        ],
      },
      'marks[0].markMm',
      /scale reading as a number/,
    ],
    [
      {
        marks: [
          { distance: 20, markMm: 14.9 },
          { distance: 60, markMm: Number.NaN },
        ],
      },
      'marks[1].markMm',
      /scale reading/,
    ],
    [{ distanceUnit: 'ft' }, 'distanceUnit', /yards|yd/],
    [{ shots: [{ distance: 40, angleDeg: 75 }] }, 'shots[0].angleDeg', /angle between -60 and 60/],
    [{ predict: [10, 400] }, 'predict[1]', /distance between 5 and 150/],
  ])('absurd values: %j → %s', (override, field, message) => {
    const error = refusal({ ...good, ...override });
    expect(error.field).toBe(field);
    expect(error.detail).toMatch(message);
    expect(error.message.startsWith(`${field}: `)).toBe(true);
  });

  it('an unknown field, named', () => {
    const error = refusal({ ...good, sight: { radiusMm: 820, peepHeightMm: 110, peepHeight: 110 } });
    expect(error.field).toBe('sight.peepHeight');
  });

  it('a gap no arrow speed gives', () => {
    const error = refusal({
      ...good,
      marks: [
        { distance: 20, markMm: 14.9 },
        { distance: 60, markMm: 15.3 },
      ],
    });
    expect(error.field).toBe('marks');
    expect(error.message).toMatch(/^marks: the 60 yd mark is only 0\.4 mm below the 20 yd mark; no arrow speed gives so small a gap/);
    expect(error.message).toMatch(/500 fps/);
  });

  it('marks in the wrong order for the scale direction', () => {
    const error = refusal({
      ...good,
      marks: [
        { distance: 20, markMm: 32.6 },
        { distance: 60, markMm: 14.9 },
      ],
    });
    expect(error.field).toBe('marks');
    expect(error.message).toMatch(/60 yd mark \(14\.9 mm\) reads less than the 20 yd mark \(32\.6 mm\).*direction of your sight's scale/);
  });

  it('a gap so large only a very slow arrow gives it', () => {
    const error = refusal({
      ...good,
      marks: [
        { distance: 20, markMm: 10 },
        { distance: 60, markMm: 150 },
      ],
    });
    expect(error.message).toMatch(/so large a gap needs an arrow slower than 120 fps/);
  });

  it('a negative gap where physics allows one (10 and 15 yd) is accepted', () => {
    const marks = marksOf(TRUE_MODEL, [10, 15]);
    expect(marks[1].markMm).toBeLessThan(marks[0].markMm);
    expect(fitSight(inputWith(marks)).speedFps).toBeCloseTo(285, 3);
  });

  it('the schema alone gives the same one-line messages', () => {
    const result = fitInputSchema.safeParse({ ...good, marks: [good.marks[0], { ...good.marks[0] }] });
    expect(result.success).toBe(false);
    if (!result.success) expect(describeFitIssue(result.error.issues[0])).toBe('marks[1].distance: each distance may appear only once');
    const notObject = fitInputSchema.safeParse('marks');
    if (!notObject.success) expect(describeFitIssue(notObject.error.issues[0])).toBe('input: send one JSON object');
  });
});
