/**
 * Bows: list with the Bench's readiness, read with everything hanging off it,
 * create, update, delete. Owner-scoped: another account's bow is "not found"
 * (bow-access.ts). The aggregator over the record services (builds,
 * sight-ins, tapes, level, staleness): none of them imports this module.
 */
import { sequelize } from '@/server/db';
import { ApiError, validationError } from '@/server/errors';
import { ArrowBuild, Bow, BowChange, SightIn, Tape, User } from '@/server/models';
import { bowInputSchema, type Bow as BowOut, type BowInput, type BowReadiness, type BowSummary, type BowUpdate } from '@/shared/bow';
import type { BowDetail } from '@/shared/bow-detail';
import { buildOut } from './build-service';
import { sightInListItems } from './sight-in-service';
import { tapeOut } from './tape-service';
import { levelSummaryForBows, type LevelFacts } from './level-service';
import { photoKeysOfBow, removeStoredPhotos } from './photo-service';
import { bowFor } from './bow-access';
import { stalenessForBows, type StalenessFacts } from './staleness-service';
import { readBowFacts, type BowFacts } from './bow-read';

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

/**
 * Readiness of each bow from its facts (bow-read.ts): no further query but
 * the level and staleness rules, which read the same facts.
 */
async function readinessFrom(all: BowFacts[]): Promise<Map<number, BowReadiness>> {
  const result = new Map<number, BowReadiness>();
  if (all.length === 0) return result;
  const ids = all.map((facts) => facts.bow.id);
  const levelFacts: LevelFacts = { checks: [], steps: [], performers: [], changes: [] };
  const stale: StalenessFacts = { sightIns: [], changes: [], builds: [], confirmations: [], tapes: [] };
  const performers = new Map<number, { id: number; name: string }>();
  for (const facts of all) {
    levelFacts.checks.push(...facts.checks);
    levelFacts.steps.push(...facts.steps);
    levelFacts.changes.push(...facts.changes);
    for (const person of facts.performers) performers.set(person.id, person);
    stale.sightIns.push(...facts.sightIns);
    stale.changes.push(...facts.changes);
    stale.builds.push(...facts.builds);
    stale.confirmations.push(...facts.confirmations);
    stale.tapes.push(...facts.tapes);
  }
  levelFacts.performers = [...performers.values()];
  // The orders the rules read: checks by completion, start, id (nulls last); changes oldest first; tapes newest first.
  const time = (date: Date | null) => (date ? date.getTime() : -Infinity);
  levelFacts.checks.sort((x, y) => time(y.completedAt) - time(x.completedAt) || time(y.startedAt) - time(x.startedAt) || y.id - x.id);
  levelFacts.changes.sort((x, y) => x.changedAt.getTime() - y.changedAt.getTime() || x.id - y.id);
  stale.tapes = [...stale.tapes].sort((x, y) => y.createdAt.getTime() - x.createdAt.getTime() || y.id - x.id);
  const [levels, staleness] = await Promise.all([levelSummaryForBows(ids, new Date(), levelFacts), stalenessForBows(ids, stale)]);
  for (const facts of all) {
    const bowId = facts.bow.id;
    const sightIn = facts.sightIns[0]; // newest first
    result.set(bowId, {
      latestSightIn: sightIn
        ? {
            id: sightIn.id,
            date: sightIn.date,
            rmsMm: sightIn.fitRmsMm,
            markCount: sightIn.markCount,
            longestDistance: sightIn.longestDistance,
            longestUnit: sightIn.longestUnit,
          }
        : null,
      buildCount: facts.builds.length,
      sightInCount: facts.sightIns.length,
      hasTape: facts.tapes.length > 0,
      level: levels.get(bowId) ?? null,
      confirm: staleness.get(bowId)?.confirm ?? null,
    });
  }
  return result;
}

/** GET /api/bows: the account's bows, oldest first, each with its readiness (one query, bow-read.ts). */
export async function listBows(user: User): Promise<BowSummary[]> {
  const all = await readBowFacts({ userId: user.id }, user.id);
  const readiness = await readinessFrom(all);
  return all.map((facts) => ({ ...bowOut(facts.bow as Bow), readiness: readiness.get(facts.bow.id)! }));
}

/**
 * GET /api/bows/:id: the bow, its owner's name, its builds, its sight-ins (newest first, with fit summaries) and its tapes.
 * One query (bow-read.ts) that also answers whether `user` may read it: 404 when not, as bow-access.ts decides.
 */
export async function getBow(user: User, id: number): Promise<BowDetail> {
  const [facts] = await readBowFacts({ bowId: id }, user.id);
  if (!facts || !facts.canRead) throw ApiError.notFound('That bow');
  const readiness = await readinessFrom([facts]);
  const names = new Map<number, string>();
  for (const row of [...facts.builds, ...facts.sightIns])
    if (row.addedById !== null && row.addedByName !== null) names.set(row.addedById, row.addedByName);
  const sightInsPerBuild = new Map<number, number>();
  for (const sightIn of facts.sightIns) sightInsPerBuild.set(sightIn.buildId, (sightInsPerBuild.get(sightIn.buildId) ?? 0) + 1);
  const known = {
    stats: new Map(
      facts.sightIns.map((s) => [s.id, { markCount: s.markCount, longestDistance: s.longestDistance, longestUnit: s.longestUnit }]),
    ),
    names,
    warningCounts: new Map(facts.sightIns.map((s) => [s.id, s.warningCount])),
  };
  return {
    ...bowOut(facts.bow as Bow),
    ownerName: facts.ownerName,
    readiness: readiness.get(facts.bow.id)!,
    builds: facts.builds.map((build) => buildOut(build as unknown as ArrowBuild, sightInsPerBuild.get(build.id) ?? 0, names)),
    sightIns: await sightInListItems(facts.sightIns as unknown as SightIn[], known),
    tapes: facts.tapes.map((tape) => tapeOut(tape as unknown as Tape, facts.bow.id)),
  };
}

export async function createBow(user: User, input: BowInput): Promise<BowOut> {
  const bow = await Bow.create({ ...input, userId: user.id });
  return bowOut(bow);
}

/**
 * PATCH: merge the change into the stored bow and check the whole with
 * bowInputSchema (so cross-field rules hold after a partial update).
 * Saved sight-ins keep the fit they were saved with; re-save a sight-in to refit
 * it with a new sight radius or peep height.
 */
export async function updateBow(user: User, id: number, update: BowUpdate): Promise<BowOut> {
  return sequelize.transaction(async (transaction) => {
    const { bow } = await bowFor(user, id, 'change', { transaction });
    const merged = bowInputSchema.safeParse({ ...bowOut(bow), ...update });
    if (!merged.success) throw validationError(merged.error);
    const moved = impactEdits(bow, merged.data);
    bow.set(merged.data);
    await bow.save({ transaction });
    // An edit of the peep height or sight radius moves the point of impact: logged as a change (shared/staleness.ts).
    for (const change of moved)
      await BowChange.create({ bowId: bow.id, userId: user.id, changedAt: new Date(), ...change }, { transaction });
    return bowOut(bow);
  });
}

/**
 * The bow-form edits that move the point of impact (peep height, sight radius),
 * as changes to log; a difference under 0.05 mm is rounding through inches, not an edit.
 * Example: impactEdits({ peepHeightMm: 110, sightRadiusMm: 840 }, { peepHeightMm: 113, sightRadiusMm: 840 })
 *   → [{ kind: 'peep', note: 'Peep height edited on the bow: 110 → 113 mm' }]
 */
export function impactEdits(
  before: Pick<BowInput, 'peepHeightMm' | 'sightRadiusMm'>,
  after: Pick<BowInput, 'peepHeightMm' | 'sightRadiusMm'>,
) {
  const edits: { kind: 'peep' | 'sight-radius'; note: string }[] = [];
  const mm = (value: number) => Number(value.toFixed(1));
  if (Math.abs(before.peepHeightMm - after.peepHeightMm) > 0.05) {
    edits.push({ kind: 'peep', note: `Peep height edited on the bow: ${mm(before.peepHeightMm)} → ${mm(after.peepHeightMm)} mm` });
  }
  if (Math.abs(before.sightRadiusMm - after.sightRadiusMm) > 0.05) {
    edits.push({
      kind: 'sight-radius',
      note: `Sight radius edited on the bow: ${mm(before.sightRadiusMm)} → ${mm(after.sightRadiusMm)} mm`,
    });
  }
  return edits;
}

/** Deletes the bow; its builds, sight-ins, marks and tapes go with it (foreign-key cascade, migrations 0011–0014). */
export async function deleteBow(user: User, id: number): Promise<void> {
  const { bow } = await bowFor(user, id, 'change');
  const photoKeys = await photoKeysOfBow(bow.id); // the cascade removes photo rows; their files go after
  await bow.destroy();
  await removeStoredPhotos(photoKeys);
}
