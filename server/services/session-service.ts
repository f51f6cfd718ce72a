/**
 * Sight-in sessions with their marks. Saving a session is one transaction:
 * the session row, its whole mark set (replaced on update) and the fit the math
 * core computes from them. A session whose marks cannot be fitted is refused
 * with the fit's field message before anything is written; any failure while
 * writing rolls the whole save back.
 */
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '@/server/db';
import { ApiError, validationError } from '@/server/errors';
import { ArrowBuild, Bow, SessionMark, SightSession, type User } from '@/server/models';
import {
  sessionInputSchema,
  type MarkInput,
  type Session,
  type SessionInput,
  type SessionListItem,
  type SessionUpdate,
  type StoredFit,
} from '@/shared/session';
import { findBow } from './bow-service';
import { bowFor, type BowCapability } from './bow-access';
import { fitSession } from './fit-service';
import { addedByNames, addedByOf } from './added-by';

/** Yards → metres, exact (international yard and pound, 1959): for comparing distances only. */
const YARD_M = 0.9144;

/**
 * The session with this id (and its bow) if `user` may use `capability` on the
 * bow (default: owns it; see bow-access.ts); otherwise 404 (403 for a
 * technician asking to change or delete).
 */
export async function findOwnSession(
  user: User,
  id: number,
  transaction?: Transaction,
  capability: BowCapability = 'delete',
): Promise<SightSession & { bow: Bow }> {
  const session = await SightSession.findOne({
    where: { id },
    include: [{ model: Bow, as: 'bow' }],
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!session) throw ApiError.notFound('That sight-in session');
  await bowFor(user, session.bowId, capability, 'That sight-in session');
  return session as SightSession & { bow: Bow };
}

/**
 * A technician on a shared bow may add marks to a session but not change its
 * details or the marks already there: the update may carry only `marks`, and
 * those must start with the stored marks, unchanged.
 */
function checkAppendOnly(update: SessionUpdate, stored: SessionMark[]): void {
  const refused = ApiError.forbidden('A technician can add marks to the archer’s session but cannot change or remove what is there.');
  const keys = Object.entries(update).filter(([, value]) => value !== undefined).map(([key]) => key);
  if (keys.some((key) => key !== 'marks')) throw refused;
  const marks = update.marks ?? [];
  if (marks.length < stored.length) throw refused;
  stored.forEach((mark, index) => {
    const given = marks[index];
    const same =
      Math.abs(given.distance - mark.distance) < 1e-9 &&
      given.unit === mark.unit &&
      Math.abs(given.scaleMm - mark.scaleMm) < 1e-9 &&
      (given.arrowsShot ?? null) === (mark.arrowsShot ?? null) &&
      (given.note ?? '') === mark.note;
    if (!same) throw refused;
  });
}

/** The same mark content (distance, unit, reading, arrows, note). */
function sameMark(a: MarkInput, b: MarkInput): boolean {
  return (
    Math.abs(a.distance - b.distance) < 1e-9 &&
    a.unit === b.unit &&
    Math.abs(a.scaleMm - b.scaleMm) < 1e-9 &&
    (a.arrowsShot ?? null) === (b.arrowsShot ?? null) &&
    (a.note ?? '') === (b.note ?? '')
  );
}

async function marksOf(sessionId: number, transaction?: Transaction): Promise<SessionMark[]> {
  return SessionMark.findAll({ where: { sessionId }, order: [['position', 'ASC']], transaction });
}

function markInputOf(mark: SessionMark): MarkInput {
  return { distance: mark.distance, unit: mark.unit, scaleMm: mark.scaleMm, arrowsShot: mark.arrowsShot, note: mark.note };
}

/** The session as the API sends it; with `names` (addedByNames), each mark and the session say who added them. */
export function sessionOut(session: SightSession, marks: SessionMark[], names?: Map<number, string>): Session {
  const by = (row: { addedById?: number | null }) => (names ? { addedBy: addedByOf(row, names) } : {});
  return {
    id: session.id,
    bowId: session.bowId,
    buildId: session.buildId,
    date: session.date,
    placeLabel: session.placeLabel,
    altitudeM: session.altitudeM,
    temperatureC: session.temperatureC,
    notes: session.notes,
    marks: marks.map((mark) => ({ id: mark.id, position: mark.position, ...markInputOf(mark), ...by(mark) })),
    fit: session.fit as StoredFit,
    ...by(session),
    createdAt: session.createdAt.toISOString(),
    updatedAt: session.updatedAt.toISOString(),
  };
}

/** Mark count and longest sighted distance (with its unit) of each session. */
export async function markStats(
  sessionIds: number[],
): Promise<Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null }>> {
  const stats = new Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null; longestM: number }>();
  if (sessionIds.length === 0) return stats;
  const marks = await SessionMark.findAll({
    where: { sessionId: { [Op.in]: sessionIds } },
    attributes: ['sessionId', 'distance', 'unit'],
  });
  for (const mark of marks) {
    const metres = mark.unit === 'yd' ? mark.distance * YARD_M : mark.distance;
    const entry = stats.get(mark.sessionId) ?? { markCount: 0, longestDistance: null, longestUnit: null, longestM: -1 };
    entry.markCount += 1;
    if (metres > entry.longestM) {
      entry.longestM = metres;
      entry.longestDistance = mark.distance;
      entry.longestUnit = mark.unit;
    }
    stats.set(mark.sessionId, entry);
  }
  return stats;
}

/**
 * What sessionListItems reads, when the caller has it already (the bow read
 * path, server/services/bow-read.ts): mark counts and longest marks, the
 * adders' names, the fits' warning counts (then the sessions need no `fit`).
 */
export type KnownListFacts = {
  stats: Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null }>;
  names: Map<number, string>;
  warningCounts: Map<number, number>;
};

/** Sessions as list items: no mark rows, a summary of each fit. */
export async function sessionListItems(sessions: SightSession[], known?: KnownListFacts): Promise<SessionListItem[]> {
  const stats = known?.stats ?? (await markStats(sessions.map((session) => session.id)));
  const names = known?.names ?? (await addedByNames(sessions));
  return sessions.map((session) => {
    const stat = stats.get(session.id);
    const fit = session.fit as Partial<StoredFit> | null;
    const warningCount = known ? (known.warningCounts.get(session.id) ?? 0) : Array.isArray(fit?.warnings) ? fit.warnings.length : 0;
    return {
      id: session.id,
      bowId: session.bowId,
      buildId: session.buildId,
      date: session.date,
      placeLabel: session.placeLabel,
      altitudeM: session.altitudeM,
      temperatureC: session.temperatureC,
      notes: session.notes,
      summary: {
        speedFps: session.fitSpeedFps,
        rmsMm: session.fitRmsMm,
        markCount: stat?.markCount ?? 0,
        longestDistance: stat?.longestDistance ?? null,
        longestUnit: stat?.longestUnit ?? null,
        warningCount,
      },
      addedBy: addedByOf(session, names),
      createdAt: session.createdAt.toISOString(),
      updatedAt: session.updatedAt.toISOString(),
    };
  });
}

/** The session with who added it and each mark. */
async function sessionWithNames(session: SightSession, marks: SessionMark[], transaction?: Transaction): Promise<Session> {
  return sessionOut(session, marks, await addedByNames([session, ...marks], transaction));
}

/** The build, which must be on `bow`: a field error on buildId otherwise (also for another account's build). */
async function buildOnBow(bow: Bow, buildId: number, transaction: Transaction): Promise<ArrowBuild> {
  const build = await ArrowBuild.findOne({ where: { id: buildId, bowId: bow.id }, transaction, lock: transaction.LOCK.SHARE });
  if (!build) {
    throw ApiError.badRequest('Choose one of this bow’s arrow builds', { buildId: 'Choose one of this bow’s arrow builds' });
  }
  return build;
}

/**
 * Writes the session's mark set, in entry order, replacing any it had. A mark
 * given back as it was stored keeps who added it (`stored`); the others are
 * the current user's (server/models/added-by.ts).
 */
async function replaceMarks(sessionId: number, marks: MarkInput[], transaction: Transaction, stored: SessionMark[] = []): Promise<SessionMark[]> {
  const unclaimed = [...stored];
  const addedByOf = (mark: MarkInput) => {
    const index = unclaimed.findIndex((old) => sameMark(markInputOf(old), mark));
    return index < 0 ? undefined : unclaimed.splice(index, 1)[0].addedById;
  };
  await SessionMark.destroy({ where: { sessionId }, transaction });
  await SessionMark.bulkCreate(
    marks.map((mark, position) => ({ ...mark, sessionId, position, addedById: addedByOf(mark) })),
    { transaction, validate: true },
  );
  return marksOf(sessionId, transaction);
}

export async function listSessions(user: User, bowId: number): Promise<SessionListItem[]> {
  const bow = await findBow(user, bowId, 'read');
  const sessions = await SightSession.findAll({ where: { bowId: bow.id }, order: [['date', 'DESC'], ['id', 'DESC']] });
  return sessionListItems(sessions);
}

export async function getSession(user: User, id: number): Promise<Session> {
  const session = await findOwnSession(user, id, undefined, 'read');
  return sessionWithNames(session, await marksOf(session.id));
}

export async function createSession(user: User, bowId: number, input: SessionInput): Promise<Session> {
  return sequelize.transaction(async (transaction) => {
    const bow = await findBow(user, bowId, 'write', transaction);
    const build = await buildOnBow(bow, input.buildId, transaction);
    const fit = fitSession(bow, build, input);
    const { marks, ...fields } = input;
    const session = await SightSession.create(
      { ...fields, bowId: bow.id, fit, fitSpeedFps: fit.speedFps, fitRmsMm: fit.rmsMm },
      { transaction },
    );
    return sessionWithNames(session, await replaceMarks(session.id, marks, transaction), transaction);
  });
}

/**
 * PATCH: merge into the stored session (given marks replace the whole set),
 * re-check the whole, refit, write session and marks in one transaction.
 */
export async function updateSession(user: User, id: number, update: SessionUpdate): Promise<Session> {
  return sequelize.transaction(async (transaction) => {
    const session = await findOwnSession(user, id, transaction, 'write');
    const storedMarks = await marksOf(session.id, transaction);
    if (session.bow.userId !== user.id) checkAppendOnly(update, storedMarks);
    const current = sessionOut(session, storedMarks);
    const merged = sessionInputSchema.safeParse({
      ...current,
      marks: storedMarks.map(markInputOf),
      ...update,
    });
    if (!merged.success) throw validationError(merged.error);
    const input = merged.data;
    const build = await buildOnBow(session.bow, input.buildId, transaction);
    const fit = fitSession(session.bow, build, input);
    const { marks, ...fields } = input;
    session.set({ ...fields, fit, fitSpeedFps: fit.speedFps, fitRmsMm: fit.rmsMm });
    // A changed fit is a change even when no column of the row differs.
    session.changed('fit', true);
    await session.save({ transaction });
    const written = update.marks ? await replaceMarks(session.id, marks, transaction, storedMarks) : storedMarks;
    return sessionWithNames(session, written, transaction);
  });
}

/** Deletes the session; its marks and tapes go with it (foreign-key cascade). */
export async function deleteSession(user: User, id: number): Promise<void> {
  const session = await findOwnSession(user, id);
  await session.destroy();
}
