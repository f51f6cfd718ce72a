/**
 * Demo scenario, bows part (invented people, places and bows; no real brands):
 * Marit Oakhollow is getting ready for a late-season mountain elk hunt. She
 * has a single-pin slider bow she hunts with and a fixed five-pin bow she
 * keeps as a back-up, three arrow builds, sight-ins with 2, 3 and 5
 * marks and the tapes she printed from them.
 *
 * The marks are consistent: each is the reading the math core's flight model
 * gives for a plausible arrow (its own speed and drag), plus a small fixed
 * scatter (a tenth or two of a millimetre, as groups wander), rounded to
 * 0.1 mm as an archer reads a scale. Idempotent: each record is looked up by
 * its natural key (bow nickname, build name, sight-in date and place, tape
 * label) and made only if missing; it goes through the same services as the
 * API, so derived quantities and fits are computed the same way.
 */
import { ArrowBuild, Bow, SightIn, Tape, type User } from '@/server/models';
import type { BowInput } from '@/shared/bow';
import type { BuildInput } from '@/shared/build';
import type { SightInInput } from '@/shared/sight-in';
import type { TapeLayout } from '@/shared/tape';
import { createBow } from '@/server/services/bow-service';
import { createBuild } from '@/server/services/build-service';
import { createSightIn } from '@/server/services/sight-in-service';
import { createTape } from '@/server/services/tape-service';
import { simulatedReadings } from '@/server/services/fit-service';
import type { SeedStep } from './step';

const INCH_MM = 25.4; // exact (international yard and pound, 1959)

type BuildSeed = BuildInput & {
  /** The arrow as it really flies from this bow, which the marks are drawn from. */
  truth: { speedFps: number; dragCoefficient: number };
  sightIns: (Omit<SightInInput, 'buildId' | 'marks'> & {
    distances: number[];
    /** Scatter added to each exact reading, mm (fixed, so the scenario is the same on every machine). */
    scatterMm: number[];
    /** Where the scale reads zero for this sight set-up, mm. */
    scaleZeroMm: number;
    tapes: TapeLayout[];
  })[];
};

type BowSeed = BowInput & { builds: BuildSeed[] };

const tape = (layout: Partial<TapeLayout> & Pick<TapeLayout, 'fromDistance' | 'toDistance' | 'label'>): TapeLayout => ({
  step: 1,
  unit: 'yd',
  orientation: 'down',
  widthMm: 12,
  mirror: false,
  paper: 'letter',
  ...layout,
});

export const demoBows: BowSeed[] = [
  {
    nickname: 'Timberline slider',
    hand: 'right',
    drawWeightLb: 64,
    drawLengthMm: 28.5 * INCH_MM,
    letOffPct: 85,
    ratedSpeedFps: 335,
    sightDescription: 'Single-pin slider on a 4-inch extension, 0.019 in green fibre, second-axis bubble',
    sightKind: 'single-pin-slider',
    sightRadiusMm: 838,
    peepHeightMm: 112,
    scaleDirection: 'down',
    tapeWidthMm: 12,
    pinDistances: [],
    pinDistanceUnit: 'yd',
    notes: 'Hunting bow for the Greywether Basin trip. New string in August; peep re-served after 200 shots.',
    builds: [
      {
        name: 'Elk heavy',
        shaftLabel: 'carbon 300, 9.3 gpi',
        spine: 300,
        grainsPerInch: 9.3,
        cutLengthMm: 28.25 * INCH_MM,
        diameterMm: 6.2,
        pointGr: 150,
        insertGr: 50,
        collarGr: 0,
        nockGr: 9,
        vaneCount: 3,
        vaneWeightGr: 7,
        wrapGr: 8,
        balancePointMm: 17.5 * INCH_MM,
        speedFps: 276,
        dragCoefficient: null,
        truth: { speedFps: 275.2, dragCoefficient: 2.1 },
        sightIns: [
          {
            date: '2026-11-14',
            placeLabel: 'Greywether Basin camp meadow',
            altitudeM: 2280,
            temperatureC: -2,
            notes: 'Calm morning, shot from a knee at 50 and 60 as I would on the hunt.',
            distances: [20, 30, 40, 50, 60],
            scatterMm: [0.05, -0.08, 0.1, -0.04, 0.07],
            scaleZeroMm: 2.6,
            tapes: [tape({ fromDistance: 15, toDistance: 80, label: 'Basin tape' })],
          },
          {
            date: '2026-10-03',
            placeLabel: 'Larch Hollow range',
            altitudeM: 640,
            temperatureC: 12,
            notes: 'First sight-in with the heavy build.',
            distances: [20, 60],
            scatterMm: [0.04, -0.06],
            scaleZeroMm: 2.6,
            tapes: [],
          },
        ],
      },
      {
        name: 'Practice light',
        shaftLabel: 'carbon 340, 8.2 gpi',
        spine: 340,
        grainsPerInch: 8.2,
        cutLengthMm: 28.25 * INCH_MM,
        diameterMm: 6.0,
        pointGr: 100,
        insertGr: 16,
        collarGr: 0,
        nockGr: 9,
        vaneCount: 3,
        vaneWeightGr: 6,
        wrapGr: 0,
        balancePointMm: 16.1 * INCH_MM,
        speedFps: 306,
        dragCoefficient: null,
        truth: { speedFps: 305.4, dragCoefficient: 1.95 },
        sightIns: [
          {
            date: '2026-09-12',
            placeLabel: 'Larch Hollow range',
            altitudeM: 640,
            temperatureC: 19,
            notes: 'Light arrows for summer practice.',
            distances: [20, 40, 60],
            scatterMm: [-0.05, 0.09, -0.03],
            scaleZeroMm: 2.6,
            tapes: [tape({ fromDistance: 15, toDistance: 70, label: 'Practice tape', paper: 'a4' })],
          },
        ],
      },
    ],
  },
  {
    nickname: 'Cedar five-pin',
    hand: 'right',
    drawWeightLb: 58,
    drawLengthMm: 28 * INCH_MM,
    letOffPct: 80,
    ratedSpeedFps: 318,
    sightDescription: 'Fixed five-pin, 0.029 in fibres, round guard with a bubble',
    sightKind: 'fixed-multi-pin',
    sightRadiusMm: 790,
    peepHeightMm: 105,
    scaleDirection: 'down',
    tapeWidthMm: 10,
    pinDistances: [20, 30, 40, 50, 60],
    pinDistanceUnit: 'yd',
    notes: 'Back-up bow; rides in the truck.',
    builds: [
      {
        name: 'Five-pin hunter',
        shaftLabel: 'carbon 350, 8.8 gpi',
        spine: 350,
        grainsPerInch: 8.8,
        cutLengthMm: 27.75 * INCH_MM,
        diameterMm: 5.9,
        pointGr: 125,
        insertGr: 20,
        collarGr: 0,
        nockGr: 8,
        vaneCount: 4,
        vaneWeightGr: 5,
        wrapGr: 6,
        balancePointMm: 16.4 * INCH_MM,
        speedFps: null,
        dragCoefficient: 2.2,
        truth: { speedFps: 284.5, dragCoefficient: 2.2 },
        sightIns: [
          {
            date: '2026-10-24',
            placeLabel: 'Quarry Bend practice butts',
            altitudeM: 410,
            temperatureC: 9,
            notes: 'Set the 20 and 60 pins; the fit places 30, 40 and 50.',
            distances: [20, 60],
            scatterMm: [0.03, 0.08],
            scaleZeroMm: 1.8,
            tapes: [tape({ fromDistance: 20, toDistance: 60, widthMm: 10, label: 'Pin gap card' })],
          },
        ],
      },
    ],
  },
];

/** Seeds Marit's bows, builds, sight-ins and tapes; adds only what is missing. */
export async function seedBows(archer: User): Promise<void> {
  for (const { builds, ...bowInput } of demoBows) {
    let bow = await Bow.findOne({ where: { userId: archer.id, nickname: bowInput.nickname } });
    if (!bow) {
      const made = await createBow(archer, bowInput);
      bow = (await Bow.findByPk(made.id))!;
    }
    for (const { truth, sightIns, ...buildInput } of builds) {
      let build = await ArrowBuild.findOne({ where: { bowId: bow.id, name: buildInput.name } });
      if (!build) {
        const made = await createBuild(archer, bow.id, buildInput);
        build = (await ArrowBuild.findByPk(made.id))!;
      }
      for (const { distances, scatterMm, scaleZeroMm, tapes, ...sightInInput } of sightIns) {
        let sightIn = await SightIn.findOne({ where: { bowId: bow.id, date: sightInInput.date, placeLabel: sightInInput.placeLabel } });
        if (!sightIn) {
          const readings = simulatedReadings(
            {
              distanceUnit: 'yd',
              speedFps: truth.speedFps,
              dragCoefficient: truth.dragCoefficient,
              arrowMassGr: build.totalGr,
              arrowDiameterMm: build.diameterMm,
              peepHeightMm: bow.peepHeightMm,
              sightRadiusMm: bow.sightRadiusMm,
              scaleZeroMm,
              altitudeM: sightInInput.altitudeM ?? undefined,
              temperatureC: sightInInput.temperatureC ?? undefined,
            },
            distances,
          );
          const marks = distances.map((distance, index) => ({
            distance,
            unit: 'yd' as const,
            // Read to a tenth of a millimetre, as on a sight's scale.
            scaleMm: Math.round((readings[index] + scatterMm[index]) * 10) / 10,
            arrowsShot: 3,
            note: '',
          }));
          const made = await createSightIn(archer, bow.id, { ...sightInInput, buildId: build.id, marks });
          sightIn = (await SightIn.findByPk(made.id))!;
        }
        for (const layout of tapes) {
          const existing = await Tape.findOne({ where: { sightInId: sightIn.id, label: layout.label } });
          if (!existing) await createTape(archer, sightIn.id, layout);
        }
      }
    }
  }
}

/** The step demo.ts runs: Marit's bows on the archer account. */
export const seedBowsStep: SeedStep = (accounts) => seedBows(accounts.archer);
