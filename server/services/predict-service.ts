/**
 * A build not shot yet (POST /api/bows/:bowId/predict and its tape,
 * GET /api/bows/:bowId/predict/tape.svg): its speed from the bow's other
 * chronographed builds (virtual-mass fit) unless it has its own, and its marks
 * on the bow's fitted sight (a sight-in's geometry carrying the new arrow),
 * by math's predictBuild. A prediction that lacks what it needs is refused
 * with what is missing. Everything it draws says PREDICTED — not sighted.
 */
import { ArrowBuild, SightIn, type Bow, type User } from '@/server/models';
import { ApiError, validationError } from '@/server/errors';
import { ENERGY_CAUTION, predictBuild, predictedSheetSvg, predictedTapeSvg, type SightModel } from '@/math';
import { sheetPdf } from '@/server/print/sheet-pdf';
import { sightInName } from '@/shared/sight-in-name';
import { buildInputSchema, type BuildInput } from '@/shared/build';
import type { PredictRequest, PredictResponse, PredictTapeQuery } from '@/shared/predict';
import { bowFor } from './bow-access';
import { arrowQuantities } from './fit-service';
import { modelOf, refusingMathInput } from './compare-service';
import type { Download } from './tape-service';

/** Why a prediction has no marks: the bow has no fitted sight-in. */
export const NO_SIGHT_IN_MESSAGE = 'Sight in any build on this bow to predict marks: the new arrow is carried on the bow’s fitted sight.';

type Target = PredictResponse['build'] & { dragCoefficient: number | null };

/** The arrow to predict: a saved build of this bow, or components checked like a new build. */
async function targetOf(bow: Bow, request: { buildId?: number; build?: BuildInput }): Promise<Target> {
  if (request.buildId !== undefined) {
    const build = await ArrowBuild.findOne({ where: { id: request.buildId, bowId: bow.id } });
    if (!build) throw ApiError.badRequest('Choose one of this bow’s arrow builds', { buildId: 'Choose one of this bow’s arrow builds' });
    return {
      buildId: build.id,
      name: build.name,
      totalGr: build.totalGr,
      focPct: build.focPct,
      diameterMm: build.diameterMm,
      chronographedSpeedFps: build.speedFps,
      dragCoefficient: build.dragCoefficient,
    };
  }
  const build = request.build!;
  const derived = arrowQuantities(build);
  return {
    buildId: null,
    name: build.name,
    totalGr: derived.totalGr,
    focPct: derived.focPct,
    diameterMm: build.diameterMm,
    chronographedSpeedFps: build.speedFps,
    dragCoefficient: build.dragCoefficient,
  };
}

/** The sight-in that carries the new arrow: `sightInId` (on this bow), else the bow's most recent; null if it has none. */
async function sightInOf(bow: Bow, sightInId?: number): Promise<SightIn | null> {
  if (sightInId !== undefined) {
    const sightIn = await SightIn.findOne({ where: { id: sightInId, bowId: bow.id } });
    if (!sightIn) throw ApiError.badRequest('Choose one of this bow’s sight-ins', { sightInId: 'Choose one of this bow’s sight-ins' });
    return sightIn;
  }
  return SightIn.findOne({
    where: { bowId: bow.id },
    order: [
      ['date', 'DESC'],
      ['id', 'DESC'],
    ],
  });
}

/**
 * The prediction for a saved build or a new build's components.
 * Example: await predict(marit, 12, { build: { name: 'Elk 520', grainsPerInch: 9.3, … } }) → { prediction: { speedFps: ≈ 262, speedSource: 'virtual-mass', marks: […] }, … }
 */
export async function predict(user: User, bowId: number, request: PredictRequest): Promise<PredictResponse> {
  return (await runPrediction(user, bowId, request)).response;
}

/** The prediction as the API sends it, and the predicted sight model (null without a sight-in) for drawing. */
async function runPrediction(
  user: User,
  bowId: number,
  request: PredictRequest,
): Promise<{ response: PredictResponse; sightModel: SightModel | null }> {
  const { bow } = await bowFor(user, bowId, 'read');
  const target = await targetOf(bow, request);
  const others = await ArrowBuild.findAll({ where: { bowId: bow.id }, order: [['id', 'ASC']] });
  const chronographed = others
    .filter((build) => build.speedFps !== null && build.id !== target.buildId)
    .map((build) => ({ buildId: build.id, name: build.name, massGr: build.totalGr, speedFps: build.speedFps as number }));
  const sightIn = await sightInOf(bow, request.sightInId);
  const sight = sightIn ? modelOf(sightIn) : null;

  const prediction = refusingMathInput(() =>
    predictBuild({
      arrow: {
        massGr: target.totalGr,
        diameterMm: target.diameterMm,
        dragCoefficient: target.dragCoefficient,
        speedFps: target.chronographedSpeedFps,
      },
      chronographed,
      sight,
      scaleSign: bow.scaleDirection === 'up' ? -1 : 1,
    }),
  );
  const sightInBuild = sightIn ? others.find((build) => build.id === sightIn.buildId) : undefined;
  const { model, ...rest } = prediction;
  const { dragCoefficient: _drag, ...build } = target;
  const response: PredictResponse = {
    bowId: bow.id,
    scaleDirection: bow.scaleDirection,
    build,
    chronographed,
    sightIn: sightIn
      ? {
          id: sightIn.id,
          date: sightIn.date,
          placeLabel: sightIn.placeLabel,
          buildName: sightInBuild?.name ?? '',
          altitudeM: sightIn.altitudeM,
          temperatureC: sightIn.temperatureC,
        }
      : null,
    marksMissing: sightIn ? null : NO_SIGHT_IN_MESSAGE,
    prediction: rest,
    model,
    energyCaution: ENERGY_CAUTION,
  };
  return { response, sightModel: model };
}

/** The query's build: a saved build's id, or its components checked as a new build would be. */
function requestOfQuery(query: PredictTapeQuery): PredictRequest {
  if (query.buildId !== undefined) return { buildId: query.buildId, sightInId: query.sightInId };
  const {
    buildId: _id,
    sightInId,
    from: _from,
    to: _to,
    step: _step,
    width: _width,
    orientation: _orientation,
    mirror: _mirror,
    ...components
  } = query;
  const parsed = buildInputSchema.safeParse({ name: 'New build', ...components });
  if (!parsed.success) throw validationError(parsed.error, 'query');
  return { build: parsed.data, sightInId };
}

/**
 * The predicted tape (SVG, mm) for the query's build: the tape from `from` to
 * `to` (default 20 to 80 in the sight-in's unit) at the bow's tape width,
 * marked PREDICTED — not sighted. Without a fitted sight-in on the bow: 409.
 */
export async function predictedTapeDownload(user: User, bowId: number, query: PredictTapeQuery): Promise<Download> {
  const { model, tape, labels, slug } = await predictedDrawing(user, bowId, query);
  const svg = refusingMathInput(() => predictedTapeSvg(model, tape, { bow: labels.bow, build: labels.build, speed: labels.speed }));
  return { body: svg, contentType: 'image/svg+xml; charset=utf-8', fileName: `predicted-tape-${slug}.svg` };
}

/**
 * The predicted tape's print sheet (GET /api/bows/:bowId/predict/sheet.svg and
 * sheet.pdf): math's predictedSheetSvg on A4 or US Letter — PREDICTED — NOT
 * SIGHTED at its head, calibration bars, the tape at 100 % — as SVG, or as a
 * PDF of the paper's size. Without a fitted sight-in on the bow: 409.
 */
export async function predictedSheetDownload(
  user: User,
  bowId: number,
  query: PredictTapeQuery & { paper?: 'a4' | 'letter' },
  format: 'svg' | 'pdf',
): Promise<Download> {
  const { model, tape, labels, slug } = await predictedDrawing(user, bowId, query);
  const paper = query.paper ?? 'a4';
  const svg = refusingMathInput(() => predictedSheetSvg(model, tape, { paper, labels }));
  if (format === 'svg') return { body: svg, contentType: 'image/svg+xml; charset=utf-8', fileName: `predicted-sheet-${slug}.svg` };
  return { body: await sheetPdf(svg, paper), contentType: 'application/pdf', fileName: `predicted-sheet-${slug}.pdf` };
}

/** What a predicted tape or sheet draws: the predicted model, the tape options, the words and a file-name slug. */
async function predictedDrawing(user: User, bowId: number, query: PredictTapeQuery) {
  const { bow } = await bowFor(user, bowId, 'read');
  const { response: result, sightModel: model } = await runPrediction(user, bowId, requestOfQuery(query));
  if (!model) throw ApiError.conflict(NO_SIGHT_IN_MESSAGE);
  const from = query.from ?? 20;
  const to = query.to ?? Math.max(from + 10, 80);
  const speed =
    result.prediction.speedSource === 'chronograph'
      ? `${result.prediction.speedFps.toFixed(0)} fps (chronographed)`
      : `${result.prediction.speedFps.toFixed(0)} fps (predicted from ${result.chronographed.length} chronographed builds)`;
  const tape = {
    from,
    to,
    step: query.step ?? 1,
    unit: model.distanceUnit,
    widthMm: query.width ?? bow.tapeWidthMm,
    orientation: query.orientation ?? ('down' as const),
    mirror: query.mirror ?? false,
  };
  let sightIn: string | undefined;
  if (result.sightIn) {
    const siblings = await SightIn.findAll({ where: { bowId: bow.id }, attributes: ['id', 'date', 'placeLabel', 'buildId', 'createdAt'] });
    const nameable = siblings.map((s) => ({
      id: s.id,
      date: s.date,
      placeLabel: s.placeLabel,
      buildId: s.buildId,
      createdAt: s.createdAt.toISOString(),
    }));
    const own = nameable.find((s) => s.id === result.sightIn!.id);
    if (own) sightIn = sightInName(own, { buildName: result.sightIn.buildName, siblings: nameable, timeZone: 'UTC' });
  }
  const labels = { bow: bow.nickname, build: `${result.build.name}, ${result.build.totalGr.toFixed(0)} gr`, speed, sightIn };
  const slug =
    result.build.name
      .normalize('NFKD')
      .replace(/[^\w\s-]/g, '')
      .trim()
      .toLowerCase()
      .replace(/[\s_-]+/g, '-')
      .slice(0, 40) || 'build';
  return { model, tape, labels, slug };
}
