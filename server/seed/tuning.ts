/**
 * Demo scenario, tuning part (invented; see bows.ts): before sighting in her
 * hunting bow, Marit recorded its set-up at the bench, paper-tuned it to a
 * clean hole at 5 yd on 30 Aug 2026 (nock down a touch, then the rest), and
 * weighed and spun six arrows of her heavy build (one retired after a bad
 * spin). All of it is dated before her sight-ins, so the tape stays current.
 *
 * Idempotent: a bow that has any set-up entry is left as it is.
 */
import { sequelize } from '@/server/db';
import { Arrow, ArrowBuild, ArrowSet, Bow, BowChange, PaperTuneRun, PaperTuneShot, SetupEntry, type User } from '@/server/models';
import type { SeedStep } from './step';

const day = '2026-08-30';
const at = (time: string) => new Date(`${day}T${time}:00.000Z`);

/** Seeds the hunting bow's tuning; adds nothing if it has set-up entries already. */
export async function seedTuning(archer: User): Promise<void> {
  const bow = await Bow.findOne({ where: { userId: archer.id, nickname: 'Timberline slider' } });
  if (!bow || (await SetupEntry.count({ where: { bowId: bow.id } })) > 0) return;
  const build = await ArrowBuild.findOne({ where: { bowId: bow.id, name: 'Elk heavy' } });
  await sequelize.transaction(async (transaction) => {
    const entries: [SetupEntry['measure'], number | null, string | null, string][] = [
      ['rest-kind', null, 'drop-away', ''],
      ['cam-system', null, 'hybrid', ''],
      ['centre-shot', 20.6, null, 'Set with a bow square and an arrow on the rest.'],
      ['nock-height', 3.2, null, ''],
      ['brace-height', 152.4, null, ''],
      ['axle-to-axle', 838.2, null, ''],
      ['d-loop', 106, null, 'Loop material cut at 4 3/16 in.'],
      ['cam-timing', null, 'together', 'Both stops touch together at full draw.'],
      ['cam-lean', null, 'none', ''],
    ];
    for (const [measure, valueMm, choice, note] of entries) {
      await SetupEntry.create(
        { bowId: bow.id, userId: archer.id, measure, valueMm, choice, measuredOn: day, note, changeId: null },
        { transaction },
      );
    }
    const run = await PaperTuneRun.create(
      {
        bowId: bow.id,
        userId: archer.id,
        buildId: build?.id ?? null,
        distance: 5,
        unit: 'yd',
        startedOn: day,
        outcome: 'clean',
        endedAt: at('18:10'),
        note: 'Garage, bare shafts then fletched.',
      },
      { transaction },
    );
    const nock = await BowChange.create(
      {
        bowId: bow.id,
        userId: archer.id,
        kind: 'nock-height',
        changedAt: at('17:40'),
        note: 'Paper tune, before shot 2: nock down 1/32 in',
      },
      { transaction },
    );
    const rest = await BowChange.create(
      { bowId: bow.id, userId: archer.id, kind: 'rest', changedAt: at('17:55'), note: 'Paper tune, before shot 3: rest right 1/32 in' },
      { transaction },
    );
    await PaperTuneShot.bulkCreate(
      [
        {
          runId: run.id,
          userId: archer.id,
          position: 0,
          tear: 'up',
          lengthMm: 18,
          arrows: 1,
          note: '',
          changedBefore: 'none',
          changeNote: '',
          changeId: null,
        },
        {
          runId: run.id,
          userId: archer.id,
          position: 1,
          tear: 'right',
          lengthMm: 8,
          arrows: 1,
          note: '',
          changedBefore: 'nock-height',
          changeNote: 'down 1/32 in',
          changeId: nock.id,
        },
        {
          runId: run.id,
          userId: archer.id,
          position: 2,
          tear: 'clean',
          lengthMm: null,
          arrows: 3,
          note: 'Three in a row.',
          changedBefore: 'rest',
          changeNote: 'right 1/32 in',
          changeId: rest.id,
        },
      ],
      { transaction },
    );
    if (build) {
      const set = await ArrowSet.create({ buildId: build.id, userId: archer.id, name: 'Hunting six', toleranceGr: 2 }, { transaction });
      const base = Math.round(build.totalGr * 10) / 10;
      await Arrow.bulkCreate(
        [
          { setId: set.id, number: 1, weightGr: base + 0.4, spinKind: 'thou', runout: 1.5, note: '', status: 'quiver' },
          { setId: set.id, number: 2, weightGr: base - 0.3, spinKind: 'thou', runout: 2, note: '', status: 'quiver' },
          { setId: set.id, number: 3, weightGr: base + 0.1, spinKind: 'thou', runout: 1, note: 'New nock', status: 'quiver' },
          {
            setId: set.id,
            number: 4,
            weightGr: base + 2.9,
            spinKind: 'thou',
            runout: 2.5,
            note: 'Extra glue on the insert?',
            status: 'practice',
          },
          { setId: set.id, number: 5, weightGr: base - 0.6, spinKind: 'thou', runout: 1, note: '', status: 'quiver' },
          {
            setId: set.id,
            number: 6,
            weightGr: base + 0.2,
            spinKind: 'fail',
            runout: null,
            note: 'Wobbles: bent shaft',
            status: 'retired',
          },
        ].map((arrow) => ({ ...arrow, spinKind: arrow.spinKind as Arrow['spinKind'], status: arrow.status as Arrow['status'] })),
        { transaction },
      );
    }
  });
}

/** The step demo.ts runs: Marit's tuning records (after her bows exist). */
export const seedTuningStep: SeedStep = (accounts) => seedTuning(accounts.archer);
