/**
 * Before a trip: one bow's readiness on one page — the level state, then for
 * each arrow build on its own: the marks of its latest sight-in (each one shot
 * at the range, so confirmed) and the longest of them, its saved tape and the
 * sight-in it was printed from (the newest of that build's sight-ins with a
 * tape: never another build's), and plain warnings about what to look at
 * before leaving. Sight-ins are named by shared/sight-in-name.ts.
 */
import { Op } from 'sequelize';
import { distanceToMetres } from '@/math/units/convert';
import { ArrowBuild, SightInMark, SightIn, Tape, type User } from '@/server/models';
import { bowFor } from '@/server/services/bow-access';
import { levelSummaryForBows } from '@/server/services/level-service';
import { stalenessForBows } from '@/server/services/staleness-service';
import type { TripBuild, TripByBuild } from '@/shared/trip';
import { sightInName } from '@/shared/sight-in-name';
import { calendarDayWords } from '@/shared/day-words';

/** Distances compared in metres (math/units, exact). */
const inMetres = distanceToMetres;

type StoredWarning = { code?: string; distance?: number; message?: string };

function listWords(items: string[]): string {
  return items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/**
 * The stored fit's warnings as a few sentences: the "confirm at this distance"
 * ones gathered into one (only those on the saved tape's span when there is a
 * tape: that is what goes on the trip), the others as they are.
 */
function fitWarnings(fit: unknown, span: { from: number; to: number } | null): string[] {
  const stored = fit as { warnings?: unknown; distanceUnit?: unknown } | null;
  if (!Array.isArray(stored?.warnings)) return [];
  const unit = stored.distanceUnit === 'm' ? 'm' : 'yd';
  const confirm: number[] = [];
  const others: string[] = [];
  for (const item of stored.warnings as (StoredWarning | string)[]) {
    if (typeof item === 'string') {
      others.push(item);
      continue;
    }
    if ((item.code === 'verify' || item.code === 'out-of-reach') && typeof item.distance === 'number') {
      if (!span || (item.distance >= span.from - 1e-9 && item.distance <= span.to + 1e-9)) confirm.push(item.distance);
    } else if (typeof item.message === 'string' && item.code !== 'slope-estimate') {
      others.push(item.message);
    }
  }
  const sentences = others.map((text) => `Fit: ${text}.`.replace(/\.\.$/, '.'));
  if (confirm.length > 0) {
    const distances = [...new Set(confirm)].sort((a, b) => a - b).map(String);
    sentences.unshift(
      `Fit: confirm at ${listWords(distances)} ${unit} before relying on ${span ? 'the tape' : 'the fit'} there; the predicted marks are uncertain.`,
    );
  }
  return sentences;
}

type SightInRow = Pick<SightIn, 'id' | 'date' | 'placeLabel' | 'buildId' | 'fit' | 'createdAt'>;

/** One build's part: its latest sight-in's marks, its latest tape and its warnings. */
async function buildPart(
  bowId: number,
  build: { id: number; name: string },
  sightIns: SightInRow[],
  allSightIns: SightInRow[],
  tapes: Tape[],
): Promise<TripBuild> {
  // Model instances keep their values behind getters: copy the fields the name needs.
  const nameable = (s: SightInRow) => ({
    id: s.id,
    date: s.date,
    placeLabel: s.placeLabel,
    buildId: s.buildId,
    createdAt: s.createdAt.toISOString(),
  });
  const siblings = allSightIns.map(nameable);
  const nameOf = (sightIn: SightInRow) => sightInName(nameable(sightIn), { buildName: build.name, siblings, timeZone: 'UTC' });
  const latest = sightIns[0] ?? null;
  const marks = latest ? await SightInMark.findAll({ where: { sightInId: latest.id }, order: [['position', 'ASC']] }) : [];
  let longest: SightInMark | null = null;
  for (const mark of marks) {
    if (!longest || inMetres(mark.distance, mark.unit) > inMetres(longest.distance, longest.unit)) longest = mark;
  }
  // The build's tape: from the newest of its sight-ins that has one, the last saved of that sight-in's tapes.
  const tapeRow = sightIns.map((sightIn) => tapes.find((t) => t.sightInId === sightIn.id)).find(Boolean) ?? null;
  const tapeSightIn = tapeRow ? sightIns.find((s) => s.id === tapeRow.sightInId)! : null;

  const warnings: string[] = [];
  if (!latest) {
    warnings.push('Not sighted in yet: no confirmed marks and no tape for this build.');
  } else {
    if (marks.length < 2) warnings.push('The latest sight-in has fewer than two marks; a tape needs at least two.');
    // The one staleness rule (shared/staleness.ts): a change that moves the point of impact after
    // this build's latest sight-in (or after the sight-in of its tape) means confirming at the range.
    const staleness = (await stalenessForBows([bowId])).get(bowId);
    const ofLatest = staleness?.bySightIn.get(latest.id);
    if (ofLatest?.state === 'confirm') warnings.push(`Latest sight-in (${calendarDayWords(latest.date)}): ${ofLatest.reason}`);
    if (tapeRow && tapeSightIn && tapeSightIn.id !== latest.id) {
      const ofTape = staleness?.bySightIn.get(tapeSightIn.id);
      if (ofTape?.state === 'confirm') warnings.push(`Saved tape (${calendarDayWords(tapeSightIn.date)}): ${ofTape.reason}`);
    }
    const span =
      tapeRow && tapeRow.sightInId === latest.id && tapeRow.unit === ((latest.fit as { distanceUnit?: string })?.distanceUnit ?? 'yd')
        ? { from: tapeRow.fromDistance, to: tapeRow.toDistance }
        : null;
    warnings.push(...fitWarnings(latest.fit, span));
    if (!tapeRow) warnings.push('No tape saved for this build yet.');
  }
  if (tapeRow && latest) {
    if (tapeRow.sightInId !== latest.id) {
      warnings.push(
        `The saved tape was printed from an older sight-in (${nameOf(tapeSightIn!)}); print one from the latest marks (${nameOf(latest)}).`,
      );
    }
    if (longest && inMetres(tapeRow.toDistance, tapeRow.unit) > inMetres(longest.distance, longest.unit) + 1e-6) {
      warnings.push(
        `The tape runs to ${tapeRow.toDistance} ${tapeRow.unit}, beyond the longest confirmed mark (${longest.distance} ${longest.unit}): the distances beyond it are estimates until shot at the range.`,
      );
    }
  }
  return {
    build,
    marks: latest
      ? {
          sightInId: latest.id,
          name: nameOf(latest),
          date: latest.date,
          placeLabel: latest.placeLabel,
          marks: marks.map((m) => ({ distance: m.distance, unit: m.unit, scaleMm: m.scaleMm })),
          longestDistance: longest?.distance ?? null,
          longestUnit: longest?.unit ?? null,
        }
      : null,
    tape: tapeRow
      ? {
          id: tapeRow.id,
          sightInId: tapeRow.sightInId,
          sightInName: nameOf(tapeSightIn!),
          sightInDate: tapeSightIn!.date,
          fromDistance: tapeRow.fromDistance,
          toDistance: tapeRow.toDistance,
          unit: tapeRow.unit,
          label: tapeRow.label,
          savedAt: tapeRow.createdAt.toISOString(),
          fromLatestSightIn: latest !== null && tapeRow.sightInId === latest.id,
        }
      : null,
    warnings,
  };
}

/**
 * GET /api/bows/:bowId/readiness
 * Example: (await tripReadiness(marit, 3)).builds[0].tape?.fromLatestSightIn → true
 */
export async function tripReadiness(user: User, bowId: number, now = new Date()): Promise<TripByBuild> {
  const { bow } = await bowFor(user, bowId, 'read');
  const level = (await levelSummaryForBows([bowId], now)).get(bowId)!;

  // Sight-ins newest first by date, then id (the same order the bench uses).
  const [sightIns, builds] = await Promise.all([
    SightIn.findAll({
      where: { bowId },
      attributes: ['id', 'date', 'placeLabel', 'buildId', 'fit', 'createdAt'],
      order: [
        ['date', 'DESC'],
        ['id', 'DESC'],
      ],
    }),
    ArrowBuild.findAll({ where: { bowId }, attributes: ['id', 'name'], order: [['id', 'ASC']] }),
  ]);
  const tapes = sightIns.length
    ? await Tape.findAll({
        where: { sightInId: { [Op.in]: sightIns.map((s) => s.id) } },
        order: [
          ['createdAt', 'DESC'],
          ['id', 'DESC'],
        ],
      })
    : [];
  // Builds with sight-ins in the order of their latest sight-in, then the others.
  const order = (build: ArrowBuild) => {
    const index = sightIns.findIndex((sightIn) => sightIn.buildId === build.id);
    return index < 0 ? sightIns.length + build.id : index;
  };
  const sorted = [...builds].sort((a, b) => order(a) - order(b));
  const parts = await Promise.all(
    sorted.map((build) =>
      buildPart(
        bowId,
        { id: build.id, name: build.name },
        sightIns.filter((s) => s.buildId === build.id),
        sightIns,
        tapes,
      ),
    ),
  );

  const bowWarnings: string[] = [];
  if (level.state !== 'verified') bowWarnings.push(`Level: ${level.reason}`);
  else if (!level.rangeConfirmed)
    bowWarnings.push('The level was verified on the bench only; confirm with a long shot and a steep shot at the range.');
  if (sightIns.length === 0) bowWarnings.push('No sight-in yet: there are no confirmed marks for this bow.');

  // The older single-build fields: the build of the latest sight-in.
  const main = sightIns.length ? parts[0] : null;
  const sighted = parts.filter((part) => part.marks !== null);
  const warnings = [
    ...bowWarnings,
    ...sighted.flatMap((part) => (part === main ? part.warnings : part.warnings.map((warning) => `${part.build.name}: ${warning}`))),
  ];

  return {
    bow: { id: bow.id, nickname: bow.nickname, sightDescription: bow.sightDescription },
    level,
    marks: main?.marks
      ? {
          sightInId: main.marks.sightInId,
          date: main.marks.date,
          placeLabel: main.marks.placeLabel,
          buildName: main.build.name,
          marks: main.marks.marks,
          longestDistance: main.marks.longestDistance,
          longestUnit: main.marks.longestUnit,
        }
      : null,
    tape: main?.tape
      ? {
          id: main.tape.id,
          sightInId: main.tape.sightInId,
          sightInDate: main.tape.sightInDate,
          fromDistance: main.tape.fromDistance,
          toDistance: main.tape.toDistance,
          unit: main.tape.unit,
          label: main.tape.label,
          savedAt: main.tape.savedAt,
          fromLatestSightIn: main.tape.fromLatestSightIn,
        }
      : null,
    warnings,
    bowWarnings,
    builds: parts,
    generatedAt: now.toISOString(),
  };
}
