/**
 * Before a trip: one bow's readiness on one page — the level state, the marks
 * of the latest sight-in session (each one shot at the range, so confirmed)
 * and the longest of them, the saved tape and the session it was printed
 * from, and plain warnings about what to look at before leaving.
 */
import { Op } from 'sequelize';
import { ArrowBuild, BowChange, SessionMark, SightSession, Tape, type User } from '@/server/models';
import { readableBow } from '@/server/services/bow-access';
import { levelSummaryForBows } from '@/server/services/level-service';
import { bowChangeLabels } from '@/shared/level-status';
import type { TripReadiness } from '@/shared/level';

/** 1 yd = 0.9144 m exactly (international yard and pound agreement, 1959). */
const metresPerYard = 0.9144;
const dayMs = 24 * 60 * 60 * 1000;
const inMetres = (distance: number, unit: 'yd' | 'm') => (unit === 'yd' ? distance * metresPerYard : distance);

/** The fit's own warnings, when the stored fit carries them (strings, or objects with a message). */
function fitWarnings(fit: unknown): string[] {
  const list = (fit as { warnings?: unknown } | null)?.warnings;
  if (!Array.isArray(list)) return [];
  return list
    .map((item) => (typeof item === 'string' ? item : typeof item?.message === 'string' ? (item.message as string) : null))
    .filter((text): text is string => Boolean(text));
}

/**
 * GET /api/bows/:bowId/readiness
 * Example: (await tripReadiness(marit, 3)).level.state → 'verified'
 */
export async function tripReadiness(user: User, bowId: number, now = new Date()): Promise<TripReadiness> {
  const bow = await readableBow(user, bowId);
  const level = (await levelSummaryForBows([bowId], now)).get(bowId)!;

  // The latest session by date, then id (the same order the bench uses).
  const sessions = await SightSession.findAll({
    where: { bowId },
    attributes: ['id', 'date', 'placeLabel', 'buildId', 'fit', 'createdAt'],
    order: [['date', 'DESC'], ['id', 'DESC']],
  });
  const latest = sessions[0] ?? null;
  const [marks, build] = latest
    ? await Promise.all([
        SessionMark.findAll({ where: { sessionId: latest.id }, order: [['position', 'ASC']] }),
        ArrowBuild.findByPk(latest.buildId, { attributes: ['id', 'name'] }),
      ])
    : [[], null];
  let longest: SessionMark | null = null;
  for (const mark of marks) {
    if (!longest || inMetres(mark.distance, mark.unit) > inMetres(longest.distance, longest.unit)) longest = mark;
  }

  const tapeRow = sessions.length
    ? await Tape.findOne({ where: { sessionId: { [Op.in]: sessions.map((s) => s.id) } }, order: [['createdAt', 'DESC'], ['id', 'DESC']] })
    : null;
  const tapeSession = tapeRow ? sessions.find((s) => s.id === tapeRow.sessionId)! : null;

  const warnings: string[] = [];
  if (level.state !== 'verified') warnings.push(`Level: ${level.reason}`);
  else if (!level.rangeConfirmed) warnings.push('The level was verified on the bench only; confirm with a long shot and a steep shot at the range.');
  if (!latest) {
    warnings.push('No sight-in session yet: there are no confirmed marks for this bow.');
  } else {
    if (marks.length < 2) warnings.push('The latest session has fewer than two marks; a tape needs at least two.');
    // Sessions carry a calendar date only: a change on a later date (UTC) is after it.
    const changedSinceSession = await BowChange.findAll({
      where: { bowId, changedAt: { [Op.gte]: new Date(new Date(`${latest.date}T00:00:00.000Z`).getTime() + dayMs) } },
      order: [['changedAt', 'ASC'], ['id', 'ASC']],
    });
    if (changedSinceSession.length > 0) {
      const first = changedSinceSession[0];
      warnings.push(
        `${bowChangeLabels[first.kind]} after the latest sight-in (${latest.date}): the marks may have moved; confirm them at the range.`,
      );
    }
    for (const text of fitWarnings(latest.fit)) warnings.push(`Fit: ${text}`);
  }
  if (!tapeRow) {
    if (latest) warnings.push('No tape saved for this bow yet.');
  } else {
    if (latest && tapeRow.sessionId !== latest.id) {
      warnings.push(`The saved tape was printed from an older session (${tapeSession!.date}); print one from the latest marks (${latest.date}).`);
    }
    if (longest && inMetres(tapeRow.toDistance, tapeRow.unit) > inMetres(longest.distance, longest.unit) + 1e-6) {
      warnings.push(
        `The tape runs to ${tapeRow.toDistance} ${tapeRow.unit}, beyond the longest confirmed mark (${longest.distance} ${longest.unit}): the distances beyond it are estimates until shot at the range.`,
      );
    }
  }

  return {
    bow: { id: bow.id, nickname: bow.nickname, sightDescription: bow.sightDescription },
    level,
    marks: latest
      ? {
          sessionId: latest.id,
          date: latest.date,
          placeLabel: latest.placeLabel,
          buildName: build?.name ?? null,
          marks: marks.map((m) => ({ distance: m.distance, unit: m.unit, scaleMm: m.scaleMm })),
          longestDistance: longest?.distance ?? null,
          longestUnit: longest?.unit ?? null,
        }
      : null,
    tape: tapeRow
      ? {
          id: tapeRow.id,
          sessionId: tapeRow.sessionId,
          sessionDate: tapeSession!.date,
          fromDistance: tapeRow.fromDistance,
          toDistance: tapeRow.toDistance,
          unit: tapeRow.unit,
          label: tapeRow.label,
          savedAt: tapeRow.createdAt.toISOString(),
          fromLatestSession: latest !== null && tapeRow.sessionId === latest.id,
        }
      : null,
    warnings,
    generatedAt: now.toISOString(),
  };
}
