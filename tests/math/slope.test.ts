import { fitSight, predictMarkMm, slopeShot, levelRangeForMark, distanceToMetres, SLOPE_CAUTION } from '@/math';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';

const fit = fitSight(
  inputWith(marksOf(TRUE_MODEL, [20, 40, 60]), {
    shots: [
      { distance: 40, angleDeg: -30 },
      { distance: 40, angleDeg: 30 },
      { distance: 8, angleDeg: 20 },
    ],
  }),
);

describe('slope shots', () => {
  it('give the slope mark, the level distance with the same mark, and the rifleman’s-rule distance', () => {
    for (const shot of fit.shots) {
      expect(shot.markMm).toBeCloseTo(predictMarkMm(fit.model, shot.distance, shot.angleDeg), 9);
      expect(shot.horizontal).toBeCloseTo(shot.distance * Math.cos((shot.angleDeg * Math.PI) / 180), 12);
      if (shot.aimAsIf !== null) {
        expect(Math.abs(predictMarkMm(fit.model, shot.aimAsIf) - shot.markMm)).toBeLessThan(1e-4);
        expect(shot.aimAsIfMinusHorizontal).toBeCloseTo(shot.aimAsIf - shot.horizontal, 12);
      }
    }
    const [down, up] = fit.shots;
    // Either way a slope shot needs less than the level mark at its slant distance.
    expect(down.markMm).toBeLessThan(predictMarkMm(fit.model, 40));
    expect(up.markMm).toBeLessThan(predictMarkMm(fit.model, 40));
    // Gravity along the line of sight: uphill needs more than downhill at the same angle.
    expect(up.markMm).toBeGreaterThan(down.markMm);
    expect(up.aimAsIf!).toBeGreaterThan(down.aimAsIf!);
    expect(fit.warnings.find((warning) => warning.code === 'slope-estimate')?.message).toBe(SLOPE_CAUTION);
  });

  it('find the level distance on the short side of the turning point for a short shot', () => {
    const short = fit.shots[2];
    expect(short.aimAsIf).not.toBeNull();
    expect(short.aimAsIf!).toBeLessThan(14);
    const rangeM = levelRangeForMark(fit.model, predictMarkMm(fit.model, 30), distanceToMetres(30, 'yd'));
    expect(rangeM! / 0.9144).toBeCloseTo(30, 4);
  });

  it('return no level distance when none has the mark, and NaN when out of reach', () => {
    // A steep downhill shot at 10 yd needs less than any level mark.
    const steep = slopeShot(fit.model, 12, -60);
    expect(steep.aimAsIf === null || steep.aimAsIf > 0).toBe(true);
    const far = slopeShot({ ...fit.model, speedFps: 125 }, 150, 40);
    expect(Number.isNaN(far.markMm)).toBe(true);
    expect(far.aimAsIf).toBeNull();
  });
});
