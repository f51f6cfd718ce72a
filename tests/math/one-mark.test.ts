import { fitSight, predictMarkMm, tapeSvg, type FitInput } from '@/math';
import { referenceMarkMm } from './reference-flight';
import { TRUE_MODEL } from './helpers';

/**
 * One mark and a chronographed speed, against marks made by an independent
 * integrator (odex; tests/math/reference-flight.ts). The truth: 285 fps,
 * drag coefficient 2.0, peep height 110 mm, sight radius 820 mm, 420 gr,
 * 6.5 mm, sea level; one mark at 20 yd.
 *
 * Measured on this checkout (2026-12-02): the predicted 60 yd mark moves by
 * −0.72 mm with a chronograph 5 fps fast (290) and +0.76 mm 5 fps slow (280);
 * by +0.32 mm with the drag coefficient 20 % high (2.4) and −0.31 mm 20 % low
 * (1.6). The fit's one-sigma band at 60 yd is 1.0–1.1 mm, so it covers each.
 */

const yd = (distance: number) => distance * 0.9144;
const truth = { ...TRUE_MODEL };
const mark20 = referenceMarkMm(truth, yd(20));
const mark60 = referenceMarkMm(truth, yd(60));

const input = (speedFps: number, dragCoefficient: number): FitInput => ({
  distanceUnit: 'yd',
  sight: { radiusMm: 820, peepHeightMm: 110 },
  arrow: { massGr: 420, diameterMm: 6.5, speedFps, dragCoefficient },
  marks: [{ distance: 20, markMm: mark20 }],
  predict: [10, 20, 30, 40, 50, 60, 70, 80, 90, 100],
});
const at60 = (speedFps: number, dragCoefficient: number) =>
  fitSight(input(speedFps, dragCoefficient)).marks.find((mark) => mark.distance === 60)!;

describe('one mark and a chronographed speed', () => {
  it('the reference and our flight agree on the true marks (to 1e-4 mm)', () => {
    expect(Math.abs(mark20 - predictMarkMm(truth, 20))).toBeLessThan(1e-4);
    expect(Math.abs(mark60 - predictMarkMm(truth, 60))).toBeLessThan(1e-4);
  });

  it('with true speed and drag, every predicted mark matches the reference to 0.001 mm (scale zero solved from the mark)', () => {
    const fit = fitSight(input(285, 2));
    expect(fit.method).toBe('one-mark');
    expect(Math.abs(fit.scaleZeroMm - truth.scaleZeroMm)).toBeLessThan(1e-3);
    for (const mark of fit.marks) expect(Math.abs(mark.markMm - referenceMarkMm(truth, yd(mark.distance)))).toBeLessThan(1e-3);
    // Speed, drag, peep height and sight radius are the priors' means: one mark cannot move them.
    expect(fit.speedFps).toBeCloseTo(285, 6);
    expect(fit.dragCoefficient).toBeCloseTo(2, 6);
    expect(fit.peepHeightMm).toBeCloseTo(110, 6);
    expect(fit.sightRadiusMm).toBeCloseTo(820, 6);
  });

  it('a chronograph 5 fps off moves the 60 yd mark by about 0.7 mm, inside the band', () => {
    for (const speed of [280, 290]) {
      const predicted = at60(speed, 2);
      const error = predicted.markMm - mark60;
      console.log(`chronograph ${speed} fps: 60 yd mark off by ${error.toFixed(3)} mm, band ±${predicted.sigmaMm.toFixed(2)} mm`);
      expect(Math.abs(error)).toBeGreaterThan(0.6);
      expect(Math.abs(error)).toBeLessThan(0.85);
      expect(Math.sign(error)).toBe(speed > 285 ? -1 : 1); // faster arrow, smaller mark
      expect(predicted.sigmaMm).toBeGreaterThan(Math.abs(error));
    }
  });

  it('a drag coefficient 20 % off moves the 60 yd mark by about 0.3 mm, inside the band', () => {
    for (const drag of [1.6, 2.4]) {
      const predicted = at60(285, drag);
      const error = predicted.markMm - mark60;
      console.log(`drag coefficient ${drag}: 60 yd mark off by ${error.toFixed(3)} mm, band ±${predicted.sigmaMm.toFixed(2)} mm`);
      expect(Math.abs(error)).toBeGreaterThan(0.25);
      expect(Math.abs(error)).toBeLessThan(0.4);
      expect(predicted.sigmaMm).toBeGreaterThan(Math.abs(error));
    }
  });

  it('says plainly it is an estimate from one mark, with the distance to shoot next, and the tape says so along its edge', () => {
    const fit = fitSight(input(285, 2));
    expect(fit.nextDistance).not.toBeNull();
    expect(fit.nextDistance).not.toBe(20);
    expect(fit.model.oneMark).toEqual({ distance: 20, nextDistance: fit.nextDistance });
    expect(fit.warnings.filter((warning) => warning.code === 'one-mark')).toHaveLength(1);
    expect(fit.warnings[0].message).toContain(`Shoot ${fit.nextDistance} yd next`);
    // The band grows away from the sighted mark.
    const sigma = (distance: number) => fit.marks.find((mark) => mark.distance === distance)!.sigmaMm;
    expect(sigma(20)).toBeLessThan(0.21);
    expect(sigma(40)).toBeLessThan(sigma(60));
    expect(sigma(60)).toBeLessThan(sigma(100));
    const svg = tapeSvg(fit, { from: 20, to: 80 });
    expect(svg).toContain('data-estimate="one-mark"');
    // A two-mark tape carries no such strip.
    const two = fitSight({
      ...input(285, 2),
      marks: [
        { distance: 20, markMm: mark20 },
        { distance: 60, markMm: mark60 },
      ],
    });
    expect(two.model.oneMark).toBeUndefined();
    expect(tapeSvg(two, { from: 20, to: 80 })).not.toContain('data-estimate');
  });

  it('refuses one mark without a speed, naming the field; and a speed that cannot reach the mark', () => {
    const { speedFps: _speed, ...arrow } = input(285, 2).arrow;
    expect(() => fitSight({ ...input(285, 2), arrow })).toThrow(
      'marks: enter at least two marks, or one mark and the chronographed speed (arrow.speedFps)',
    );
    expect(() => fitSight({ ...input(120, 3), marks: [{ distance: 150, markMm: 80 }] })).toThrow(
      /^marks\[0\]\.distance: at 120 fps the arrow cannot reach 150 yd/,
    );
  });
});
