/**
 * Tuning records of a bow: the set-up entries (shared/setup-measures.ts), the
 * paper-tune runs and their shots (shared/paper-tune.ts), and "marks
 * confirmed at the range" on a sight-in. Access through bow-access.ts: the
 * archer and a technician with an active share read and add; entries are never
 * edited or deleted here (a record stays as history). A set-up entry that
 * differs from the last one, and a paper-tune shot that records a change
 * before it, log a bow change (level-service's change log), so the level
 * check becomes due and the staleness rule (shared/staleness.ts) asks for the
 * marks to be confirmed at the range.
 *
 * Example: await addSetupEntry(marit, 12, { measure: 'd-loop', valueMm: 106, choice: null, measuredOn: '2026-12-02', note: '' })
 */
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '@/server/db';
import { ApiError, found } from '@/server/errors';
import { ArrowBuild, BowChange, PaperTuneRun, PaperTuneShot, RangeConfirmation, SetupEntry, User } from '@/server/models';
import { bowFor, paperTuneRunFor, sightInFor } from '@/server/services/bow-access';
import type { BowChangeKind } from '@/shared/level-status';
import {
  entryDiffers,
  setupMeasures,
  setupValueWords,
  type SetupEntry as SetupEntryJson,
  type SetupEntryInput,
  type SetupList,
} from '@/shared/setup-measures';
import {
  tuneAdjustmentNames,
  type PaperTuneEnd,
  type PaperTuneRun as PaperTuneRunJson,
  type PaperTuneShotInput,
  type PaperTuneStart,
} from '@/shared/paper-tune';
import { tearNames } from '@/shared/paper-tune-rules';

/** How much a date may lie ahead of the server clock (devices' clocks and zones differ). */
const aheadMs = 14 * 60 * 60 * 1000;

export const personJson = (user: User | null | undefined) =>
  user ? { id: user.id, name: user.name } : { id: 0, name: 'A former account' };
// Fresh include objects each time: Sequelize annotates the ones it is given.
const byIncludes = () => [{ model: User, as: 'addedBy', attributes: ['id', 'name'] }];

/**
 * The moment a change dated `isoDate` is taken to have happened: now when the
 * date is today or later (within clock allowance), else the end of that day
 * (UTC) — when in doubt, a change counts as after a sight-in of that day.
 */
export function changeMoment(isoDate: string, now: Date): Date {
  const endOfDay = new Date(`${isoDate}T23:59:59.999Z`);
  return endOfDay.getTime() < now.getTime() ? endOfDay : now;
}

function checkNotFuture(isoDate: string, now: Date, field: string) {
  if (new Date(`${isoDate}T00:00:00Z`).getTime() > now.getTime() + aheadMs) {
    throw ApiError.badRequest('The date cannot be in the future.', { [field]: 'The date cannot be in the future' });
  }
}

// ---- Set-up entries ----

function entryJson(entry: SetupEntry, ownerId: number): SetupEntryJson {
  return {
    id: entry.id,
    bowId: entry.bowId,
    measure: entry.measure,
    valueMm: entry.valueMm,
    choice: entry.choice,
    measuredOn: entry.measuredOn,
    note: entry.note,
    addedBy: personJson(entry.addedBy),
    byTechnician: entry.userId !== ownerId,
    changeId: entry.changeId,
    createdAt: entry.createdAt.toISOString(),
  };
}

/** GET /api/bows/:bowId/setup: every entry, newest first, and the latest of each measure. */
export async function listSetup(user: User, bowId: number): Promise<SetupList> {
  const { bow } = await bowFor(user, bowId, 'read');
  const entries = await SetupEntry.findAll({
    where: { bowId },
    include: byIncludes(),
    order: [
      ['measuredOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  const latest: SetupList['latest'] = {};
  for (const entry of entries) if (!latest[entry.measure]) latest[entry.measure] = entryJson(entry, bow.userId);
  return { entries: entries.map((e) => entryJson(e, bow.userId)), latest };
}

/**
 * POST /api/bows/:bowId/setup: a new entry (the archer's or a technician's).
 * When it is the newest of its measure and differs from the one before, it
 * logs a change of the kind the measure stands for.
 */
export async function addSetupEntry(
  user: User,
  bowId: number,
  input: SetupEntryInput,
  now = new Date(),
): Promise<{ entry: SetupEntryJson }> {
  const { bow } = await bowFor(user, bowId, 'add');
  checkNotFuture(input.measuredOn, now, 'measuredOn');
  const spec = setupMeasures[input.measure];
  const id = await sequelize.transaction(async (transaction) => {
    const previous = await SetupEntry.findOne({
      where: { bowId, measure: input.measure },
      order: [
        ['measuredOn', 'DESC'],
        ['id', 'DESC'],
      ],
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    let changeId: number | null = null;
    if (spec.changeKind && previous && input.measuredOn >= previous.measuredOn && entryDiffers(previous, input)) {
      const change = await BowChange.create(
        {
          bowId,
          userId: user.id,
          kind: spec.changeKind,
          changedAt: changeMoment(input.measuredOn, now),
          note: `${spec.name}: ${setupValueWords(previous, 'mm')} → ${setupValueWords(input, 'mm')} (set-up entry)${input.note ? `; ${input.note}` : ''}`.slice(
            0,
            500,
          ),
        },
        { transaction },
      );
      changeId = change.id;
    }
    const entry = await SetupEntry.create({ bowId, userId: user.id, ...input, changeId }, { transaction });
    return entry.id;
  });
  return { entry: entryJson(found(await SetupEntry.findByPk(id, { include: byIncludes() }), 'That set-up entry'), bow.userId) };
}

/** The latest rest kind and cam system of each bow (for the paper-tune advice and exports). */
export async function latestSetupOf(bowId: number, transaction?: Transaction) {
  const entries = await SetupEntry.findAll({
    where: { bowId },
    order: [
      ['measuredOn', 'DESC'],
      ['id', 'DESC'],
    ],
    transaction,
  });
  const latest = new Map<string, SetupEntry>();
  for (const entry of entries) if (!latest.has(entry.measure)) latest.set(entry.measure, entry);
  return latest;
}

// ---- Paper tuning ----

const adjustmentChangeKinds: Record<Exclude<PaperTuneShotInput['changedBefore'], 'none'>, BowChangeKind> = {
  'nock-height': 'nock-height',
  rest: 'rest',
  cams: 'cams',
  string: 'string',
  'd-loop': 'd-loop',
  other: 'other',
};

function runJson(run: PaperTuneRun, ownerId: number): PaperTuneRunJson {
  const shots = [...(run.shots ?? [])].sort((a, b) => a.position - b.position);
  return {
    id: run.id,
    bowId: run.bowId,
    buildId: run.buildId,
    distance: run.distance,
    unit: run.unit,
    startedOn: run.startedOn,
    outcome: run.outcome,
    endedAt: run.endedAt ? run.endedAt.toISOString() : null,
    note: run.note,
    endNote: run.endNote,
    addedBy: personJson(run.addedBy),
    byTechnician: run.userId !== ownerId,
    createdAt: run.createdAt.toISOString(),
    shots: shots.map((shot) => ({
      id: shot.id,
      position: shot.position,
      tear: shot.tear,
      lengthMm: shot.lengthMm,
      arrows: shot.arrows,
      note: shot.note,
      changedBefore: shot.changedBefore,
      changeNote: shot.changeNote,
      addedBy: personJson(shot.addedBy),
      createdAt: shot.createdAt.toISOString(),
    })),
  };
}

const runIncludes = () => [...byIncludes(), { model: PaperTuneShot, as: 'shots', include: byIncludes() }];

/** GET /api/bows/:bowId/paper-tunes: newest first. */
export async function listRuns(user: User, bowId: number): Promise<PaperTuneRunJson[]> {
  const { bow } = await bowFor(user, bowId, 'read');
  const runs = await PaperTuneRun.findAll({
    where: { bowId },
    include: runIncludes(),
    order: [
      ['startedOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return runs.map((run) => runJson(run, bow.userId));
}

/** A run the user may add to: theirs (who started it works it, as with level checks) and still open. */
async function workableRun(user: User, id: number) {
  const loaded = await paperTuneRunFor(user, id, 'add', { include: runIncludes() });
  if (loaded.run.userId !== user.id)
    throw ApiError.forbidden('Only the person who started this paper-tune run can add to it; start a run of your own.');
  if (loaded.run.outcome !== 'open') throw ApiError.conflict('This run has ended; start a new run to shoot more paper.');
  return loaded;
}

/** GET /api/paper-tunes/:id */
export async function getRun(user: User, id: number): Promise<PaperTuneRunJson> {
  const { run, bow } = await paperTuneRunFor(user, id, 'read', { include: runIncludes() });
  return runJson(run, bow.userId);
}

/** POST /api/bows/:bowId/paper-tunes */
export async function startRun(user: User, bowId: number, input: PaperTuneStart, now = new Date()): Promise<PaperTuneRunJson> {
  await bowFor(user, bowId, 'add');
  checkNotFuture(input.startedOn, now, 'startedOn');
  if (input.buildId !== null) {
    const build = await ArrowBuild.findOne({ where: { id: input.buildId, bowId }, attributes: ['id'] });
    if (!build) throw ApiError.badRequest('That arrow build is not one of this bow’s.', { buildId: 'Choose one of this bow’s builds' });
  }
  const run = await PaperTuneRun.create({ bowId, userId: user.id, ...input });
  return getRun(user, run.id);
}

/** POST /api/paper-tunes/:id/shots: one more shot; a change recorded before it is logged on the bow. */
export async function addShot(user: User, runId: number, input: PaperTuneShotInput, now = new Date()): Promise<PaperTuneRunJson> {
  const { run } = await workableRun(user, runId);
  await sequelize.transaction(async (transaction) => {
    const count = await PaperTuneShot.count({ where: { runId }, transaction });
    let changeId: number | null = null;
    if (input.changedBefore !== 'none') {
      const change = await BowChange.create(
        {
          bowId: run.bowId,
          userId: user.id,
          kind: adjustmentChangeKinds[input.changedBefore],
          changedAt: now,
          note: `Paper tune, before shot ${count + 1}: ${tuneAdjustmentNames[input.changedBefore]}${input.changeNote ? ` — ${input.changeNote}` : ''}`.slice(
            0,
            500,
          ),
        },
        { transaction },
      );
      changeId = change.id;
    }
    await PaperTuneShot.create({ runId, userId: user.id, position: count, ...input, changeId }, { transaction });
  });
  return getRun(user, runId);
}

/** POST /api/paper-tunes/:id/end: clean, or left for the pro shop. */
export async function endRun(user: User, runId: number, input: PaperTuneEnd, now = new Date()): Promise<PaperTuneRunJson> {
  const { run } = await workableRun(user, runId);
  const shots = run.shots ?? [];
  if (input.outcome === 'clean') {
    const last = [...shots].sort((a, b) => b.position - a.position)[0];
    if (!last || last.tear !== 'clean') {
      throw ApiError.badRequest(
        `A run ends clean on a clean hole; the last shot was ${last ? tearNames[last.tear].toLowerCase() : 'not recorded'}. Shoot again, or leave it for the pro shop.`,
        { outcome: 'The last shot is not a clean hole' },
      );
    }
  }
  run.outcome = input.outcome;
  run.endNote = input.note;
  run.endedAt = now;
  await run.save();
  return getRun(user, runId);
}

// ---- Confirming a sight-in's marks at the range ----

/** POST /api/sight-ins/:id/confirm-range: the marks were shot again at the range and held. */
export async function confirmAtRange(user: User, sightInId: number, note: string, now = new Date()) {
  await sightInFor(user, sightInId, 'add');
  const confirmation = await RangeConfirmation.create({ sightInId, userId: user.id, confirmedAt: now, note });
  return { id: confirmation.id, sightInId, confirmedAt: now.toISOString(), note, confirmedBy: personJson(user) };
}

/** The confirmations of some sight-ins, oldest first. */
export async function confirmationsOf(sightInIds: number[]) {
  if (sightInIds.length === 0) return [];
  return RangeConfirmation.findAll({
    where: { sightInId: { [Op.in]: sightInIds } },
    include: [{ model: User, as: 'confirmedBy', attributes: ['id', 'name'] }],
    order: [
      ['confirmedAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
}
