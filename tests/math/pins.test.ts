import { fitSight, pinPositions, predictMarksMm, FitInputError } from '@/math';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';

const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 60])));

describe('fixed multi-pin positions', () => {
  it('give each pin’s mark, its drop below the first pin and the gaps, in mm', () => {
    const { pins } = pinPositions(fit.model, [60, 20, 40, 30, 50]);
    const marks = predictMarksMm(fit.model, [20, 30, 40, 50, 60]);
    expect(pins.map((pin) => pin.distance)).toEqual([20, 30, 40, 50, 60]);
    pins.forEach((pin, i) => {
      expect(pin.markMm).toBeCloseTo(marks[i], 10);
      expect(pin.fromFirstMm).toBeCloseTo(marks[i] - marks[0], 10);
      expect(pin.gapMm === null ? null : pin.gapMm).toEqual(i === 0 ? null : expect.any(Number));
    });
    const gaps = pins.slice(1).map((pin) => pin.gapMm!);
    expect(gaps.reduce((a, b) => a + b, 0)).toBeCloseTo(pins[4].fromFirstMm, 10);
    // Gaps grow with distance (the trajectory curves down).
    gaps.slice(1).forEach((gap, i) => expect(gap).toBeGreaterThan(gaps[i]));
  });

  it('flag pins closer than the sight allows', () => {
    const { pins } = pinPositions(fit.model, [20, 22, 40], 2);
    expect(pins.map((pin) => pin.crowded)).toEqual([false, true, false]);
  });

  it('refuse no distance, a repeated one, or one out of reach', () => {
    expect(() => pinPositions(fit.model, [])).toThrow(FitInputError);
    expect(() => pinPositions(fit.model, [20, 20])).toThrow(/own distance/);
    expect(() => pinPositions({ ...fit.model, speedFps: 125 }, [20, 150])).toThrow(/cannot reach/);
  });
});
