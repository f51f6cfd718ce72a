/**
 * The facts the staleness rule (shared/staleness.ts) reads, gathered for some
 * bows in a fixed number of queries: their sight-ins, their logged changes,
 * their arrow builds' edits and the "confirmed at the range" records. Used by
 * the bow list and detail (the Bench and the Bow), the before-a-trip
 * readiness, the sight-in and tape screens and the printed sheet.
 *
 * Example: (await stalenessForBows([12])).get(12)?.confirm?.reason
 *   → 'Tape: Peep moved on 2 Dec 2026, after this sight-in: confirm the marks at the range.'
 */
import { Op } from 'sequelize';
import { ApiError } from '@/server/errors';
import { ArrowBuild, BowChange, RangeConfirmation, SightSession, Tape, type User } from '@/server/models';
import { bowFor } from '@/server/services/bow-access';
import { confirmationsOf, personJson } from '@/server/services/tuning-service';
import { currentStaleness, fitStaleness, type FitFacts, type ImpactChange, type Staleness } from '@/shared/staleness';
import type { BowConfirm, SessionStaleness } from '@/shared/staleness-api';
import type { BowChangeKind } from '@/shared/level-status';

/**
 * A build counts as edited when saved more than this after it was created (the
 * create itself sets both stamps within a few milliseconds).
 */
const editedAfterMs = 2000;

export interface BowStaleness {
  bySession: Map<number, Staleness>;
  /** The latest tape's (or, without a tape, the latest sight-in's) need to be confirmed, or null. */
  confirm: BowConfirm | null;
}

/**
 * What stalenessForBows reads, when the caller has it already (the bow read
 * path, server/services/bow-read.ts, gets it in its one query): sight-ins
 * newest first, changes, builds, range confirmations, tapes newest first.
 */
export type StalenessFacts = {
  sessions: Array<{ id: number; bowId: number; buildId: number; date: string; createdAt: Date }>;
  changes: Array<{ id: number; bowId: number; kind: string; changedAt: Date; note: string }>;
  builds: Array<{ id: number; bowId: number; createdAt: Date; updatedAt: Date }>;
  confirmations: Array<{ sessionId: number; confirmedAt: Date }>;
  tapes: Array<{ id: number; sessionId: number; createdAt: Date }>;
};

async function stalenessFacts(ids: number[]): Promise<StalenessFacts> {
  const [sessions, changes, builds] = await Promise.all([
    SightSession.findAll({ where: { bowId: { [Op.in]: ids } }, attributes: ['id', 'bowId', 'buildId', 'date', 'createdAt'], order: [['date', 'DESC'], ['id', 'DESC']] }),
    BowChange.findAll({ where: { bowId: { [Op.in]: ids } }, attributes: ['id', 'bowId', 'kind', 'changedAt', 'note'] }),
    ArrowBuild.findAll({ where: { bowId: { [Op.in]: ids } }, attributes: ['id', 'bowId', 'createdAt', 'updatedAt'] }),
  ]);
  const sessionIds = sessions.map((s) => s.id);
  const [confirmations, tapes] = await Promise.all([
    sessionIds.length ? RangeConfirmation.findAll({ where: { sessionId: { [Op.in]: sessionIds } }, attributes: ['sessionId', 'confirmedAt'] }) : [],
    sessionIds.length
      ? Tape.findAll({ where: { sessionId: { [Op.in]: sessionIds } }, attributes: ['id', 'sessionId', 'createdAt'], order: [['createdAt', 'DESC'], ['id', 'DESC']] })
      : [],
  ]);
  return { sessions, changes, builds, confirmations, tapes } as StalenessFacts;
}

/** Staleness of every sight-in of each bow, and the one line the Bench shows. */
export async function stalenessForBows(bowIds: readonly number[], facts?: StalenessFacts): Promise<Map<number, BowStaleness>> {
  const ids = [...new Set(bowIds)];
  const result = new Map<number, BowStaleness>();
  if (ids.length === 0) return result;
  const { sessions, changes, builds, confirmations, tapes } = facts ?? (await stalenessFacts(ids));
  for (const bowId of ids) {
    const ofBow = sessions.filter((s) => s.bowId === bowId);
    const fits: FitFacts[] = ofBow.map((s) => ({ id: s.id, buildId: s.buildId, date: s.date, createdAt: s.createdAt }));
    const impact: ImpactChange[] = [
      ...changes.filter((c) => c.bowId === bowId).map((c) => ({ id: c.id, kind: c.kind as BowChangeKind, at: c.changedAt, note: c.note })),
      ...builds
        .filter((b) => b.bowId === bowId && b.updatedAt.getTime() - b.createdAt.getTime() > editedAfterMs)
        .map((b) => ({ id: `build-${b.id}`, kind: 'build' as const, at: b.updatedAt, buildId: b.id })),
    ];
    const confirms = confirmations.map((c) => ({ sessionId: c.sessionId, at: c.confirmedAt }));
    const bySession = new Map<number, Staleness>();
    for (const fit of fits) bySession.set(fit.id, fitStaleness({ fit, fits, changes: impact, confirmations: confirms }));

    // What the Bench shows: the tape it would print (the newest sight-in with a tape, its last
    // tape), else the latest sight-in.
    const tape = ofBow.map((s) => tapes.find((t) => t.sessionId === s.id)).find(Boolean) ?? null;
    const latest = ofBow[0] ?? null;
    let confirm: BowConfirm | null = null;
    for (const [what, sessionId, tapeId] of [
      ['Tape', tape?.sessionId ?? null, tape?.id ?? null],
      ['Sight-in', latest?.id ?? null, null],
    ] as const) {
      if (sessionId === null) continue;
      const staleness = bySession.get(sessionId) ?? currentStaleness;
      if (staleness.state === 'confirm') {
        confirm = { reason: `${what}: ${staleness.reason}`, since: staleness.since, sessionId, tapeId };
        break;
      }
    }
    result.set(bowId, { bySession, confirm });
  }
  return result;
}

/** The staleness of one sight-in (no access check). */
export async function stalenessOfSession(bowId: number, sessionId: number): Promise<Staleness> {
  return (await stalenessForBows([bowId])).get(bowId)?.bySession.get(sessionId) ?? currentStaleness;
}

/** GET /api/sessions/:id/staleness: whether to confirm the marks at the range, why, and the confirmations so far. */
export async function sessionStaleness(user: User, sessionId: number): Promise<SessionStaleness> {
  const session = await SightSession.findByPk(sessionId, { attributes: ['id', 'bowId'] });
  if (!session) throw ApiError.notFound('That sight-in');
  const access = await bowFor(user, session.bowId, 'read', 'That sight-in');
  const [staleness, confirmations] = await Promise.all([stalenessOfSession(session.bowId, sessionId), confirmationsOf([sessionId])]);
  return {
    sessionId,
    ...staleness,
    canConfirm: access.owner || access.shareId !== null,
    confirmations: confirmations.map((c) => ({ id: c.id, confirmedAt: c.confirmedAt.toISOString(), note: c.note, confirmedBy: personJson(c.confirmedBy) })),
  };
}
