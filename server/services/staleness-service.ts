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
import { ArrowBuild, BowChange, RangeConfirmation, SightIn, Tape, type User } from '@/server/models';
import { sightInFor } from '@/server/services/bow-access';
import { confirmationsOf, personJson } from '@/server/services/tuning-service';
import { currentStaleness, fitStaleness, type FitFacts, type ImpactChange, type Staleness } from '@/shared/staleness';
import type { BowConfirm, SightInStaleness } from '@/shared/staleness-api';
import type { BowChangeKind } from '@/shared/level-status';

/**
 * A build counts as edited when saved more than this after it was created (the
 * create itself sets both stamps within a few milliseconds).
 */
const editedAfterMs = 2000;

export interface BowStaleness {
  bySightIn: Map<number, Staleness>;
  /** The latest tape's (or, without a tape, the latest sight-in's) need to be confirmed, or null. */
  confirm: BowConfirm | null;
}

/**
 * What stalenessForBows reads, when the caller has it already (the bow read
 * path, server/services/bow-read.ts, gets it in its one query): sight-ins
 * newest first, changes, builds, range confirmations, tapes newest first.
 */
export type StalenessFacts = {
  sightIns: { id: number; bowId: number; buildId: number; date: string; createdAt: Date }[];
  changes: { id: number; bowId: number; kind: string; changedAt: Date; note: string }[];
  builds: { id: number; bowId: number; createdAt: Date; updatedAt: Date }[];
  confirmations: { sightInId: number; confirmedAt: Date }[];
  tapes: { id: number; sightInId: number; createdAt: Date }[];
};

async function stalenessFacts(ids: number[]): Promise<StalenessFacts> {
  const [sightIns, changes, builds] = await Promise.all([
    SightIn.findAll({
      where: { bowId: { [Op.in]: ids } },
      attributes: ['id', 'bowId', 'buildId', 'date', 'createdAt'],
      order: [
        ['date', 'DESC'],
        ['id', 'DESC'],
      ],
    }),
    BowChange.findAll({ where: { bowId: { [Op.in]: ids } }, attributes: ['id', 'bowId', 'kind', 'changedAt', 'note'] }),
    ArrowBuild.findAll({ where: { bowId: { [Op.in]: ids } }, attributes: ['id', 'bowId', 'createdAt', 'updatedAt'] }),
  ]);
  const sightInIds = sightIns.map((s) => s.id);
  const [confirmations, tapes] = await Promise.all([
    sightInIds.length
      ? RangeConfirmation.findAll({ where: { sightInId: { [Op.in]: sightInIds } }, attributes: ['sightInId', 'confirmedAt'] })
      : [],
    sightInIds.length
      ? Tape.findAll({
          where: { sightInId: { [Op.in]: sightInIds } },
          attributes: ['id', 'sightInId', 'createdAt'],
          order: [
            ['createdAt', 'DESC'],
            ['id', 'DESC'],
          ],
        })
      : [],
  ]);
  return { sightIns, changes, builds, confirmations, tapes } as StalenessFacts;
}

/** Staleness of every sight-in of each bow, and the one line the Bench shows. */
export async function stalenessForBows(bowIds: readonly number[], facts?: StalenessFacts): Promise<Map<number, BowStaleness>> {
  const ids = [...new Set(bowIds)];
  const result = new Map<number, BowStaleness>();
  if (ids.length === 0) return result;
  const { sightIns, changes, builds, confirmations, tapes } = facts ?? (await stalenessFacts(ids));
  for (const bowId of ids) {
    const ofBow = sightIns.filter((s) => s.bowId === bowId);
    const fits: FitFacts[] = ofBow.map((s) => ({ id: s.id, buildId: s.buildId, date: s.date, createdAt: s.createdAt }));
    const impact: ImpactChange[] = [
      ...changes.filter((c) => c.bowId === bowId).map((c) => ({ id: c.id, kind: c.kind as BowChangeKind, at: c.changedAt, note: c.note })),
      ...builds
        .filter((b) => b.bowId === bowId && b.updatedAt.getTime() - b.createdAt.getTime() > editedAfterMs)
        .map((b) => ({ id: `build-${b.id}`, kind: 'build' as const, at: b.updatedAt, buildId: b.id })),
    ];
    const confirms = confirmations.map((c) => ({ sightInId: c.sightInId, at: c.confirmedAt }));
    const bySightIn = new Map<number, Staleness>();
    for (const fit of fits) bySightIn.set(fit.id, fitStaleness({ fit, fits, changes: impact, confirmations: confirms }));

    // What the Bench shows: the tape it would print (the newest sight-in with a tape, its last
    // tape), else the latest sight-in.
    const tape = ofBow.map((s) => tapes.find((t) => t.sightInId === s.id)).find(Boolean) ?? null;
    const latest = ofBow[0] ?? null;
    let confirm: BowConfirm | null = null;
    for (const [what, sightInId, tapeId] of [
      ['Tape', tape?.sightInId ?? null, tape?.id ?? null],
      ['Sight-in', latest?.id ?? null, null],
    ] as const) {
      if (sightInId === null) continue;
      const staleness = bySightIn.get(sightInId) ?? currentStaleness;
      if (staleness.state === 'confirm') {
        confirm = { reason: `${what}: ${staleness.reason}`, since: staleness.since, sightInId, tapeId };
        break;
      }
    }
    result.set(bowId, { bySightIn, confirm });
  }
  return result;
}

/** The staleness of one sight-in (no access check). */
export async function stalenessOfSightIn(bowId: number, sightInId: number): Promise<Staleness> {
  return (await stalenessForBows([bowId])).get(bowId)?.bySightIn.get(sightInId) ?? currentStaleness;
}

/** GET /api/sight-ins/:id/staleness: whether to confirm the marks at the range, why, and the confirmations so far. */
export async function sightInStaleness(user: User, sightInId: number): Promise<SightInStaleness> {
  const { sightIn, ...access } = await sightInFor(user, sightInId, 'read');
  const [staleness, confirmations] = await Promise.all([stalenessOfSightIn(sightIn.bowId, sightInId), confirmationsOf([sightInId])]);
  return {
    sightInId,
    ...staleness,
    canConfirm: access.owner || access.shareId !== null,
    confirmations: confirmations.map((c) => ({
      id: c.id,
      confirmedAt: c.confirmedAt.toISOString(),
      note: c.note,
      confirmedBy: personJson(c.confirmedBy),
    })),
  };
}
