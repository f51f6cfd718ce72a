import type { BowDetail } from '@/shared/bow-detail';
import type { Build } from '@/shared/build';

const stamp = '2026-11-20T09:00:00.000Z';

/**
 * An invented arrow build on bow 3: 9.5 gpi shaft cut to 723.9 mm, 6.5 mm
 * diameter, 100 gr point, 16 gr insert, 9 gr nock, three 6 gr vanes: 413.75 gr
 * in all (9.5 × 28.5 in + 100 + 16 + 9 + 18, arithmetic). Fields may be overridden.
 * Example: inventedBuild({ sightInCount: 1 }).derived.totalGr → 413.75
 */
export function inventedBuild(overrides: Partial<Build> = {}): Build {
  return {
    id: 4,
    bowId: 3,
    name: 'Ash heavy 414',
    shaftLabel: '',
    spine: null,
    grainsPerInch: 9.5,
    cutLengthMm: 723.9,
    diameterMm: 6.5,
    pointGr: 100,
    insertGr: 16,
    collarGr: 0,
    nockGr: 9,
    vaneCount: 3,
    vaneWeightGr: 6,
    wrapGr: 0,
    balancePointMm: null,
    speedFps: null,
    dragCoefficient: null,
    sightInCount: 0,
    derived: {
      totalGr: 413.75,
      focPct: null,
      kineticEnergyFtLb: null,
      kineticEnergyJ: null,
      momentumSlugFtPerS: null,
      momentumKgMPerS: null,
    },
    createdAt: stamp,
    updatedAt: stamp,
    ...overrides,
  };
}

/**
 * An invented bow 3 of user 1 (Ilse Marrow): right hand, 62 lb, single-pin
 * slider, sight radius 820 mm, peep height 110 mm, with the invented build and
 * no sight-ins or tapes. Fields may be overridden.
 * Example: inventedBow({ tapes: [tape] }).builds[0].name → 'Ash heavy 414'
 */
export function inventedBow(overrides: Partial<BowDetail> = {}): BowDetail {
  return {
    id: 3,
    userId: 1,
    ownerName: 'Ilse Marrow',
    nickname: 'Tarn ridge slider',
    hand: 'right',
    drawWeightLb: 62,
    drawLengthMm: 711,
    letOffPct: null,
    ratedSpeedFps: null,
    sightDescription: '',
    sightKind: 'single-pin-slider',
    sightRadiusMm: 820,
    peepHeightMm: 110,
    scaleDirection: 'down',
    tapeWidthMm: 8,
    pinDistances: [],
    pinDistanceUnit: 'yd',
    notes: '',
    createdAt: stamp,
    updatedAt: stamp,
    readiness: { latestSightIn: null, buildCount: 1, sightInCount: 0, hasTape: false, level: null },
    builds: [inventedBuild()],
    sightIns: [],
    tapes: [],
    ...overrides,
  };
}
