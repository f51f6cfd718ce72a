/**
 * Demo scenario, level part (invented; see bows.ts): Marit checked the level
 * of her hunting bow at the bench and confirmed it at the range nine days ago,
 * so it is verified. Her back-up bow was checked a month ago, then got a new
 * string twelve days later, so it is due. Times are relative to the first
 * seeding, as if she had just done the work.
 *
 * Idempotent: a bow that has any level check (or, for the string, any logged
 * change) is left as it is.
 */
import { sequelize } from '@/server/db';
import { Bow, BowChange, LevelCheck, LevelStep, type User } from '@/server/models';
import type { LevelResult, LevelStepKey, ReadingUnit } from '@/shared/level';
import type { SeedStep } from './step';

const dayMs = 24 * 60 * 60 * 1000;
const minuteMs = 60 * 1000;

type StepSeed = { step: LevelStepKey; result: LevelResult; reading?: number; readingUnit?: ReadingUnit; adjustment?: string };

async function seedCheck(bow: Bow, archer: User, startedAt: Date, place: 'bench' | 'range', note: string, steps: StepSeed[]) {
  await sequelize.transaction(async (transaction) => {
    const check = await LevelCheck.create(
      {
        bowId: bow.id,
        userId: archer.id,
        place,
        status: 'complete',
        startedAt,
        completedAt: new Date(startedAt.getTime() + 50 * minuteMs),
        note,
      },
      { transaction },
    );
    await LevelStep.bulkCreate(
      steps.map((s) => ({
        checkId: check.id,
        step: s.step,
        result: s.result,
        reading: s.reading ?? null,
        readingUnit: s.reading === undefined ? null : (s.readingUnit ?? null),
        adjustment: s.adjustment ?? '',
        photoId: null,
      })),
      { transaction },
    );
  });
}

/** Seeds Marit's level checks and the change on her back-up bow; adds only what is missing. */
export async function seedLevel(archer: User, now = new Date()): Promise<void> {
  const hunting = await Bow.findOne({ where: { userId: archer.id, nickname: 'Timberline slider' } });
  if (hunting && (await LevelCheck.count({ where: { bowId: hunting.id } })) === 0) {
    await seedCheck(
      hunting,
      archer,
      new Date(now.getTime() - 9 * dayMs),
      'range',
      'Bench in the garage, then the club range at Hollow Pine.',
      [
        { step: 'setup', result: 'pass' },
        { step: 'first-axis', result: 'pass', reading: 0, readingUnit: 'deg' },
        {
          step: 'second-axis',
          result: 'adjusted',
          reading: 0.5,
          readingUnit: 'bubble',
          adjustment: 'Rotated the housing about half a bubble toward the riser.',
        },
        { step: 'third-axis', result: 'pass' },
        { step: 'range', result: 'pass', adjustment: '60 yd group on the mark; the steep shot down from the tower held left-right.' },
      ],
    );
  }

  const backup = await Bow.findOne({ where: { userId: archer.id, nickname: 'Cedar five-pin' } });
  if (backup && (await LevelCheck.count({ where: { bowId: backup.id } })) === 0) {
    const checkedAt = new Date(now.getTime() - 30 * dayMs);
    await seedCheck(backup, archer, checkedAt, 'bench', '', [
      { step: 'setup', result: 'pass' },
      { step: 'first-axis', result: 'pass' },
      { step: 'second-axis', result: 'pass', reading: 0, readingUnit: 'bubble' },
      { step: 'third-axis', result: 'pass' },
      { step: 'range', result: 'skipped' },
    ]);
    if ((await BowChange.count({ where: { bowId: backup.id } })) === 0) {
      await BowChange.create({
        bowId: backup.id,
        userId: archer.id,
        kind: 'string',
        changedAt: new Date(checkedAt.getTime() + 12 * dayMs + 3 * 60 * minuteMs),
        note: 'New string and cables set at the shop; peep re-served.',
      });
    }
  }
}

/** The step demo.ts runs: Marit's level checks (after her bows exist). */
export const seedLevelStep: SeedStep = (accounts) => seedLevel(accounts.archer);
