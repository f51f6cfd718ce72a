/**
 * Before a trip: one bow's readiness on one page — the level state, the marks
 * of the latest sight-in session (each one shot at the range, so confirmed)
 * and the longest of them, the saved tape and the session it was printed
 * from (the newest sight-in with a tape), and plain warnings about what to
 * look at before leaving.
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

type StoredWarning = { code?: string; distance?: number; message?: string };

/** "24 Oct 2026" from "2026-10-24" (a calendar date, no zone shift). */
function dayWords(isoDate: string): string {
  const date = new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDate;
  return date.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
}

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
  for (const item of stored.warnings as Array<StoredWarning | string>) {
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

  // The tape for the trip: from the newest sight-in that has one (a newer sight-in supersedes
  // older tapes), the last saved of that session's tapes.
  const tapes = sessions.length
    ? await Tape.findAll({ where: { sessionId: { [Op.in]: sessions.map((s) => s.id) } }, order: [['createdAt', 'DESC'], ['id', 'DESC']] })
    : [];
  const tapeRow = sessions.map((session) => tapes.find((t) => t.sessionId === session.id)).find(Boolean) ?? null;
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
        `${bowChangeLabels[first.kind]} after the latest sight-in (${dayWords(latest.date)}): the marks may have moved; confirm them at the range.`,
      );
    }
  }
  if (latest) {
    const span = tapeRow && tapeRow.sessionId === latest.id && tapeRow.unit === ((latest.fit as { distanceUnit?: string })?.distanceUnit ?? 'yd')
      ? { from: tapeRow.fromDistance, to: tapeRow.toDistance }
      : null;
    warnings.push(...fitWarnings(latest.fit, span));
  }
  if (!tapeRow) {
    if (latest) warnings.push('No tape saved for this bow yet.');
  } else {
    if (latest && tapeRow.sessionId !== latest.id) {
      warnings.push(`The saved tape was printed from an older sight-in (${dayWords(tapeSession!.date)}); print one from the latest marks (${dayWords(latest.date)}).`);
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
