import { liveFit, type LiveFitText } from '@/components/sight-ins/live-fit';
import { fitSight } from '@/math/fit/fit-sight';
import { arrowQuantities, fitSightIn, simulatedReadings } from '@/server/services/fit-service';
import { buildSchema, type Build } from '@/shared/build';
import { storedFitSchema } from '@/shared/sight-in';
import { fitResultOf, predictDistances, sightInFitInput, storedFitOf, type FitBow } from '@/shared/sight-in-fit';

// The table the archer sees while typing (components/sight-ins/live-fit.ts) and
// the fit the server saves (server/services/fit-service.ts) come from the same
// rules (shared/sight-in-fit.ts): same distances, same marks, for the same input.
// Invented bow and arrow; readings drawn from the flight model, read to 0.01 mm.

const buildInput = {
  name: 'Test build',
  grainsPerInch: 9.3,
  cutLengthMm: 736.6,
  diameterMm: 6.2,
  pointGr: 125,
  insertGr: 16,
  nockGr: 9,
  vaneCount: 3,
  vaneWeightGr: 6,
  wrapGr: 0,
  collarGr: 0,
  balancePointMm: null,
  dragCoefficient: 2.1,
};

function buildWith(speedFps: number | null): Build {
  const fields = { ...buildInput, shaftLabel: '', spine: 340, speedFps };
  return buildSchema.parse({
    ...fields,
    id: 7,
    bowId: 3,
    derived: arrowQuantities(fields),
    sightInCount: 0,
    createdAt: '2026-10-04T00:00:00.000Z',
    updatedAt: '2026-10-04T00:00:00.000Z',
  });
}

/** Readings as the archer reads them: an upward-growing scale reads 120 mm minus the downward reading. */
function readings(bow: FitBow, unit: 'yd' | 'm', distances: number[], build: Build): string[] {
  const down = simulatedReadings(
    {
      distanceUnit: unit,
      speedFps: 281,
      dragCoefficient: 2.1,
      arrowMassGr: build.derived.totalGr,
      arrowDiameterMm: build.diameterMm,
      peepHeightMm: bow.peepHeightMm + 3,
      sightRadiusMm: bow.sightRadiusMm - 6,
      scaleZeroMm: 2.5,
      altitudeM: 1450,
      temperatureC: 4,
    },
    distances,
  );
  return down.map((mm, i) => (bow.scaleDirection === 'up' ? 120 - mm : mm + 0.05 * Math.sin(i + 1)).toFixed(2));
}

function bothFits(bow: FitBow, unit: 'yd' | 'm', distances: number[], build: Build) {
  const scale = readings(bow, unit, distances, build);
  const text: LiveFitText = {
    buildId: String(build.id),
    altitudeM: '1450',
    temperatureC: '4',
    unit,
    marks: distances.map((distance, i) => ({ distance: String(distance), scaleMm: scale[i], arrowsShot: '', note: '' })),
  };
  const live = liveFit(text, bow, [build]);
  const saved = fitSightIn(
    bow,
    { totalGr: build.derived.totalGr, diameterMm: build.diameterMm, dragCoefficient: build.dragCoefficient, speedFps: build.speedFps },
    { altitudeM: 1450, temperatureC: 4, marks: distances.map((distance, i) => ({ distance, unit, scaleMm: Number(scale[i]) })) },
  );
  if (live.state !== 'fit') throw new Error(`live fit is ${live.state}`);
  return { live, saved };
}

/** The live table as the archer reads it: distance and mark (null out of reach), like the stored fit. */
const liveRows = (live: Extract<ReturnType<typeof liveFit>, { state: 'fit' }>) =>
  live.fit.marks.map((mark) => ({ distance: mark.distance, markMm: Number.isFinite(mark.markMm) ? live.sign * mark.markMm : null }));
const savedRows = (saved: ReturnType<typeof fitSightIn>) => saved.marks.map((mark) => ({ distance: mark.distance, markMm: mark.markMm }));

describe('the live table and the saved fit', () => {
  it('predict the same distances and marks on a metric table with fixed pins in yards and an upward scale', () => {
    const bow: FitBow = { sightRadiusMm: 838, peepHeightMm: 112, scaleDirection: 'up', pinDistances: [20, 30, 40], pinDistanceUnit: 'yd' };
    const { live, saved } = bothFits(bow, 'm', [18, 30, 50, 70], buildWith(null));
    expect(liveRows(live)).toEqual(savedRows(saved));
    const distances = saved.marks.map((mark) => mark.distance);
    // The grid to 100 m in both (not 90), with the pins at their exact metre distances.
    expect(distances[distances.length - 1]).toBe(100);
    for (const pin of [18.288, 27.432, 36.576]) expect(distances.some((distance) => Math.abs(distance - pin) < 1e-9)).toBe(true);
    expect(live.fit.residuals.map((residual) => live.sign * residual.residualMm)).toEqual(
      saved.residuals.map((residual) => residual.residualMm),
    );
    expect(live.fit.speedFps).toBe(saved.speedFps);
  });

  it('predict the same distances and marks in yards, beyond 100 when a mark is far', () => {
    const bow: FitBow = { sightRadiusMm: 820, peepHeightMm: 110, scaleDirection: 'down', pinDistances: [], pinDistanceUnit: 'yd' };
    const { live, saved } = bothFits(bow, 'yd', [20, 40, 60, 95], buildWith(283));
    expect(liveRows(live)).toEqual(savedRows(saved));
    expect(saved.marks.map((mark) => mark.distance)).toEqual(predictDistances(95));
    expect(saved.marks[saved.marks.length - 1].distance).toBe(120);
  });

  it('agree for one mark and a chronographed speed (an estimate)', () => {
    const bow: FitBow = { sightRadiusMm: 820, peepHeightMm: 110, scaleDirection: 'down', pinDistances: [25], pinDistanceUnit: 'yd' };
    const { live, saved } = bothFits(bow, 'yd', [30], buildWith(283));
    expect(saved.method).toBe('one-mark');
    expect(liveRows(live)).toEqual(savedRows(saved));
  });
});

describe('the stored fit', () => {
  const bow: FitBow = { sightRadiusMm: 838, peepHeightMm: 112, scaleDirection: 'up', pinDistances: [33], pinDistanceUnit: 'yd' };
  const build = { totalGr: 470, diameterMm: 6.2, dragCoefficient: 2, speedFps: null };
  const marks = [20, 60].map((distance, i) => ({ distance, unit: 'yd' as const, scaleMm: [101.54, 83.33][i] }));
  const fit = fitSight(sightInFitInput(bow, build, { altitudeM: null, temperatureC: null, marks }));

  it('maps back to math’s result', () => {
    const back = fitResultOf(storedFitOf(fit, 'up'));
    expect(back.marks).toEqual(fit.marks);
    expect(back.residuals).toEqual(fit.residuals);
    expect(back.scaleZeroMm).toBe(fit.scaleZeroMm);
    expect(back.model).toBe(fit.model);
  });

  it('parses from its JSON with a typed model, as stored today and as stored before models carried oneMark', () => {
    const json = JSON.parse(JSON.stringify(storedFitOf(fit, 'up')));
    const parsed = storedFitSchema.parse(json);
    expect(parsed.model).toEqual(fit.model);
    const older = { ...json, model: { ...json.model } };
    delete older.model.oneMark;
    delete older.model.covariance;
    expect(storedFitSchema.parse(older).model.speedFps).toBe(fit.model.speedFps);
  });
});
