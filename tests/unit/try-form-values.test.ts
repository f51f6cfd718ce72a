/**
 * The try page's form text → the fit input: each field reads the unit it
 * shows, or a unit typed after the number. Factors: 1 ft = 0.3048 m, 1 gr =
 * 64.79891 mg, 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
 */
import { trySheetInput, tryFitInput, tryFormDefaults, type TryFormText } from '@/components/try/try-form-values';

const text: TryFormText = {
  ...tryFormDefaults,
  lengthUnit: 'in',
  sightRadius: '33',
  peepHeight: '4.25',
  nearReading: '12.4',
  farReading: '41.0',
  arrowGr: '420',
  diameter: '0.256',
  speedFps: '285',
};

describe('try page form values', () => {
  it('reads lengths in the chosen unit, weight in grains and speed in fps as shown', () => {
    const input = tryFitInput(text);
    expect(input.sight.radiusMm).toBeCloseTo(33 * 25.4, 9);
    expect(input.sight.peepHeightMm).toBeCloseTo(4.25 * 25.4, 9);
    expect(input.arrow).toEqual({ massGr: 420, diameterMm: expect.closeTo(0.256 * 25.4, 9), speedFps: 285 });
  });

  it('honours a unit typed after the number: grams, metres per second, a tape width in inches', () => {
    const input = trySheetInput({ ...text, arrowGr: '27.2 g', speedFps: '85 m/s', tapeWidthMm: '0.5 in' });
    expect(input.arrow.massGr).toBeCloseTo(27.2 / 0.06479891, 6);
    expect(input.arrow.speedFps).toBeCloseTo(85 / 0.3048, 6);
    expect(input.tape?.widthMm).toBeCloseTo(12.7, 9);
  });

  it('leaves an unknown unit unreadable (NaN), so the schema says the field must be a number', () => {
    expect(Number.isNaN(tryFitInput({ ...text, speedFps: '85 mph' }).arrow.speedFps)).toBe(true);
  });
});
