import { fitSight, attemptSightFit, markBand, FIT_PRIORS, MODEL_PARAMETERS, predictMarksMm, type FitResult } from '@/math';
import { TRUE_MODEL, inputWith, marksOf, seededRandom } from './helpers';

const everyYard = Array.from({ length: 91 }, (_, i) => 10 + i);
const predictedAgainst = (fit: FitResult, truth: typeof TRUE_MODEL) => {
  const expected = predictMarksMm(
    truth,
    fit.marks.map((mark) => mark.distance),
  );
  return fit.marks.map((mark, i) => mark.markMm - expected[i]);
};

describe('two marks', () => {
  it('solve speed and scale zero exactly; with the drag given, predictions stay within 0.05 mm from 10 to 100 yd', () => {
    const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 60]), { predict: everyYard }));
    expect(fit.method).toBe('two-mark');
    expect(fit.speedFps).toBeCloseTo(285, 6);
    expect(fit.scaleZeroMm).toBeCloseTo(TRUE_MODEL.scaleZeroMm, 6);
    expect(fit.dragCoefficient).toBeCloseTo(2, 9);
    expect(fit.peepHeightMm).toBeCloseTo(110, 9);
    expect(fit.rmsMm).toBeLessThan(1e-6);
    const errors = predictedAgainst(fit, TRUE_MODEL);
    expect(Math.max(...errors.map(Math.abs))).toBeLessThan(0.05);
  });

  it.each([0.8, 1.2])('with the drag wrong (true Cd = %f × 2.0) and marks at 20 and 60 yd, stay within 0.25 mm to 80 yd', (factor) => {
    const truth = { ...TRUE_MODEL, dragCoefficient: 2 * factor };
    const fit = fitSight(inputWith(marksOf(truth, [20, 60]), { predict: everyYard }));
    const errors = predictedAgainst(fit, truth);
    const to80 = errors.slice(0, 71).map(Math.abs);
    expect(Math.max(...to80)).toBeLessThan(0.25);
    // Drag shows at long range: the 100 yd error is clearly larger than the 40 yd one.
    expect(Math.abs(errors[90])).toBeGreaterThan(2 * Math.abs(errors[30]));
  });

  it('use a chronographed speed as a prior, and say so when it disagrees with the marks', () => {
    const marks = marksOf(TRUE_MODEL, [20, 60]);
    const agreeing = fitSight(inputWith(marks, { arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 2, speedFps: 285 } }));
    expect(agreeing.method).toBe('least-squares');
    expect(agreeing.speedFps).toBeCloseTo(285, 3);
    expect(agreeing.warnings.some((warning) => warning.code === 'chronograph')).toBe(false);
    const disagreeing = fitSight(inputWith(marks, { arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 2, speedFps: 310 } }));
    expect(disagreeing.warnings.find((warning) => warning.code === 'chronograph')?.message).toMatch(/chronograph gave 310 fps/);
    // The marks, not the chronograph, dominate: the fitted speed stays nearer 285.
    expect(Math.abs(disagreeing.speedFps - 285)).toBeLessThan(Math.abs(disagreeing.speedFps - 310));
  });

  it('use the air: the same marks at altitude fit a faster-looking flight with thinner air', () => {
    const marks = marksOf(TRUE_MODEL, [20, 60]);
    const low = fitSight(inputWith(marks));
    const high = fitSight(inputWith(marks, { air: { altitudeM: 3000, temperatureC: 0 } }));
    expect(high.airDensityKgM3).toBeLessThan(low.airDensityKgM3);
    expect(high.speedFps).toBeLessThan(low.speedFps); // less drag needs less launch speed for the same gap
  });
});

describe('three or more marks', () => {
  const truth = { ...TRUE_MODEL, speedFps: 290, dragCoefficient: 2.4, peepHeightMm: 114 };
  const distances = [10, 15, 20, 25, 30, 35, 40, 50, 60, 70, 80, 100];

  it('recover the speed, drag and peep height that made the marks, priors off-centre, within two posterior sigmas', () => {
    // Entered: peep 110 mm (true 114), no drag coefficient (default 2.0; true 2.4).
    const fit = fitSight(inputWith(marksOf(truth, distances), { arrow: { massGr: 420, diameterMm: 6.5 } }));
    expect(fit.method).toBe('least-squares');
    const sigma = (name: (typeof MODEL_PARAMETERS)[number]) =>
      Math.sqrt(fit.model.covariance![MODEL_PARAMETERS.indexOf(name)][MODEL_PARAMETERS.indexOf(name)]);
    expect(Math.abs(fit.speedFps - 290)).toBeLessThan(2 * sigma('speedFps'));
    expect(Math.abs(fit.dragCoefficient - 2.4)).toBeLessThan(2 * sigma('dragCoefficient'));
    expect(Math.abs(fit.peepHeightMm - 114)).toBeLessThan(2 * sigma('peepHeightMm'));
    // The fit moved from the priors toward the truth …
    expect(fit.dragCoefficient).toBeGreaterThan(2.2);
    expect(fit.peepHeightMm).toBeGreaterThan(111);
    // … and predicts the true marks closely everywhere: within a tenth of a
    // millimetre and within each band (the priors still pull a little, since
    // exact marks are indistinguishable from ones good to 0.2 mm).
    expect(fit.rmsMm).toBeLessThan(0.05);
    const dense = fitSight(inputWith(marksOf(truth, distances), { arrow: { massGr: 420, diameterMm: 6.5 }, predict: everyYard }));
    const errors = predictedAgainst(dense, truth);
    expect(Math.max(...errors.map(Math.abs))).toBeLessThan(0.1);
    dense.marks.forEach((mark, i) => expect(Math.abs(errors[i])).toBeLessThan(mark.sigmaMm));
  });

  it('recover the parameters exactly when the priors sit on them (the optimiser itself)', () => {
    const fit = fitSight(
      inputWith(marksOf(truth, distances), {
        arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 2.4 },
        sight: { radiusMm: 820, peepHeightMm: 114 },
      }),
    );
    expect(fit.speedFps).toBeCloseTo(290, 4);
    expect(fit.dragCoefficient).toBeCloseTo(2.4, 5);
    expect(fit.peepHeightMm).toBeCloseTo(114, 4);
    expect(fit.sightRadiusMm).toBeCloseTo(820, 3);
    expect(fit.rmsMm).toBeLessThan(1e-5);
  });

  it('have one-sigma bands that cover the actual error of a mis-specified fit (every input off by under one prior sigma)', () => {
    let worst = 0;
    for (const dragFactor of [0.8, 1.2]) {
      for (const peepOffsetMm of [-4, 4]) {
        for (const radiusFactor of [0.985, 1.015]) {
          const misfit = {
            ...TRUE_MODEL,
            dragCoefficient: 2 * dragFactor,
            peepHeightMm: 110 + peepOffsetMm,
            sightRadiusMm: 820 * radiusFactor,
          };
          for (const marked of [
            [20, 60],
            [20, 40, 60],
            [10, 30, 50, 70],
          ]) {
            const fit = fitSight(inputWith(marksOf(misfit, marked), { predict: everyYard }));
            const errors = predictedAgainst(fit, misfit);
            fit.marks.forEach((mark, i) => (worst = Math.max(worst, Math.abs(errors[i]) / mark.sigmaMm)));
          }
        }
      }
    }
    expect(worst).toBeLessThan(1);
    expect(worst).toBeGreaterThan(0.2); // the bands are not uselessly wide either
  });

  it('give a sane fit from noisy marks (±0.2 mm, seeded) and flag a 2 mm blunder, and only it', () => {
    const random = seededRandom(20261201);
    const noise = distances.map(() => (random() * 2 - 1) * 0.2);
    const fit = fitSight(inputWith(marksOf(TRUE_MODEL, distances, noise)));
    expect(Math.abs(fit.speedFps - 285)).toBeLessThan(3);
    expect(fit.rmsMm).toBeLessThan(0.2);
    expect(fit.residuals.some((residual) => residual.outlier)).toBe(false);
    expect(fit.warnings.some((warning) => warning.code === 'outlier')).toBe(false);
    const truthMarks = predictMarksMm(
      TRUE_MODEL,
      fit.marks.map((mark) => mark.distance),
    );
    fit.marks.forEach((mark, i) => expect(Math.abs(mark.markMm - truthMarks[i])).toBeLessThan(Math.max(0.25, 2.5 * mark.sigmaMm)));

    for (const index of [0, 2, 7, 11]) {
      for (const blunderMm of [2, -2]) {
        const errors = noise.slice();
        errors[index] += blunderMm;
        const blundered = fitSight(inputWith(marksOf(TRUE_MODEL, distances, errors)));
        expect(blundered.residuals.map((residual) => residual.outlier)).toEqual(distances.map((_, i) => i === index));
        expect(blundered.warnings.find((warning) => warning.code === 'outlier')?.message).toContain(`${distances[index]} yd mark`);
      }
    }
  });

  it('sorts residuals by distance and reports entered − fitted', () => {
    const marks = marksOf(TRUE_MODEL, [60, 20, 40], [0, 0, 0.1]);
    const fit = fitSight(inputWith(marks));
    expect(fit.residuals.map((residual) => residual.distance)).toEqual([20, 40, 60]);
    fit.residuals.forEach((residual) => expect(residual.residualMm).toBeCloseTo(residual.markMm - residual.fittedMm, 12));
    expect(fit.residuals[1].residualMm).toBeGreaterThan(0);
  });
});

describe('bands and the next distance', () => {
  it('mark as "verify" only the distances whose band exceeds 0.25 mm, with a plain warning', () => {
    const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 60])));
    for (const mark of fit.marks) {
      expect(mark.verify).toBe(mark.sigmaMm > 0.25);
      const warning = fit.warnings.find((w) => w.code === 'verify' && w.distance === mark.distance);
      expect(Boolean(warning)).toBe(mark.verify);
      if (warning)
        expect(warning.message).toBe(
          `Confirm at ${mark.distance} yd: the predicted mark there is uncertain by ±${mark.sigmaMm.toFixed(1)} mm`,
        );
    }
    // Between the marks the band is tighter than beyond them.
    const at = (distance: number) => fit.marks.find((mark) => mark.distance === distance)!.sigmaMm;
    expect(at(40)).toBeLessThan(at(20));
    expect(at(100)).toBeGreaterThan(at(60));
    expect(at(20)).toBeCloseTo(FIT_PRIORS.markSigmaMm, 1); // a sighted distance is as good as its mark
  });

  it('suggest a distance whose mark shrinks the bands more than any other candidate does', () => {
    const marked = [20, 60];
    const fit = fitSight(inputWith(marksOf(TRUE_MODEL, marked)));
    expect(fit.nextDistance).not.toBeNull();
    expect(fit.nextDistance! % 5).toBe(0);
    expect(marked).not.toContain(fit.nextDistance);
    // Check by refitting: add an exact mark at each candidate and sum the variance over 10–100 yd.
    const summedVariance = (extra: number) => {
      const refit = fitSight(
        inputWith(marksOf(TRUE_MODEL, [...marked, extra]), {
          predict: [10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80, 85, 90, 95, 100],
        }),
      );
      return refit.marks.reduce((sum, mark) => sum + mark.sigmaMm ** 2, 0);
    };
    const best = summedVariance(fit.nextDistance!);
    for (const other of [10, 30, 40, 80]) if (other !== fit.nextDistance) expect(best).toBeLessThanOrEqual(summedVariance(other) * 1.02);
  });

  it('evaluate the fitted model for any distance, with a band in distance units', () => {
    const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 40, 60])));
    const band = markBand(fit.model, 55)!;
    expect(band.markMm).toBeCloseTo(predictMarksMm(fit.model, [55])[0], 9);
    expect(band.sigmaMm).toBeGreaterThan(0);
    expect(band.sigmaDistance!).toBeCloseTo(band.sigmaMm / band.mmPerDistance, 9);
    // Near the short-range turning point the mark hardly moves: no distance band.
    expect(markBand(fit.model, 14)!.sigmaDistance).toBeNull();
    expect(JSON.parse(JSON.stringify(fit.model))).toEqual(fit.model); // serialisable
  });
});

describe('non-throwing variant', () => {
  it('returns the field and message instead of throwing', () => {
    const attempt = attemptSightFit(inputWith([{ distance: 20, markMm: 14.9 }]));
    expect(attempt).toEqual({
      ok: false,
      error: { field: 'marks', message: 'Enter at least two marks, or one mark and the chronographed speed (arrow.speedFps)' },
    });
    const good = attemptSightFit(inputWith(marksOf(TRUE_MODEL, [20, 60])));
    expect(good.ok && good.fit.speedFps).toBeCloseTo(285, 5);
  });
});
