import {
  fitSight,
  predictBuild,
  predictMarksMm,
  withArrow,
  grainsToKg,
  mpsToFps,
  kineticEnergy,
  isFitInputError,
  missingChronographMessage,
  PREDICTED_CAUTION,
  type SightModel,
} from '@/math';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';

// An invented bow following the virtual-mass model v = √(2E/(m + m_v)) exactly: E = 120 J, m_v = 330 gr.
const speedOf = (massGr: number) => mpsToFps(Math.sqrt((2 * 120) / grainsToKg(massGr + 330)));
const chronographed = [
  { massGr: 380, speedFps: speedOf(380) },
  { massGr: 470, speedFps: speedOf(470) },
];
// The sight, fitted from exact marks of the 420 gr arrow at its own speed on this bow.
const sightModel: SightModel = { ...TRUE_MODEL, speedFps: speedOf(420) };
const sight = fitSight(
  inputWith(marksOf(sightModel, [20, 40, 60]), { arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 2, speedFps: speedOf(420) } }),
).model;

describe('predictBuild', () => {
  it('predicts a third build’s speed within 1 fps and its marks on the fitted sight', () => {
    const prediction = predictBuild({ arrow: { massGr: 440, diameterMm: 6.5 }, chronographed, sight });
    expect(prediction.speedSource).toBe('virtual-mass');
    expect(Math.abs(prediction.speedFps - speedOf(440))).toBeLessThan(1);
    expect(prediction.virtualMass!.energyJ).toBeCloseTo(120, 6);
    expect(prediction.virtualMass!.virtualMassGr).toBeCloseTo(330, 4);
    expect(prediction.warnings).toEqual([]);
    expect(prediction.caution).toBe(PREDICTED_CAUTION);
    expect(prediction.kineticEnergyJ).toBeCloseTo(kineticEnergy({ massGr: 440, speedFps: prediction.speedFps }).joules, 12);

    // Against the truth: the same bow and sight carrying the 440 gr arrow at its true speed.
    const truth: SightModel = { ...TRUE_MODEL, arrowMassGr: 440, speedFps: speedOf(440) };
    const distances = [20, 30, 40, 50, 60, 70, 80];
    const truthMarks = predictMarksMm(truth, distances);
    for (const [i, distance] of distances.entries()) {
      const mark = prediction.marks!.find((candidate) => candidate.distance === distance)!;
      expect(Math.abs(mark.markMm! - truthMarks[i])).toBeLessThan(0.02);
      expect(mark.differenceMm!).toBeCloseTo(mark.markMm! - mark.sightedBuildMarkMm!, 12);
    }
    expect(prediction.model).toEqual(withArrow(sight, { massGr: 440, diameterMm: 6.5, speedFps: prediction.speedFps }));
    expect(prediction.marks!.map((mark) => mark.distance)).toEqual(Array.from({ length: 19 }, (_, i) => 10 + 5 * i));
  });

  it('says what is missing instead of guessing with fewer than two chronographed builds', () => {
    for (const [given, message] of [
      [chronographed.slice(0, 1), /^Chronograph at least one more build on this bow/],
      [[], /^Chronograph at least two builds/],
    ] as const) {
      try {
        predictBuild({ arrow: { massGr: 440, diameterMm: 6.5 }, chronographed: given, sight });
        throw new Error('no error');
      } catch (error) {
        expect(isFitInputError(error)).toBe(true);
        expect((error as { field: string }).field).toBe('builds');
        expect((error as Error & { detail: string }).detail).toMatch(message);
      }
    }
    expect(missingChronographMessage(1)).toMatch(/^Chronograph at least one more build on this bow/);
  });

  it('uses a build’s own chronographed speed, with or without other builds', () => {
    const own = predictBuild({ arrow: { massGr: 500, diameterMm: 6.2, speedFps: 266 }, chronographed: [], sight });
    expect(own.speedSource).toBe('chronograph');
    expect(own.speedFps).toBe(266);
    expect(own.virtualMass).toBeNull();
    expect(own.marks![4].markMm!).toBeCloseTo(
      predictMarksMm(withArrow(sight, { massGr: 500, diameterMm: 6.2, speedFps: 266 }), [30])[0],
      9,
    );
  });

  it('warns when the mass lies outside the chronographed builds', () => {
    expect(predictBuild({ arrow: { massGr: 560, diameterMm: 6.5 }, chronographed, sight: null }).warnings[0]).toMatch(
      /heavier than every chronographed build \(380–470 gr\)/,
    );
    expect(predictBuild({ arrow: { massGr: 330, diameterMm: 6.5 }, chronographed, sight: null }).warnings[0]).toMatch(/lighter/);
  });

  it('gives the speed alone without a sight, and carries a drag coefficient of its own', () => {
    const alone = predictBuild({ arrow: { massGr: 440, diameterMm: 6.5 }, chronographed, sight: null });
    expect(alone.marks).toBeNull();
    expect(alone.model).toBeNull();
    expect(alone.unit).toBeNull();
    const draggy = predictBuild({ arrow: { massGr: 440, diameterMm: 6.5, dragCoefficient: 2.6 }, chronographed, sight });
    const plain = predictBuild({ arrow: { massGr: 440, diameterMm: 6.5 }, chronographed, sight });
    expect(draggy.dragCoefficient).toBe(2.6);
    expect(plain.dragCoefficient).toBeCloseTo(sight.dragCoefficient, 12);
    // More drag: the long mark sits lower on the scale.
    expect(draggy.marks![18].markMm!).toBeGreaterThan(plain.marks![18].markMm!);
  });

  it('reads marks as an upward-growing scale does', () => {
    const down = predictBuild({ arrow: { massGr: 440, diameterMm: 6.5 }, chronographed, sight });
    const up = predictBuild({ arrow: { massGr: 440, diameterMm: 6.5 }, chronographed, sight, scaleSign: -1 });
    expect(up.marks![6].markMm!).toBeCloseTo(-down.marks![6].markMm!, 12);
    expect(up.marks![6].differenceMm!).toBeCloseTo(-down.marks![6].differenceMm!, 12);
  });
});
