/**
 * Builds side by side on one bow (GET /api/bows/:bowId/compare): each build's
 * most recent sight-in gives its fitted sight model, and math's compareBuilds
 * lays them out (curves, marks by distance with differences in mm and in
 * distance, speed, grains, FOC, energy, momentum, drop, forgiveness). A build
 * with no sight-in is refused in plain words naming it.
 */
import { ArrowBuild, SightIn, type User } from '@/server/models';
import { ApiError } from '@/server/errors';
import { airDensityKgM3, compareBuilds, isFitInputError, type SightModel } from '@/math';
import type { CompareQuery, CompareResponse } from '@/shared/compare';
import type { StoredFit } from '@/shared/sight-in';
import { bowFor } from './bow-access';
import { markStats } from './sight-in-service';

/**
 * Runs a math computation; a FitInputError (an input no sight can have) becomes
 * a 400 whose field is `field` (or math's own), with math's plain message.
 * Example: refusingMathInput(() => fieldCardData(model, { anglesDeg: [70] })) → throws ApiError 400 "Enter an angle between -60 and 60°"
 */
export function refusingMathInput<T>(compute: () => T, field?: string): T {
  try {
    return compute();
  } catch (error) {
    if (isFitInputError(error)) throw ApiError.badRequest(error.detail, { [field ?? error.field]: error.detail });
    throw error;
  }
}

/** The most recent sight-in (by date, then id) shot with each build, by build id. */
export async function latestSightInsByBuild(bowId: number, buildIds: number[]): Promise<Map<number, SightIn>> {
  const sightIns = await SightIn.findAll({
    where: { bowId, buildId: buildIds },
    order: [
      ['date', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  const latest = new Map<number, SightIn>();
  for (const sightIn of sightIns) if (!latest.has(sightIn.buildId)) latest.set(sightIn.buildId, sightIn);
  return latest;
}

/** The fitted model stored with a sight-in (math's own serialisable SightModel). */
export function modelOf(sightIn: SightIn): SightModel {
  return (sightIn.fit as StoredFit).model;
}

/**
 * The comparison of `query.builds` (2–4 builds of the bow, in that order; the
 * first is the reference of the differences).
 * Example: await compareBowBuilds(marit, 12, { builds: [3, 4], at: 40, windowMm: 100 }) → { comparison: { rows: […], builds: […] }, sources: […] }
 */
export async function compareBowBuilds(user: User, bowId: number, query: CompareQuery): Promise<CompareResponse> {
  const { bow } = await bowFor(user, bowId, 'read');
  const ids = query.builds ?? [];
  const builds = await ArrowBuild.findAll({ where: { id: ids, bowId: bow.id } });
  const byId = new Map(builds.map((build) => [build.id, build]));
  const unknown = ids.filter((id) => !byId.has(id));
  if (unknown.length > 0) {
    const message = `Build ${unknown.join(', ')} is not one of this bow’s arrow builds.`;
    throw ApiError.badRequest(message, { builds: message });
  }
  const latest = await latestSightInsByBuild(bow.id, ids);
  const unsighted = ids.map((id) => byId.get(id)!).filter((build) => !latest.has(build.id));
  if (unsighted.length > 0) {
    const names = unsighted.map((build) => `“${build.name}”`).join(' and ');
    const message = `${names} ${unsighted.length === 1 ? 'has' : 'have'} no fitted sight-in yet: sight ${unsighted.length === 1 ? 'it' : 'them'} in (two marks are enough) before comparing.`;
    throw ApiError.conflict(message, { builds: message });
  }
  const ordered = ids.map((id) => ({ build: byId.get(id)!, sightIn: latest.get(id)! }));
  const stats = await markStats(ordered.map(({ sightIn }) => sightIn.id));
  const common =
    query.altitudeM !== undefined ? airDensityKgM3({ altitudeM: query.altitudeM, temperatureC: query.temperatureC }) : undefined;
  const comparison = refusingMathInput(() =>
    compareBuilds(
      ordered.map(({ build, sightIn }) => ({ label: build.name, model: modelOf(sightIn), focPct: build.focPct })),
      {
        at: query.at,
        windowMm: query.windowMm,
        unit: query.unit,
        airDensityKgM3: common,
        scaleSign: bow.scaleDirection === 'up' ? -1 : 1,
      },
    ),
  );
  return {
    bowId: bow.id,
    scaleDirection: bow.scaleDirection,
    comparison,
    sources: ordered.map(({ build, sightIn }) => ({
      buildId: build.id,
      name: build.name,
      sightInId: sightIn.id,
      sightInDate: sightIn.date,
      placeLabel: sightIn.placeLabel,
      altitudeM: sightIn.altitudeM,
      temperatureC: sightIn.temperatureC,
      markCount: stats.get(sightIn.id)?.markCount ?? 0,
      chronographedSpeedFps: build.speedFps,
    })),
  };
}
