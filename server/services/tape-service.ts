/**
 * Saved tape layouts for a sight-in's fit, and the tape / print-sheet downloads
 * (rendered by the math core through fit-service). A layout is checked by
 * drawing it once before it is saved, so a saved tape always prints.
 */
import { sequelize } from '@/server/db';
import { ApiError, validationError } from '@/server/errors';
import { ArrowBuild, Bow, SightIn, Tape, type User } from '@/server/models';
import type { StoredFit } from '@/shared/sight-in';
import { convertDistance } from '@/shared/sight-in-fit';
import { tapeLayoutSchema, type Tape as TapeOut, type TapeLayout, type TapeQuery, type TapeUpdate } from '@/shared/tape';
import { sightInFor, tapeFor } from './bow-access';
import { sheetPdfFor, sheetSvgFor, tapeSvgFor, type SheetLabelsIn } from './fit-service';
import { stalenessOfSightIn } from './staleness-service';
import { sheetNote } from '@/shared/staleness';

export function tapeOut(tape: Tape, bowId: number): TapeOut {
  return {
    id: tape.id,
    sightInId: tape.sightInId,
    bowId,
    fromDistance: tape.fromDistance,
    toDistance: tape.toDistance,
    step: tape.step,
    unit: tape.unit,
    orientation: tape.orientation,
    widthMm: tape.widthMm,
    mirror: tape.mirror,
    paper: tape.paper,
    label: tape.label,
    createdAt: tape.createdAt.toISOString(),
    updatedAt: tape.updatedAt.toISOString(),
  };
}

function layoutOf(tape: Tape): TapeLayout {
  const { fromDistance, toDistance, step, unit, orientation, widthMm, mirror, paper, label } = tape;
  return { fromDistance, toDistance, step, unit, orientation, widthMm, mirror, paper, label };
}

export async function listTapes(user: User, sightInId: number): Promise<TapeOut[]> {
  const { sightIn } = await sightInFor(user, sightInId, 'read');
  const tapes = await Tape.findAll({ where: { sightInId: sightIn.id }, order: [['id', 'ASC']] });
  return tapes.map((tape) => tapeOut(tape, sightIn.bowId));
}

export async function getTape(user: User, id: number): Promise<TapeOut> {
  const { tape } = await tapeFor(user, id, 'read');
  return tapeOut(tape, tape.sightIn.bowId);
}

export async function createTape(user: User, sightInId: number, layout: TapeLayout): Promise<TapeOut> {
  const { sightIn } = await sightInFor(user, sightInId, 'add');
  tapeSvgFor(sightIn.fit as StoredFit, layout);
  const tape = await Tape.create({ ...layout, sightInId: sightIn.id });
  return tapeOut(tape, sightIn.bowId);
}

export async function updateTape(user: User, id: number, update: TapeUpdate): Promise<TapeOut> {
  return sequelize.transaction(async (transaction) => {
    const { tape } = await tapeFor(user, id, 'change', { transaction });
    const merged = tapeLayoutSchema.safeParse({ ...layoutOf(tape), ...update });
    if (!merged.success) throw validationError(merged.error);
    tapeSvgFor(tape.sightIn.fit as StoredFit, merged.data);
    tape.set(merged.data);
    await tape.save({ transaction });
    return tapeOut(tape, tape.sightIn.bowId);
  });
}

export async function deleteTape(user: User, id: number): Promise<void> {
  const { tape } = await tapeFor(user, id, 'change');
  await tape.destroy();
}

/**
 * A layout for a download: a saved tape (`?tape=<id>`, which must belong to
 * this sight-in) or the query's options over defaults from the sight-in: the
 * fit's unit, from the shortest sighted distance (at least 10) rounded down to
 * 10 to the longest predicted distance, 1-unit steps, the bow's tape width.
 */
async function downloadLayout(sightIn: SightIn & { bow: Bow }, query: TapeQuery): Promise<TapeLayout> {
  if (query.tape !== undefined) {
    const tape = await Tape.findOne({ where: { id: query.tape, sightInId: sightIn.id } });
    if (!tape) throw ApiError.notFound('That tape');
    const saved = layoutOf(tape);
    return { ...saved, paper: query.paper ?? saved.paper };
  }
  const fit = sightIn.fit as StoredFit;
  const unit = query.unit ?? fit.distanceUnit;
  const inUnit = (distance: number) => convertDistance(distance, fit.distanceUnit, unit);
  const sighted = fit.residuals.map((residual) => inUnit(residual.distance));
  const reachable = fit.marks.filter((mark) => mark.markMm !== null).map((mark) => inUnit(mark.distance));
  const from = query.from ?? Math.max(10, Math.floor(Math.min(...sighted) / 10) * 10);
  const to = query.to ?? Math.max(from + 10, Math.floor(Math.max(...reachable, from + 10) / 10) * 10);
  const parsed = tapeLayoutSchema.safeParse({
    fromDistance: from,
    toDistance: Math.min(150, to),
    step: query.step ?? 1,
    unit,
    orientation: query.orientation ?? 'down',
    widthMm: query.width ?? sightIn.bow.tapeWidthMm,
    mirror: query.mirror ?? false,
    paper: query.paper ?? 'letter',
    label: query.label ?? '',
  });
  if (!parsed.success) throw validationError(parsed.error, 'query');
  return parsed.data;
}

/** File name stem for downloads: "ridge-slider-2026-10-04". */
function fileStem(bow: Bow, sightIn: SightIn): string {
  const slug = bow.nickname
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 40);
  return `${slug || 'bow'}-${sightIn.date}`;
}

/**
 * The small print on a sheet: bow nickname (with the tape's label), build name, sight-in date; the sheet adds the marks.
 * When a change after the sight-in means the marks must be confirmed at the range (shared/staleness.ts), the header says so.
 */
async function sheetLabels(sightIn: SightIn & { bow: Bow }, layout: TapeLayout): Promise<SheetLabelsIn> {
  const [build, staleness] = await Promise.all([
    ArrowBuild.findByPk(sightIn.buildId, { attributes: ['name'] }),
    stalenessOfSightIn(sightIn.bowId, sightIn.id),
  ]);
  return {
    bow: layout.label ? `${sightIn.bow.nickname} · ${layout.label}` : sightIn.bow.nickname,
    build: build?.name ?? '',
    date: sightIn.date,
    note: sheetNote(staleness) ?? undefined,
  };
}

export type Download = { body: string | Buffer; contentType: string; fileName: string };

export async function tapeDownload(user: User, sightInId: number, query: TapeQuery): Promise<Download> {
  const { sightIn } = await sightInFor(user, sightInId, 'read');
  const layout = await downloadLayout(sightIn, query);
  return {
    body: tapeSvgFor(sightIn.fit as StoredFit, layout),
    contentType: 'image/svg+xml; charset=utf-8',
    fileName: `${fileStem(sightIn.bow, sightIn)}-tape.svg`,
  };
}

export async function sheetDownload(user: User, sightInId: number, query: TapeQuery, format: 'svg' | 'pdf'): Promise<Download> {
  const { sightIn } = await sightInFor(user, sightInId, 'read');
  const layout = await downloadLayout(sightIn, query);
  const labels = await sheetLabels(sightIn, layout);
  const fit = sightIn.fit as StoredFit;
  if (format === 'svg') {
    return {
      body: sheetSvgFor(fit, layout, labels),
      contentType: 'image/svg+xml; charset=utf-8',
      fileName: `${fileStem(sightIn.bow, sightIn)}-sheet.svg`,
    };
  }
  return {
    body: await sheetPdfFor(fit, layout, labels),
    contentType: 'application/pdf',
    fileName: `${fileStem(sightIn.bow, sightIn)}-sheet.pdf`,
  };
}
