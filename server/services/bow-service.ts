/**
 * Bows: list with the Bench's readiness, read with everything hanging off it,
 * create, update, delete. Owner-scoped: another account's bow is "not found".
 */
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '@/server/db';
import { ApiError, validationError } from '@/server/errors';
import { ArrowBuild, Bow, BowChange, SightSession, Tape, User } from '@/server/models';
import {
  bowInputSchema,
  type Bow as BowOut,
  type BowDetail,
  type BowInput,
  type BowReadiness,
  type BowSummary,
  type BowUpdate,
} from '@/shared/bow';
import { buildOut, sessionCounts } from './build-service';
import { addedByNames } from './added-by';
import { markStats, sessionListItems } from './session-service';
import { tapeOut } from './tape-service';
import { levelSummaryForBows } from './level-service';
import { photoKeysOfBow, removeStoredPhotos } from './photo-service';
import { bowFor, type BowCapability } from './bow-access';
import { stalenessForBows } from './staleness-service';

/**
 * The bow with this id if `user` may use `capability` on it (bow-access.ts:
 * read and write for its owner and a technician it is shared with, delete for
 * its owner only); otherwise 404 when they cannot see it (never 403, so ids do
 * not leak), 403 for a technician asking to change or delete.
 */
export async function findBow(user: User, id: number, capability: BowCapability, transaction?: Transaction): Promise<Bow> {
  await bowFor(user, id, capability);
  const bow = await Bow.findOne({ where: { id }, transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
  if (!bow) throw ApiError.notFound('That bow');
  return bow;
}

/** The bow with this id if `user` owns it; otherwise 404 (403 for a technician it is shared with). */
export async function findOwnBow(user: User, id: number, transaction?: Transaction): Promise<Bow> {
  return findBow(user, id, 'delete', transaction);
}

export function bowOut(bow: Bow): BowOut {
  return {
    id: bow.id,
    userId: bow.userId,
    nickname: bow.nickname,
    hand: bow.hand,
    drawWeightLb: bow.drawWeightLb,
    drawLengthMm: bow.drawLengthMm,
    letOffPct: bow.letOffPct,
    ratedSpeedFps: bow.ratedSpeedFps,
    sightDescription: bow.sightDescription,
    sightKind: bow.sightKind,
    sightRadiusMm: bow.sightRadiusMm,
    peepHeightMm: bow.peepHeightMm,
    scaleDirection: bow.scaleDirection,
    tapeWidthMm: bow.tapeWidthMm,
    pinDistances: bow.pinDistances,
    pinDistanceUnit: bow.pinDistanceUnit,
    notes: bow.notes,
    createdAt: bow.createdAt.toISOString(),
    updatedAt: bow.updatedAt.toISOString(),
  };
}

/** Readiness of each bow in `bows`, in a fixed number of queries whatever the count. */
async function readinessOf(bows: Bow[]): Promise<Map<number, BowReadiness>> {
  const bowIds = bows.map((bow) => bow.id);
  const result = new Map<number, BowReadiness>();
  if (bowIds.length === 0) return result;
  const [builds, sessions, tapes, levels, staleness] = await Promise.all([
    ArrowBuild.findAll({ where: { bowId: { [Op.in]: bowIds } }, attributes: ['id', 'bowId'] }),
    SightSession.findAll({
      where: { bowId: { [Op.in]: bowIds } },
      attributes: ['id', 'bowId', 'date', 'fitRmsMm'],
      order: [['date', 'DESC'], ['id', 'DESC']],
    }),
    Tape.findAll({
      attributes: ['id'],
      include: [{ model: SightSession, as: 'session', attributes: ['bowId'], where: { bowId: { [Op.in]: bowIds } } }],
    }),
    levelSummaryForBows(bowIds),
    stalenessForBows(bowIds),
  ]);
  const latest = new Map<number, SightSession>();
  for (const session of sessions) if (!latest.has(session.bowId)) latest.set(session.bowId, session);
  const stats = await markStats([...latest.values()].map((session) => session.id));
  for (const bow of bows) {
    const session = latest.get(bow.id);
    const markStat = session ? stats.get(session.id) : undefined;
    result.set(bow.id, {
      latestSession: session
        ? {
            id: session.id,
            date: session.date,
            rmsMm: session.fitRmsMm,
            markCount: markStat?.markCount ?? 0,
            longestDistance: markStat?.longestDistance ?? null,
            longestUnit: markStat?.longestUnit ?? null,
          }
        : null,
      buildCount: builds.filter((build) => build.bowId === bow.id).length,
      sessionCount: sessions.filter((s) => s.bowId === bow.id).length,
      hasTape: tapes.some((tape) => (tape as Tape & { session: SightSession }).session.bowId === bow.id),
      level: levels.get(bow.id) ?? null,
      confirm: staleness.get(bow.id)?.confirm ?? null,
    });
  }
  return result;
}

/** GET /api/bows: the account's bows, oldest first, each with its readiness. */
export async function listBows(user: User): Promise<BowSummary[]> {
  const bows = await Bow.findAll({ where: { userId: user.id }, order: [['id', 'ASC']] });
  const readiness = await readinessOf(bows);
  return bows.map((bow) => ({ ...bowOut(bow), readiness: readiness.get(bow.id)! }));
}

/** GET /api/bows/:id: the bow, its owner's name, its builds, its sessions (newest first, with fit summaries) and its tapes. */
export async function getBow(user: User, id: number): Promise<BowDetail> {
  const bow = await findBow(user, id, 'read');
  const [owner, readiness, builds, sessions, tapes] = await Promise.all([
    bow.userId === user.id ? user : User.findByPk(bow.userId, { attributes: ['id', 'name'] }),
    readinessOf([bow]),
    ArrowBuild.findAll({ where: { bowId: bow.id }, order: [['id', 'ASC']] }),
    SightSession.findAll({ where: { bowId: bow.id }, order: [['date', 'DESC'], ['id', 'DESC']] }),
    Tape.findAll({
      include: [{ model: SightSession, as: 'session', attributes: ['bowId'], where: { bowId: bow.id } }],
      order: [['id', 'ASC']],
    }),
  ]);
  const counts = await sessionCounts(builds.map((build) => build.id));
  const names = await addedByNames(builds);
  return {
    ...bowOut(bow),
    ownerName: owner?.name ?? '',
    readiness: readiness.get(bow.id)!,
    builds: builds.map((build) => buildOut(build, counts.get(build.id) ?? 0, names)),
    sessions: await sessionListItems(sessions),
    tapes: tapes.map((tape) => tapeOut(tape, bow.id)),
  };
}

export async function createBow(user: User, input: BowInput): Promise<BowOut> {
  const bow = await Bow.create({ ...input, userId: user.id });
  return bowOut(bow);
}

/**
 * PATCH: merge the change into the stored bow and check the whole with
 * bowInputSchema (so cross-field rules hold after a partial update).
 * Saved sessions keep the fit they were saved with; re-save a session to refit
 * it with a new sight radius or peep height.
 */
export async function updateBow(user: User, id: number, update: BowUpdate): Promise<BowOut> {
  return sequelize.transaction(async (transaction) => {
    const bow = await findOwnBow(user, id, transaction);
    const merged = bowInputSchema.safeParse({ ...bowOut(bow), ...update });
    if (!merged.success) throw validationError(merged.error);
    const moved = impactEdits(bow, merged.data);
    bow.set(merged.data);
    await bow.save({ transaction });
    // An edit of the peep height or sight radius moves the point of impact: logged as a change (shared/staleness.ts).
    for (const change of moved) await BowChange.create({ bowId: bow.id, userId: user.id, changedAt: new Date(), ...change }, { transaction });
    return bowOut(bow);
  });
}

/**
 * The bow-form edits that move the point of impact (peep height, sight radius),
 * as changes to log; a difference under 0.05 mm is rounding through inches, not an edit.
 * Example: impactEdits({ peepHeightMm: 110, sightRadiusMm: 840 }, { peepHeightMm: 113, sightRadiusMm: 840 })
 *   → [{ kind: 'peep', note: 'Peep height edited on the bow: 110 → 113 mm' }]
 */
export function impactEdits(before: Pick<BowInput, 'peepHeightMm' | 'sightRadiusMm'>, after: Pick<BowInput, 'peepHeightMm' | 'sightRadiusMm'>) {
  const edits: Array<{ kind: 'peep' | 'sight-radius'; note: string }> = [];
  const mm = (value: number) => Number(value.toFixed(1));
  if (Math.abs(before.peepHeightMm - after.peepHeightMm) > 0.05) {
    edits.push({ kind: 'peep', note: `Peep height edited on the bow: ${mm(before.peepHeightMm)} → ${mm(after.peepHeightMm)} mm` });
  }
  if (Math.abs(before.sightRadiusMm - after.sightRadiusMm) > 0.05) {
    edits.push({ kind: 'sight-radius', note: `Sight radius edited on the bow: ${mm(before.sightRadiusMm)} → ${mm(after.sightRadiusMm)} mm` });
  }
  return edits;
}

/** Deletes the bow; its builds, sessions, marks and tapes go with it (foreign-key cascade, migrations 0011–0014). */
export async function deleteBow(user: User, id: number): Promise<void> {
  const bow = await findOwnBow(user, id);
  const photoKeys = await photoKeysOfBow(bow.id); // the cascade removes photo rows; their files go after
  await bow.destroy();
  await removeStoredPhotos(photoKeys);
}
