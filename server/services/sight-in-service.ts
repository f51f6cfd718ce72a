/**
 * Sight-ins with their marks. Saving a sight-in is one transaction:
 * the sight-in row, its whole mark set (replaced on update) and the fit the math
 * core computes from them. A sight-in whose marks cannot be fitted is refused
 * with the fit's field message before anything is written; any failure while
 * writing rolls the whole save back.
 */
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '@/server/db';
import { distanceToMetres } from '@/math/units/convert';
import { ApiError, validationError } from '@/server/errors';
import { ArrowBuild, Bow, SightInMark, SightIn, type User } from '@/server/models';
import {
  sightInInputSchema,
  type MarkInput,
  type SightIn as SightInView,
  type SightInInput,
  type SightInListItem,
  type SightInUpdate,
  type StoredFit,
} from '@/shared/sight-in';
import { bowFor, sightInFor } from './bow-access';
import { fitSightIn } from './fit-service';
import { addedByNames, addedByOf } from './added-by';

/**
 * A technician on a shared bow may add marks to a sight-in but not change its
 * details or the marks already there: the update may carry only `marks`, and
 * those must start with the stored marks, unchanged.
 */
function checkAppendOnly(update: SightInUpdate, stored: SightInMark[]): void {
  const refused = ApiError.forbidden('A technician can add marks to the archer’s sight-in but cannot change or remove what is there.');
  const keys = Object.entries(update)
    .filter(([, value]) => value !== undefined)
    .map(([key]) => key);
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

async function marksOf(sightInId: number, transaction?: Transaction): Promise<SightInMark[]> {
  return SightInMark.findAll({ where: { sightInId }, order: [['position', 'ASC']], transaction });
}

function markInputOf(mark: SightInMark): MarkInput {
  return { distance: mark.distance, unit: mark.unit, scaleMm: mark.scaleMm, arrowsShot: mark.arrowsShot, note: mark.note };
}

/** The sight-in as the API sends it; with `names` (addedByNames), each mark and the sight-in say who added them. */
export function sightInOut(sightIn: SightIn, marks: SightInMark[], names?: Map<number, string>): SightInView {
  const by = (row: { addedById?: number | null }) => (names ? { addedBy: addedByOf(row, names) } : {});
  return {
    id: sightIn.id,
    bowId: sightIn.bowId,
    buildId: sightIn.buildId,
    date: sightIn.date,
    placeLabel: sightIn.placeLabel,
    altitudeM: sightIn.altitudeM,
    temperatureC: sightIn.temperatureC,
    notes: sightIn.notes,
    marks: marks.map((mark) => ({ id: mark.id, position: mark.position, ...markInputOf(mark), ...by(mark) })),
    fit: sightIn.fit as StoredFit,
    ...by(sightIn),
    createdAt: sightIn.createdAt.toISOString(),
    updatedAt: sightIn.updatedAt.toISOString(),
  };
}

/** Mark count and longest sighted distance (with its unit) of each sight-in. */
export async function markStats(
  sightInIds: number[],
): Promise<Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null }>> {
  const stats = new Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null; longestM: number }>();
  if (sightInIds.length === 0) return stats;
  const marks = await SightInMark.findAll({
    where: { sightInId: { [Op.in]: sightInIds } },
    attributes: ['sightInId', 'distance', 'unit'],
  });
  for (const mark of marks) {
    const metres = distanceToMetres(mark.distance, mark.unit);
    const entry = stats.get(mark.sightInId) ?? { markCount: 0, longestDistance: null, longestUnit: null, longestM: -1 };
    entry.markCount += 1;
    if (metres > entry.longestM) {
      entry.longestM = metres;
      entry.longestDistance = mark.distance;
      entry.longestUnit = mark.unit;
    }
    stats.set(mark.sightInId, entry);
  }
  return stats;
}

/**
 * What sightInListItems reads, when the caller has it already (the bow read
 * path, server/services/bow-read.ts): mark counts and longest marks, the
 * adders' names, the fits' warning counts (then the sight-ins need no `fit`).
 */
export type KnownListFacts = {
  stats: Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null }>;
  names: Map<number, string>;
  warningCounts: Map<number, number>;
};

/** Sight-ins as list items: no mark rows, a summary of each fit. */
export async function sightInListItems(sightIns: SightIn[], known?: KnownListFacts): Promise<SightInListItem[]> {
  const stats = known?.stats ?? (await markStats(sightIns.map((sightIn) => sightIn.id)));
  const names = known?.names ?? (await addedByNames(sightIns));
  return sightIns.map((sightIn) => {
    const stat = stats.get(sightIn.id);
    const fit = sightIn.fit as Partial<StoredFit> | null;
    const warningCount = known ? (known.warningCounts.get(sightIn.id) ?? 0) : Array.isArray(fit?.warnings) ? fit.warnings.length : 0;
    return {
      id: sightIn.id,
      bowId: sightIn.bowId,
      buildId: sightIn.buildId,
      date: sightIn.date,
      placeLabel: sightIn.placeLabel,
      altitudeM: sightIn.altitudeM,
      temperatureC: sightIn.temperatureC,
      notes: sightIn.notes,
      summary: {
        speedFps: sightIn.fitSpeedFps,
        rmsMm: sightIn.fitRmsMm,
        markCount: stat?.markCount ?? 0,
        longestDistance: stat?.longestDistance ?? null,
        longestUnit: stat?.longestUnit ?? null,
        warningCount,
      },
      addedBy: addedByOf(sightIn, names),
      createdAt: sightIn.createdAt.toISOString(),
      updatedAt: sightIn.updatedAt.toISOString(),
    };
  });
}

/** The sight-in with who added it and each mark. */
async function sightInWithNames(sightIn: SightIn, marks: SightInMark[], transaction?: Transaction): Promise<SightInView> {
  return sightInOut(sightIn, marks, await addedByNames([sightIn, ...marks], transaction));
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
 * Writes the sight-in's mark set, in entry order, replacing any it had. A mark
 * given back as it was stored keeps who added it (`stored`); the others are
 * the current user's (server/models/added-by.ts).
 */
async function replaceMarks(
  sightInId: number,
  marks: MarkInput[],
  transaction: Transaction,
  stored: SightInMark[] = [],
): Promise<SightInMark[]> {
  const unclaimed = [...stored];
  const addedByOf = (mark: MarkInput) => {
    const index = unclaimed.findIndex((old) => sameMark(markInputOf(old), mark));
    return index < 0 ? undefined : unclaimed.splice(index, 1)[0].addedById;
  };
  await SightInMark.destroy({ where: { sightInId }, transaction });
  await SightInMark.bulkCreate(
    marks.map((mark, position) => ({ ...mark, sightInId, position, addedById: addedByOf(mark) })),
    { transaction, validate: true },
  );
  return marksOf(sightInId, transaction);
}

export async function listSightIns(user: User, bowId: number): Promise<SightInListItem[]> {
  const { bow } = await bowFor(user, bowId, 'read');
  const sightIns = await SightIn.findAll({
    where: { bowId: bow.id },
    order: [
      ['date', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return sightInListItems(sightIns);
}

export async function getSightIn(user: User, id: number): Promise<SightInView> {
  const { sightIn } = await sightInFor(user, id, 'read');
  return sightInWithNames(sightIn, await marksOf(sightIn.id));
}

export async function createSightIn(user: User, bowId: number, input: SightInInput): Promise<SightInView> {
  return sequelize.transaction(async (transaction) => {
    const { bow } = await bowFor(user, bowId, 'add', { transaction });
    const build = await buildOnBow(bow, input.buildId, transaction);
    const fit = fitSightIn(bow, build, input);
    const { marks, ...fields } = input;
    const sightIn = await SightIn.create(
      { ...fields, bowId: bow.id, fit, fitSpeedFps: fit.speedFps, fitRmsMm: fit.rmsMm },
      { transaction },
    );
    return sightInWithNames(sightIn, await replaceMarks(sightIn.id, marks, transaction), transaction);
  });
}

/**
 * PATCH: merge into the stored sight-in (given marks replace the whole set),
 * re-check the whole, refit, write sight-in and marks in one transaction.
 */
export async function updateSightIn(user: User, id: number, update: SightInUpdate): Promise<SightInView> {
  return sequelize.transaction(async (transaction) => {
    const { sightIn, owner } = await sightInFor(user, id, 'add', { transaction });
    const storedMarks = await marksOf(sightIn.id, transaction);
    if (!owner) checkAppendOnly(update, storedMarks);
    const current = sightInOut(sightIn, storedMarks);
    const merged = sightInInputSchema.safeParse({
      ...current,
      marks: storedMarks.map(markInputOf),
      ...update,
    });
    if (!merged.success) throw validationError(merged.error);
    const input = merged.data;
    const build = await buildOnBow(sightIn.bow, input.buildId, transaction);
    const fit = fitSightIn(sightIn.bow, build, input);
    const { marks, ...fields } = input;
    sightIn.set({ ...fields, fit, fitSpeedFps: fit.speedFps, fitRmsMm: fit.rmsMm });
    // A changed fit is a change even when no column of the row differs.
    sightIn.changed('fit', true);
    await sightIn.save({ transaction });
    const written = update.marks ? await replaceMarks(sightIn.id, marks, transaction, storedMarks) : storedMarks;
    return sightInWithNames(sightIn, written, transaction);
  });
}

/** Deletes the sight-in; its marks and tapes go with it (foreign-key cascade). */
export async function deleteSightIn(user: User, id: number): Promise<void> {
  const { sightIn } = await sightInFor(user, id, 'change');
  await sightIn.destroy();
}
