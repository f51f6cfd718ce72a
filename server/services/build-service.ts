/**
 * Arrow builds on a bow. The derived quantities (total grains, FOC, kinetic
 * energy, momentum) come from the math core through fit-service and are
 * stored with the build, recomputed on every save.
 *
 * Deleting a build that has sight-ins is refused (409) rather than
 * cascading: a sight-in's marks are only meaningful with the arrow they were
 * shot with, and they cost an afternoon at the range to make, so losing them
 * should take a deliberate step (delete the sight-ins first). Deleting the
 * whole bow still takes everything with it.
 */
import { Op, fn, col, type Transaction } from 'sequelize';
import { sequelize } from '@/server/db';
import { ApiError, validationError } from '@/server/errors';
import { ArrowBuild, SightIn, type User } from '@/server/models';
import { buildInputSchema, type Build, type BuildInput, type BuildUpdate } from '@/shared/build';
import { bowFor, buildFor } from './bow-access';
import { arrowQuantities } from './fit-service';
import { addedByNames, addedByOf } from './added-by';

/** The build as the API sends it; with `names` (addedByNames), who added it. */
export function buildOut(build: ArrowBuild, sightInCount: number, names?: Map<number, string>): Build {
  return {
    id: build.id,
    bowId: build.bowId,
    name: build.name,
    shaftLabel: build.shaftLabel,
    spine: build.spine,
    grainsPerInch: build.grainsPerInch,
    cutLengthMm: build.cutLengthMm,
    diameterMm: build.diameterMm,
    pointGr: build.pointGr,
    insertGr: build.insertGr,
    collarGr: build.collarGr,
    nockGr: build.nockGr,
    vaneCount: build.vaneCount,
    vaneWeightGr: build.vaneWeightGr,
    wrapGr: build.wrapGr,
    balancePointMm: build.balancePointMm,
    speedFps: build.speedFps,
    dragCoefficient: build.dragCoefficient,
    derived: {
      totalGr: build.totalGr,
      focPct: build.focPct,
      kineticEnergyFtLb: build.kineticEnergyFtLb,
      kineticEnergyJ: build.kineticEnergyJ,
      momentumSlugFtPerS: build.momentumSlugFtPerS,
      momentumKgMPerS: build.momentumKgMPerS,
    },
    sightInCount,
    ...(names ? { addedBy: addedByOf(build, names) } : {}),
    createdAt: build.createdAt.toISOString(),
    updatedAt: build.updatedAt.toISOString(),
  };
}

/** Number of sight-ins shot with each build. */
export async function sightInCounts(buildIds: number[], transaction?: Transaction): Promise<Map<number, number>> {
  const counts = new Map<number, number>();
  if (buildIds.length === 0) return counts;
  const rows = (await SightIn.findAll({
    attributes: ['buildId', [fn('COUNT', col('id')), 'count']],
    where: { buildId: { [Op.in]: buildIds } },
    group: ['buildId'],
    raw: true,
    transaction,
  })) as unknown as { buildId: number; count: number | string }[];
  for (const row of rows) counts.set(Number(row.buildId), Number(row.count));
  return counts;
}

/** Input fields plus the derived columns, ready to store. */
function withDerived(input: BuildInput) {
  const derived = arrowQuantities(input);
  return { ...input, ...derived };
}

export async function listBuilds(user: User, bowId: number): Promise<Build[]> {
  const { bow } = await bowFor(user, bowId, 'read');
  const builds = await ArrowBuild.findAll({ where: { bowId: bow.id }, order: [['id', 'ASC']] });
  const counts = await sightInCounts(builds.map((build) => build.id));
  const names = await addedByNames(builds);
  return builds.map((build) => buildOut(build, counts.get(build.id) ?? 0, names));
}

export async function getBuild(user: User, id: number): Promise<Build> {
  const { build } = await buildFor(user, id, 'read');
  const counts = await sightInCounts([build.id]);
  return buildOut(build, counts.get(build.id) ?? 0, await addedByNames([build]));
}

/**
 * A new build on the bow: by its owner, or by a technician with an active
 * share ('add-build' in bow-access.ts), attributed to whoever added it. A
 * technician adds builds but never changes or deletes one (updateBuild and
 * deleteBuild ask for 'change', the owner's).
 */
export async function createBuild(user: User, bowId: number, input: BuildInput): Promise<Build> {
  const { bow } = await bowFor(user, bowId, 'add-build');
  const build = await ArrowBuild.create({ ...withDerived(input), bowId: bow.id, addedById: user.id });
  return buildOut(build, 0, await addedByNames([build]));
}

/**
 * PATCH: merge, re-check the whole build, recompute the derived quantities.
 * Sight-ins already saved keep the fit they were saved with.
 */
export async function updateBuild(user: User, id: number, update: BuildUpdate): Promise<Build> {
  return sequelize.transaction(async (transaction) => {
    const { build } = await buildFor(user, id, 'change', { transaction });
    const current = buildOut(build, 0);
    const merged = buildInputSchema.safeParse({ ...current, ...update });
    if (!merged.success) throw validationError(merged.error);
    build.set(withDerived(merged.data));
    await build.save({ transaction });
    const counts = await sightInCounts([build.id], transaction);
    return buildOut(build, counts.get(build.id) ?? 0, await addedByNames([build], transaction));
  });
}

/** Refused with 409 while sight-ins use the build (see the module comment). */
export async function deleteBuild(user: User, id: number): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const { build } = await buildFor(user, id, 'change', { transaction });
    const count = (await sightInCounts([build.id], transaction)).get(build.id) ?? 0;
    if (count > 0) {
      const sightIns = count === 1 ? '1 sight-in uses' : `${count} sight-ins use`;
      throw ApiError.conflict(
        `${sightIns} this arrow build. Delete ${count === 1 ? 'that sight-in' : 'those sight-ins'} first, or keep the build.`,
      );
    }
    await build.destroy({ transaction });
  });
}
