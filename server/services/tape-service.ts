/**
 * Saved tape layouts for a session's fit, and the tape / print-sheet downloads
 * (rendered by the math core through fit-service). A layout is checked by
 * drawing it once before it is saved, so a saved tape always prints.
 */
import type { Transaction } from 'sequelize';
import { sequelize } from '@/server/db';
import { ApiError, validationError } from '@/server/errors';
import { ArrowBuild, Bow, SightSession, Tape, type User } from '@/server/models';
import type { StoredFit } from '@/shared/session';
import { tapeLayoutSchema, type Tape as TapeOut, type TapeLayout, type TapeQuery, type TapeUpdate } from '@/shared/tape';
import { findOwnSession } from './session-service';
import { bowFor, type BowCapability } from './bow-access';
import { sheetPdfFor, sheetSvgFor, tapeSvgFor, type SheetLabelsIn } from './fit-service';
import { stalenessOfSession } from './staleness-service';
import { sheetNote } from '@/shared/staleness';

/** Distance unit conversion for defaults: yards ↔ metres, exact (international yard and pound, 1959). */
const YARD_M = 0.9144;

export function tapeOut(tape: Tape, bowId: number): TapeOut {
  return {
    id: tape.id,
    sessionId: tape.sessionId,
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

/** The tape with this id (and its session and bow) if `user` may use `capability` on the bow (default: owns it); otherwise 404 (403 for a technician asking to change it). */
async function findOwnTape(user: User, id: number, transaction?: Transaction, capability: BowCapability = 'delete') {
  const tape = await Tape.findOne({
    where: { id },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
    include: [
      {
        model: SightSession,
        as: 'session',
        required: true,
        include: [{ model: Bow, as: 'bow' }],
      },
    ],
  });
  if (!tape) throw ApiError.notFound('That tape');
  await bowFor(user, (tape as Tape & { session: SightSession }).session.bowId, capability, 'That tape');
  return tape as Tape & { session: SightSession & { bow: Bow } };
}

function layoutOf(tape: Tape): TapeLayout {
  const { fromDistance, toDistance, step, unit, orientation, widthMm, mirror, paper, label } = tape;
  return { fromDistance, toDistance, step, unit, orientation, widthMm, mirror, paper, label };
}

export async function listTapes(user: User, sessionId: number): Promise<TapeOut[]> {
  const session = await findOwnSession(user, sessionId, undefined, 'read');
  const tapes = await Tape.findAll({ where: { sessionId: session.id }, order: [['id', 'ASC']] });
  return tapes.map((tape) => tapeOut(tape, session.bowId));
}

export async function getTape(user: User, id: number): Promise<TapeOut> {
  const tape = await findOwnTape(user, id, undefined, 'read');
  return tapeOut(tape, tape.session.bowId);
}

export async function createTape(user: User, sessionId: number, layout: TapeLayout): Promise<TapeOut> {
  const session = await findOwnSession(user, sessionId, undefined, 'write');
  tapeSvgFor(session.fit as StoredFit, layout);
  const tape = await Tape.create({ ...layout, sessionId: session.id });
  return tapeOut(tape, session.bowId);
}

export async function updateTape(user: User, id: number, update: TapeUpdate): Promise<TapeOut> {
  return sequelize.transaction(async (transaction) => {
    const tape = await findOwnTape(user, id, transaction);
    const merged = tapeLayoutSchema.safeParse({ ...layoutOf(tape), ...update });
    if (!merged.success) throw validationError(merged.error);
    tapeSvgFor(tape.session.fit as StoredFit, merged.data);
    tape.set(merged.data);
    await tape.save({ transaction });
    return tapeOut(tape, tape.session.bowId);
  });
}

export async function deleteTape(user: User, id: number): Promise<void> {
  const tape = await findOwnTape(user, id);
  await tape.destroy();
}

/**
 * A layout for a download: a saved tape (`?tape=<id>`, which must belong to
 * this session) or the query's options over defaults from the session: the
 * fit's unit, from the shortest sighted distance (at least 10) rounded down to
 * 10 to the longest predicted distance, 1-unit steps, the bow's tape width.
 */
async function downloadLayout(session: SightSession & { bow: Bow }, query: TapeQuery): Promise<TapeLayout> {
  if (query.tape !== undefined) {
    const tape = await Tape.findOne({ where: { id: query.tape, sessionId: session.id } });
    if (!tape) throw ApiError.notFound('That tape');
    const saved = layoutOf(tape);
    return { ...saved, paper: query.paper ?? saved.paper };
  }
  const fit = session.fit as StoredFit;
  const unit = query.unit ?? fit.distanceUnit;
  const inUnit = (distance: number) => (unit === fit.distanceUnit ? distance : fit.distanceUnit === 'yd' ? distance * YARD_M : distance / YARD_M);
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
    widthMm: query.width ?? session.bow.tapeWidthMm,
    mirror: query.mirror ?? false,
    paper: query.paper ?? 'letter',
    label: query.label ?? '',
  });
  if (!parsed.success) throw validationError(parsed.error, 'query');
  return parsed.data;
}

/** File name stem for downloads: "ridge-slider-2026-10-04". */
function fileStem(bow: Bow, session: SightSession): string {
  const slug = bow.nickname
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 40);
  return `${slug || 'bow'}-${session.date}`;
}

/**
 * The small print on a sheet: bow nickname (with the tape's label), build name, session date; the sheet adds the marks.
 * When a change after the sight-in means the marks must be confirmed at the range (shared/staleness.ts), the header says so.
 */
async function sheetLabels(session: SightSession & { bow: Bow }, layout: TapeLayout): Promise<SheetLabelsIn> {
  const [build, staleness] = await Promise.all([
    ArrowBuild.findByPk(session.buildId, { attributes: ['name'] }),
    stalenessOfSession(session.bowId, session.id),
  ]);
  return {
    bow: layout.label ? `${session.bow.nickname} · ${layout.label}` : session.bow.nickname,
    build: build?.name ?? '',
    date: session.date,
    note: sheetNote(staleness) ?? undefined,
  };
}

export type Download = { body: string | Buffer; contentType: string; fileName: string };

export async function tapeDownload(user: User, sessionId: number, query: TapeQuery): Promise<Download> {
  const session = await findOwnSession(user, sessionId, undefined, 'read');
  const layout = await downloadLayout(session, query);
  return {
    body: tapeSvgFor(session.fit as StoredFit, layout),
    contentType: 'image/svg+xml; charset=utf-8',
    fileName: `${fileStem(session.bow, session)}-tape.svg`,
  };
}

export async function sheetDownload(user: User, sessionId: number, query: TapeQuery, format: 'svg' | 'pdf'): Promise<Download> {
  const session = await findOwnSession(user, sessionId, undefined, 'read');
  const layout = await downloadLayout(session, query);
  const labels = await sheetLabels(session, layout);
  const fit = session.fit as StoredFit;
  if (format === 'svg') {
    return { body: sheetSvgFor(fit, layout, labels), contentType: 'image/svg+xml; charset=utf-8', fileName: `${fileStem(session.bow, session)}-sheet.svg` };
  }
  return { body: await sheetPdfFor(fit, layout, labels), contentType: 'application/pdf', fileName: `${fileStem(session.bow, session)}-sheet.pdf` };
}
