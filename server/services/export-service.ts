/**
 * Taking a bow's records out of Pinwright: the builds, sight-ins and marks as
 * JSON (the whole structure, as the API returns it) or as one CSV table (one
 * row per mark, with its sight-in and build beside it; a build without
 * sight-ins or a sight-in without marks gets a row with the mark cells empty),
 * and a tape's print sheet sent by e-mail as a PDF. The JSON carries the
 * tuning records too (set-up entries, paper-tune runs, arrow sets, range
 * confirmations); GET /api/bows/:id/tuning.csv gives them as their own table.
 *
 * Example: (await exportBowCsv(marit, 12)).body.split('\r\n')[0]
 *   → 'bow,build_id,build,shaft,spine,…,distance,unit,reading_mm,arrows,mark_note'
 */
import { Op } from 'sequelize';
import { toCsv, type CsvCell } from '@/server/csv';
import { ApiError, validationError } from '@/server/errors';
import { tapeMessage } from '@/server/mail/messages';
import { ArrowBuild, SightInMark, SightIn, type User } from '@/server/models';
import { recordAudit } from '@/server/services/audit-service';
import { bowFor, sightInFor } from '@/server/services/bow-access';
import { bowOut } from '@/server/services/bow-service';
import { buildOut, sightInCounts } from '@/server/services/build-service';
import { sendMail } from '@/server/services/mail-service';
import { listArrowSets } from '@/server/services/arrow-set-service';
import { confirmationsOf, listRuns, listSetup, personJson } from '@/server/services/tuning-service';
import { sightInOut } from '@/server/services/sight-in-service';
import { sheetDownload } from '@/server/services/tape-service';
import type { SendTape } from '@/shared/export';
import { tapeQuerySchema, type TapeQuery } from '@/shared/tape';

export type ExportFile = { body: string | Buffer; contentType: string; fileName: string };

/**
 * A name as a file-name part; `fallback` when nothing of it is left.
 * Example: slug('Ridge slider #2') → 'ridge-slider-2'; slug('Marit Holm', 'account') → 'marit-holm'
 */
export function slug(text: string, fallback = 'bow'): string {
  return (
    text
      .normalize('NFKD')
      .replace(/[^\w\s-]/g, '')
      .trim()
      .toLowerCase()
      .replace(/[\s_-]+/g, '-') || fallback
  );
}

async function recordsOf(user: User, bowId: number) {
  const { bow } = await bowFor(user, bowId, 'read');
  const [builds, sightIns] = await Promise.all([
    ArrowBuild.findAll({ where: { bowId }, order: [['id', 'ASC']] }),
    SightIn.findAll({
      where: { bowId },
      order: [
        ['date', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
  ]);
  const marks = sightIns.length
    ? await SightInMark.findAll({
        where: { sightInId: { [Op.in]: sightIns.map((s) => s.id) } },
        order: [
          ['sightInId', 'ASC'],
          ['position', 'ASC'],
        ],
      })
    : [];
  const counts = await sightInCounts(builds.map((b) => b.id));
  return { bow, builds, sightIns, marks, counts };
}

/** GET /api/bows/:id/export.json */
export async function exportBowJson(user: User, bowId: number, now = new Date()): Promise<ExportFile> {
  const { bow, builds, sightIns, marks, counts } = await recordsOf(user, bowId);
  const document = {
    format: 'pinwright-bow-export',
    version: 1,
    exportedAt: now.toISOString(),
    note: 'Lengths in millimetres, masses in grains, speeds in feet per second; distances in the unit given with each mark.',
    bow: bowOut(bow),
    builds: builds.map((build) => buildOut(build, counts.get(build.id) ?? 0)),
    sightIns: sightIns.map((sightIn) =>
      sightInOut(
        sightIn,
        marks.filter((mark) => mark.sightInId === sightIn.id),
      ),
    ),
    ...(await tuningRecords(user, bowId, builds)),
  };
  return {
    body: `${JSON.stringify(document, null, 2)}\n`,
    contentType: 'application/json; charset=utf-8',
    fileName: `${slug(bow.nickname)}-export.json`,
  };
}

/** The bow's tuning records for the JSON export: set-up entries, paper-tune runs, arrow sets, range confirmations. */
async function tuningRecords(user: User, bowId: number, builds: ArrowBuild[]) {
  const [setup, paperTunes, arrowSetsByBuild, confirmations] = await Promise.all([
    listSetup(user, bowId),
    listRuns(user, bowId),
    Promise.all(builds.map((build) => listArrowSets(user, build.id))),
    SightIn.findAll({ where: { bowId }, attributes: ['id'] }).then((rows) => confirmationsOf(rows.map((row) => row.id))),
  ]);
  return {
    setupEntries: setup.entries,
    paperTuneRuns: paperTunes,
    arrowSets: arrowSetsByBuild.flat(),
    rangeConfirmations: confirmations.map((c) => ({
      sightInId: c.sightInId,
      confirmedAt: c.confirmedAt.toISOString(),
      note: c.note,
      confirmedBy: personJson(c.confirmedBy),
    })),
  };
}

const tuningCsvHeader = ['bow', 'record', 'record_id', 'date', 'item', 'value_mm', 'choice', 'weight_gr', 'detail', 'added_by'];

/**
 * GET /api/bows/:id/tuning.csv — the tuning records as one long table: a row per
 * set-up entry, paper-tune shot (and run end), arrow, range confirmation.
 */
export async function exportTuningCsv(user: User, bowId: number): Promise<ExportFile> {
  const { bow } = await bowFor(user, bowId, 'read');
  const builds = await ArrowBuild.findAll({ where: { bowId }, order: [['id', 'ASC']] });
  const records = await tuningRecords(user, bowId, builds);
  const rows: CsvCell[][] = [tuningCsvHeader];
  for (const entry of [...records.setupEntries].reverse()) {
    rows.push([
      bow.nickname,
      'setup',
      entry.id,
      entry.measuredOn,
      entry.measure,
      entry.valueMm,
      entry.choice,
      null,
      entry.note,
      entry.addedBy.name,
    ]);
  }
  for (const run of [...records.paperTuneRuns].reverse()) {
    for (const shot of run.shots) {
      const detail = [
        `${run.distance} ${run.unit}`,
        shot.changedBefore !== 'none' ? `changed before: ${shot.changedBefore} ${shot.changeNote}`.trim() : '',
        shot.note,
      ]
        .filter(Boolean)
        .join('; ');
      rows.push([
        bow.nickname,
        'paper-tune-shot',
        run.id,
        shot.createdAt.slice(0, 10),
        `shot ${shot.position + 1}: ${shot.tear}`,
        shot.lengthMm,
        null,
        null,
        detail,
        shot.addedBy.name,
      ]);
    }
    if (run.outcome !== 'open')
      rows.push([
        bow.nickname,
        'paper-tune-end',
        run.id,
        run.endedAt?.slice(0, 10) ?? null,
        run.outcome,
        null,
        null,
        null,
        run.endNote,
        run.addedBy.name,
      ]);
  }
  for (const set of records.arrowSets) {
    for (const arrow of set.arrows) {
      const spin =
        arrow.spinKind === 'thou' ? `runout ${arrow.runout} thou` : arrow.spinKind === 'mm' ? `runout ${arrow.runout} mm` : arrow.spinKind;
      const detail = [
        `set ${set.name} (±${set.toleranceGr} gr)`,
        `spin ${spin}`,
        arrow.status,
        arrow.note,
        arrow.fliers.length ? `flew out at ${arrow.fliers.length} sight-in(s)` : '',
      ]
        .filter(Boolean)
        .join('; ');
      rows.push([
        bow.nickname,
        'arrow',
        arrow.id,
        set.createdAt.slice(0, 10),
        `arrow ${arrow.number}`,
        null,
        null,
        arrow.weightGr,
        detail,
        set.addedBy.name,
      ]);
    }
  }
  for (const c of records.rangeConfirmations) {
    rows.push([
      bow.nickname,
      'range-confirmation',
      c.sightInId,
      c.confirmedAt.slice(0, 10),
      'marks confirmed at the range',
      null,
      null,
      null,
      c.note,
      c.confirmedBy.name,
    ]);
  }
  return { body: toCsv(rows), contentType: 'text/csv; charset=utf-8', fileName: `${slug(bow.nickname)}-tuning.csv` };
}

const csvHeader = [
  'bow',
  'build_id',
  'build',
  'shaft',
  'spine',
  'grains_per_inch',
  'cut_length_mm',
  'point_gr',
  'total_gr',
  'foc_pct',
  'build_speed_fps',
  'sight_in_id',
  'sight_in_date',
  'place',
  'altitude_m',
  'temperature_c',
  'sight_in_notes',
  'fit_speed_fps',
  'fit_rms_mm',
  'mark_position',
  'distance',
  'unit',
  'reading_mm',
  'arrows',
  'mark_note',
];

/** GET /api/bows/:id/export.csv — text cells neutralised against formula injection (server/csv/write.ts). */
export async function exportBowCsv(user: User, bowId: number): Promise<ExportFile> {
  const { bow, builds, sightIns, marks } = await recordsOf(user, bowId);
  const rows: CsvCell[][] = [csvHeader];
  const buildCells = (build: ArrowBuild | undefined): CsvCell[] =>
    build
      ? [
          build.id,
          build.name,
          build.shaftLabel,
          build.spine,
          build.grainsPerInch,
          build.cutLengthMm,
          build.pointGr,
          build.totalGr,
          build.focPct,
          build.speedFps,
        ]
      : Array(10).fill(null);
  for (const build of builds) {
    const ofBuild = sightIns.filter((sightIn) => sightIn.buildId === build.id);
    if (ofBuild.length === 0) rows.push([bow.nickname, ...buildCells(build), ...Array(14).fill(null)]);
    for (const sightIn of ofBuild) {
      const sightInCells: CsvCell[] = [
        sightIn.id,
        sightIn.date,
        sightIn.placeLabel,
        sightIn.altitudeM,
        sightIn.temperatureC,
        sightIn.notes,
        sightIn.fitSpeedFps,
        sightIn.fitRmsMm,
      ];
      const ofSightIn = marks.filter((mark) => mark.sightInId === sightIn.id);
      if (ofSightIn.length === 0) rows.push([bow.nickname, ...buildCells(build), ...sightInCells, ...Array(6).fill(null)]);
      for (const mark of ofSightIn) {
        rows.push([
          bow.nickname,
          ...buildCells(build),
          ...sightInCells,
          mark.position + 1,
          mark.distance,
          mark.unit,
          mark.scaleMm,
          mark.arrowsShot,
          mark.note,
        ]);
      }
    }
  }
  return { body: toCsv(rows), contentType: 'text/csv; charset=utf-8', fileName: `${slug(bow.nickname)}-export.csv` };
}

/**
 * POST /api/sight-ins/:id/send-tape: the sight-in's print sheet (the same PDF
 * as GET /api/sight-ins/:id/sheet.pdf) e-mailed as an attachment.
 */
export async function sendTape(user: User, sightInId: number, { to, paper, tape, layout }: SendTape): Promise<{ fileName: string }> {
  const { sightIn } = await sightInFor(user, sightInId, 'read');
  let query: TapeQuery = { tape } as TapeQuery;
  if (layout !== undefined) {
    const parsed = tapeQuerySchema.safeParse(Object.fromEntries(new URLSearchParams(layout)));
    if (!parsed.success) throw validationError(parsed.error, 'layout');
    query = parsed.data;
  }
  if (paper) query = { ...query, paper };
  const pdf = await sheetDownload(user, sightInId, query, 'pdf');
  try {
    await sendMail({
      to,
      ...tapeMessage({ senderName: user.name, bowNickname: sightIn.bow.nickname, sightInDate: sightIn.date, filename: pdf.fileName }),
      attachments: [{ filename: pdf.fileName, content: pdf.body as Buffer, contentType: 'application/pdf' }],
    });
  } catch (err) {
    console.error(`Tape e-mail to ${to} could not be sent: ${err instanceof Error ? err.message : err}`);
    throw new ApiError(502, 'mail_failed', 'The e-mail could not be sent. Try again in a few minutes, or download the PDF instead.');
  }
  await recordAudit({
    actorId: user.id,
    action: 'sent',
    bowId: sightIn.bowId,
    recordType: 'tape-sheet',
    recordId: sightIn.id,
    summary: `Sent the print sheet of the ${sightIn.date} sight-in to ${to}`,
  });
  return { fileName: pdf.fileName };
}
