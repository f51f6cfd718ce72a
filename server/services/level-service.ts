/**
 * Level checks and the change log of a bow, and the bow's level state.
 * Checks are started with one row per step, worked step by step (an open check
 * can be left and resumed), and completed once every step has a result; a
 * completed check is a record and is not changed afterwards.
 *
 * The age after which a verified bow is due again is LEVEL_CHECK_MAX_AGE_DAYS
 * (whole days, default 90), one setting for the whole service.
 */
import { config } from '@/server/config';
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '@/server/db';
import { ApiError, found } from '@/server/errors';
import { BowChange, LevelCheck, LevelStep, Photo, User } from '@/server/models';
import { bowChangeFor, bowFor, levelCheckFor } from '@/server/services/bow-access';
import { photoStorage } from '@/server/storage';
import { defaultLevelMaxAgeDays, levelStatus, levelStepKeys, levelStepNames, type LevelCheckFacts } from '@/shared/level-status';
import type {
  BowChange as BowChangeJson,
  BowChangeInput,
  CheckUpdate,
  LevelCheck as LevelCheckJson,
  LevelPlace,
  LevelSummary,
  Photo as PhotoJson,
} from '@/shared/level';

/** How much a change's time may lie ahead of the server clock (devices' clocks drift). */
const clockSkewMs = 5 * 60 * 1000;

/**
 * The age limit in days: config.levelCheckMaxAgeDays (LEVEL_CHECK_MAX_AGE_DAYS), default 90.
 * Read on every call so tests can change the variable. Example: with LEVEL_CHECK_MAX_AGE_DAYS=60 → 60
 */
export function levelMaxAgeDays(): number {
  const raw = process.env.LEVEL_CHECK_MAX_AGE_DAYS;
  if (raw === undefined || raw === '') return config.levelCheckMaxAgeDays ?? defaultLevelMaxAgeDays;
  const days = Number(raw);
  if (!Number.isInteger(days) || days < 1) throw new Error(`LEVEL_CHECK_MAX_AGE_DAYS must be a whole number of days >= 1, got "${raw}"`);
  return days;
}

// ---- JSON shapes ----

const person = (user: User | null | undefined) => (user ? { id: user.id, name: user.name } : { id: 0, name: 'A former account' });

export function photoJson(photo: Photo): PhotoJson {
  return { id: photo.id, url: `/api/photos/${photo.id}`, mimeType: photo.mimeType, sizeBytes: photo.sizeBytes };
}

function checkJson(check: LevelCheck): LevelCheckJson {
  const steps = [...(check.steps ?? [])].sort((a, b) => levelStepKeys.indexOf(a.step) - levelStepKeys.indexOf(b.step));
  return {
    id: check.id,
    bowId: check.bowId,
    performedBy: person(check.performer),
    place: check.place,
    status: check.status,
    startedAt: check.startedAt.toISOString(),
    completedAt: check.completedAt ? check.completedAt.toISOString() : null,
    note: check.note,
    steps: steps.map((step) => ({
      step: step.step,
      result: step.result,
      reading: step.reading,
      readingUnit: step.readingUnit,
      adjustment: step.adjustment,
      photo: step.photo ? photoJson(step.photo) : null,
      updatedAt: step.updatedAt.toISOString(),
    })),
  };
}

function changeJson(change: BowChange): BowChangeJson {
  return {
    id: change.id,
    bowId: change.bowId,
    kind: change.kind,
    changedAt: change.changedAt.toISOString(),
    note: change.note,
    loggedBy: person(change.loggedBy),
    createdAt: change.createdAt.toISOString(),
  };
}

const checkIncludes = [
  { model: LevelStep, as: 'steps', include: [{ model: Photo, as: 'photo' }] },
  { model: User, as: 'performer', attributes: ['id', 'name'] },
];
const changeIncludes = [{ model: User, as: 'loggedBy', attributes: ['id', 'name'] }];

// ---- The level state ----

/**
 * What levelSummaryForBows reads, when the caller has it already (the bow read
 * path, server/services/bow-read.ts, gets it in its one query): the bows'
 * checks in levelStatus's order, the steps of each bow's last complete check,
 * the people who did the checks, the changes (oldest first) with who logged them.
 */
export type LevelFacts = {
  checks: Pick<LevelCheck, 'id' | 'bowId' | 'userId' | 'place' | 'status' | 'startedAt' | 'completedAt'>[];
  steps: { checkId: number; step: string; result: string }[];
  performers: { id: number; name: string }[];
  changes: {
    id: number;
    bowId: number;
    kind: string;
    changedAt: Date;
    note: string;
    createdAt: Date;
    loggedBy: { id: number; name: string } | null;
  }[];
};

/**
 * The level summary of each bow (no access check: callers pass bows the user
 * may read). Three queries whatever the number of bows, none when `facts` are given.
 * Example: (await levelSummaryForBows([3, 4])).get(3)?.state → 'verified'
 */
export async function levelSummaryForBows(
  bowIds: readonly number[],
  now = new Date(),
  facts?: LevelFacts,
): Promise<Map<number, LevelSummary>> {
  const ids = [...new Set(bowIds)];
  const summaries = new Map<number, LevelSummary>();
  if (ids.length === 0) return summaries;
  const maxAgeDays = levelMaxAgeDays();

  const checks =
    (facts?.checks as LevelCheck[] | undefined) ??
    (await LevelCheck.findAll({
      where: { bowId: { [Op.in]: ids } },
      attributes: ['id', 'bowId', 'userId', 'place', 'status', 'startedAt', 'completedAt'],
      // The same order as levelStatus's "last completed" rule: latest completion, then start, then id.
      order: [
        ['completedAt', 'DESC'],
        ['startedAt', 'DESC'],
        ['id', 'DESC'],
      ],
    }));
  const lastByBow = new Map<number, LevelCheck>();
  const openByBow = new Map<number, number>();
  for (const check of checks) {
    if (check.status === 'complete' && check.completedAt && !lastByBow.has(check.bowId)) lastByBow.set(check.bowId, check);
    if (check.status === 'open') openByBow.set(check.bowId, Math.max(openByBow.get(check.bowId) ?? 0, check.id));
  }
  const lastIds = [...lastByBow.values()].map((c) => c.id);
  const [steps, performers, changes] = facts
    ? [facts.steps as LevelStep[], facts.performers as User[], facts.changes as unknown as BowChange[]]
    : await Promise.all([
        lastIds.length ? LevelStep.findAll({ where: { checkId: { [Op.in]: lastIds } }, attributes: ['checkId', 'step', 'result'] }) : [],
        User.findAll({
          where: { id: { [Op.in]: [...lastByBow.values()].map((c) => c.userId).filter((id): id is number => id !== null) } },
          attributes: ['id', 'name'],
        }),
        BowChange.findAll({
          where: { bowId: { [Op.in]: ids } },
          include: changeIncludes,
          order: [
            ['changedAt', 'ASC'],
            ['id', 'ASC'],
          ],
        }),
      ]);

  for (const bowId of ids) {
    const last = lastByBow.get(bowId);
    const facts: LevelCheckFacts[] = last
      ? [
          {
            id: last.id,
            startedAt: last.startedAt,
            completedAt: last.completedAt,
            steps: steps.filter((s) => s.checkId === last.id).map((s) => ({ step: s.step, result: s.result })),
          },
        ]
      : [];
    const bowChanges = changes.filter((c) => c.bowId === bowId);
    const status = levelStatus({
      checks: facts,
      changes: bowChanges.map((c) => ({ id: c.id, kind: c.kind, changedAt: c.changedAt })),
      now,
      maxAgeDays,
    });
    const sinceIds = new Set(status.changesSinceIds);
    summaries.set(bowId, {
      state: status.state,
      reason: status.reason,
      lastCheck: last
        ? {
            id: last.id,
            place: last.place,
            startedAt: last.startedAt.toISOString(),
            completedAt: last.completedAt!.toISOString(),
            performedBy: person(performers.find((u) => u.id === last.userId)),
          }
        : null,
      changesSince: bowChanges.filter((c) => sinceIds.has(c.id)).map(changeJson),
      openCheckId: openByBow.get(bowId) ?? null,
      ageDays: status.ageDays,
      maxAgeDays,
      rangeConfirmed: status.rangeConfirmed,
    });
  }
  return summaries;
}

/** GET /api/bows/:bowId/level */
export async function levelForBow(user: User, bowId: number): Promise<LevelSummary> {
  await bowFor(user, bowId, 'read');
  return (await levelSummaryForBows([bowId])).get(bowId)!;
}

// ---- Checks ----

async function loadCheck(id: number, transaction?: Transaction): Promise<LevelCheck | null> {
  return LevelCheck.findByPk(id, { include: checkIncludes, transaction });
}

/** A check the user may work on: on a bow they may add to, theirs, still open; else 404, 403 or 409. */
async function workableCheck(user: User, id: number): Promise<LevelCheck> {
  const { check } = await levelCheckFor(user, id, 'add', { include: checkIncludes });
  if (check.userId !== user.id) throw ApiError.forbidden('Only the person who started this check can work on it.');
  if (check.status !== 'open') throw ApiError.conflict('This check is completed; start a new check to record another.');
  return check;
}

/** GET /api/bows/:bowId/checks: newest first, open ones included. */
export async function listChecks(user: User, bowId: number): Promise<LevelCheckJson[]> {
  await bowFor(user, bowId, 'read');
  const checks = await LevelCheck.findAll({
    where: { bowId },
    include: checkIncludes,
    order: [
      ['startedAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return checks.map(checkJson);
}

/**
 * POST /api/bows/:bowId/checks: a new open check with its five steps. A bow
 * has at most one open check per person (resume it, or discard it first).
 */
export async function startCheck(user: User, bowId: number, place: LevelPlace, now = new Date()): Promise<LevelCheckJson> {
  await bowFor(user, bowId, 'add');
  const id = await sequelize.transaction(async (transaction) => {
    const open = await LevelCheck.findOne({
      where: { bowId, userId: user.id, status: 'open' },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (open) {
      throw ApiError.conflict(`You have a check of this bow in progress (check ${open.id}); resume it or discard it first.`, {
        openCheckId: String(open.id),
      });
    }
    const check = await LevelCheck.create({ bowId, userId: user.id, place, startedAt: now, completedAt: null }, { transaction });
    await LevelStep.bulkCreate(
      levelStepKeys.map((step) => ({ checkId: check.id, step, result: null, reading: null, readingUnit: null, photoId: null })),
      { transaction },
    );
    return check.id;
  });
  return checkJson(found(await loadCheck(id), 'That level check'));
}

/** GET /api/checks/:id */
export async function getCheck(user: User, id: number): Promise<LevelCheckJson> {
  return checkJson((await levelCheckFor(user, id, 'read', { include: checkIncludes })).check);
}

/**
 * PATCH /api/checks/:id: save step results (each given step is replaced as a
 * whole), the note or the place, and with `complete: true` finish the check.
 */
export async function updateCheck(user: User, id: number, update: CheckUpdate, now = new Date()): Promise<LevelCheckJson> {
  const check = await workableCheck(user, id);
  await sequelize.transaction(async (transaction) => {
    for (const step of update.steps ?? []) {
      await LevelStep.update(
        {
          result: step.result,
          reading: step.reading,
          readingUnit: step.reading === null ? null : step.readingUnit,
          adjustment: step.adjustment,
        },
        { where: { checkId: check.id, step: step.step }, transaction },
      );
    }
    if (update.note !== undefined) check.note = update.note;
    if (update.place !== undefined) check.place = update.place;
    if (update.complete) {
      const steps = await LevelStep.findAll({ where: { checkId: check.id }, transaction });
      const missing = levelStepKeys.filter((key) => !steps.find((s) => s.step === key)?.result);
      if (missing.length > 0) {
        const fields = Object.fromEntries(
          missing.map((key) => [`steps.${key}`, `Choose a result for the ${levelStepNames[key]} (or skip it)`]),
        );
        throw ApiError.badRequest(
          `Give every step a result before completing: the ${missing.map((key) => levelStepNames[key]).join(', ')} ${missing.length === 1 ? 'has' : 'have'} none.`,
          fields,
        );
      }
      check.status = 'complete';
      check.completedAt = now;
    }
    await check.save({ transaction });
  });
  return checkJson(found(await loadCheck(check.id), 'That level check'));
}

/** DELETE /api/checks/:id: discard an open check (a completed one stays on record). */
export async function discardCheck(user: User, id: number): Promise<void> {
  const check = await workableCheck(user, id);
  const photos = (check.steps ?? []).map((s) => s.photo).filter((p): p is Photo => Boolean(p));
  await check.destroy();
  for (const photo of photos) {
    await photo.destroy();
    await photoStorage.remove(photo.storageKey);
  }
}

/** For the photo service: the open check and step the user may attach a photo to. */
export async function workableStep(user: User, checkId: number, step: string): Promise<{ check: LevelCheck; step: LevelStep }> {
  const check = await workableCheck(user, checkId);
  const row = (check.steps ?? []).find((s) => s.step === step);
  if (!row) throw ApiError.notFound('That step');
  return { check, step: row };
}

// ---- Changes ----

/** GET /api/bows/:bowId/changes: newest first. */
export async function listChanges(user: User, bowId: number): Promise<BowChangeJson[]> {
  await bowFor(user, bowId, 'read');
  const changes = await BowChange.findAll({
    where: { bowId },
    include: changeIncludes,
    order: [
      ['changedAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return changes.map(changeJson);
}

/** POST /api/bows/:bowId/changes: log a change; returns it and the bow's new level state. */
export async function logChange(user: User, bowId: number, input: BowChangeInput, now = new Date()) {
  await bowFor(user, bowId, 'add');
  const changedAt = new Date(input.changedAt);
  if (changedAt.getTime() > now.getTime() + clockSkewMs) {
    throw ApiError.badRequest('The change cannot be in the future.', { changedAt: 'The change cannot be in the future' });
  }
  const change = await BowChange.create({ bowId, userId: user.id, kind: input.kind, changedAt, note: input.note });
  const loaded = found(await BowChange.findByPk(change.id, { include: changeIncludes }), 'That change');
  return { change: changeJson(loaded), level: (await levelSummaryForBows([bowId], now)).get(bowId)! };
}

/** DELETE /api/changes/:id: only the person who logged it (a technician too: 'add' in bow-access.ts). */
export async function deleteChange(user: User, id: number): Promise<void> {
  const { change } = await bowChangeFor(user, id, 'add');
  if (change.userId !== user.id) throw ApiError.forbidden('Only the person who logged this change can delete it.');
  await change.destroy();
}
