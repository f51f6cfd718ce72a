/**
 * The one door to a bow: every load of a bow, or of a record on a bow, for a
 * user and a capability goes through this module. Four capabilities, always
 * named by the caller (there is no default):
 *   read      — see the bow and everything on it: its owner, or a technician
 *               with an active share of it;
 *   add       — add records to it (sight-ins, marks, tapes, level checks,
 *               changes, set-up entries, paper-tune runs, arrow sets): the
 *               same people as read. A service may let the person who added a
 *               record work on it further (a level check or paper-tune run
 *               they started, a change they logged, an arrow set they added);
 *   add-build — add an arrow build (a new, attributed entry: the archer's
 *               builds are never changed): the same people as read;
 *   change    — change or delete the archer's records, edit or delete the bow
 *               itself, share it: its owner only.
 * A share is checked on every request, so revoking it takes effect at once.
 * Someone who may not read a bow gets a 404 (never told apart from a missing
 * bow or record); a technician who may read it but asks to change gets a 403.
 *
 * Each loader returns the record with the access it was granted through
 * (`bow`, `owner`, `shareId`). Given a transaction, the record's row is
 * locked for update (with the bow row when it is read in the same query).
 */
import type { Includeable, Transaction } from 'sequelize';
import { ApiError } from '@/server/errors';
import {
  Arrow,
  ArrowBuild,
  ArrowSet,
  Bow,
  BowChange,
  LevelCheck,
  PaperTuneRun,
  Photo,
  Share,
  SightIn,
  Tape,
  type User,
} from '@/server/models';

export type BowCapability = 'read' | 'add' | 'add-build' | 'change';

/** How a user reaches a bow: as its owner, or through the active share `shareId`. */
export type BowAccess = { bow: Bow; owner: boolean; shareId: number | null };

/** A transaction to read (and lock) in; extra associations of the record to load with it. */
export type LoadOptions = { transaction?: Transaction; include?: Includeable[] };

type Who = Pick<User, 'id'>;

const lockOf = (transaction?: Transaction) => (transaction ? transaction.LOCK.UPDATE : undefined);

/**
 * The access `user` has to `bow` for `capability`: 404 (naming `what`) when
 * they cannot read it, 403 when they can but ask for 'change'.
 */
async function grant(
  user: Who,
  bow: Bow | null | undefined,
  capability: BowCapability,
  what: string,
  transaction?: Transaction,
): Promise<BowAccess> {
  if (!bow) throw ApiError.notFound(what);
  let access: BowAccess | null = null;
  if (bow.userId === user.id) access = { bow, owner: true, shareId: null };
  else {
    const share = await Share.findOne({ where: { bowId: bow.id, techId: user.id, state: 'active' }, attributes: ['id'], transaction });
    if (share) access = { bow, owner: false, shareId: share.id };
  }
  if (!access) throw ApiError.notFound(what);
  if (capability === 'change' && !access.owner) {
    throw ApiError.forbidden('A technician can add records to a shared bow but cannot delete or change the archer’s records.');
  }
  return access;
}

/**
 * The read rule in SQL, for the one-query bow read (bow-read.ts): true when
 * the asking account owns bow `b` or holds an active share of it. Takes the
 * asking account's id twice.
 */
export const readableBowSql =
  "(b.user_id = ? OR EXISTS (SELECT 1 FROM shares sh WHERE sh.bow_id = b.id AND sh.tech_id = ? AND sh.state = 'active'))";

/**
 * The bow, when `user` may use `capability` on it.
 * Example: const { bow, owner } = await bowFor(req.user, 12, 'read') — 404 for another account's bow 12
 */
export async function bowFor(
  user: Who,
  bowId: number,
  capability: BowCapability,
  { transaction }: Pick<LoadOptions, 'transaction'> = {},
): Promise<BowAccess> {
  const bow = await Bow.findByPk(bowId, { transaction, lock: lockOf(transaction) });
  return grant(user, bow, capability, 'That bow', transaction);
}

/**
 * An arrow build and its bow. Example: const { build } = await buildFor(req.user, 7, 'change') — 403 for a technician
 */
export async function buildFor(user: Who, buildId: number, capability: BowCapability, { transaction, include = [] }: LoadOptions = {}) {
  const build = await ArrowBuild.findByPk(buildId, {
    include: [{ model: Bow, as: 'bow' }, ...include],
    transaction,
    lock: lockOf(transaction),
  });
  const access = await grant(user, (build as (ArrowBuild & { bow?: Bow }) | null)?.bow, capability, 'That arrow build', transaction);
  return { ...access, build: build! };
}

/**
 * A sight-in, with its bow (also as `sightIn.bow`).
 * Example: const { sightIn } = await sightInFor(req.user, 31, 'read')
 */
export async function sightInFor(user: Who, sightInId: number, capability: BowCapability, { transaction, include = [] }: LoadOptions = {}) {
  const sightIn = (await SightIn.findByPk(sightInId, {
    include: [{ model: Bow, as: 'bow' }, ...include],
    transaction,
    lock: lockOf(transaction),
  })) as (SightIn & { bow: Bow }) | null;
  const access = await grant(user, sightIn?.bow, capability, 'That sight-in', transaction);
  return { ...access, sightIn: sightIn! };
}

/** A saved tape, with its sight-in and bow (also as `tape.sightIn.bow`). */
export async function tapeFor(
  user: Who,
  tapeId: number,
  capability: BowCapability,
  { transaction }: Pick<LoadOptions, 'transaction'> = {},
) {
  const tape = (await Tape.findByPk(tapeId, {
    include: [{ model: SightIn, as: 'sightIn', required: true, include: [{ model: Bow, as: 'bow' }] }],
    transaction,
    lock: lockOf(transaction),
  })) as (Tape & { sightIn: SightIn & { bow: Bow } }) | null;
  const access = await grant(user, tape?.sightIn.bow, capability, 'That tape', transaction);
  return { ...access, tape: tape! };
}

/** A level check (with `include`, e.g. its steps). */
export async function levelCheckFor(
  user: Who,
  checkId: number,
  capability: BowCapability,
  { transaction, include = [] }: LoadOptions = {},
) {
  const check = await LevelCheck.findByPk(checkId, { include, transaction, lock: lockOf(transaction) });
  const access = await grant(
    user,
    check && (await Bow.findByPk(check.bowId, { transaction })),
    capability,
    'That level check',
    transaction,
  );
  return { ...access, check: check! };
}

/** A logged bow change. */
export async function bowChangeFor(
  user: Who,
  changeId: number,
  capability: BowCapability,
  { transaction, include = [] }: LoadOptions = {},
) {
  const change = await BowChange.findByPk(changeId, { include, transaction, lock: lockOf(transaction) });
  const access = await grant(user, change && (await Bow.findByPk(change.bowId, { transaction })), capability, 'That change', transaction);
  return { ...access, change: change! };
}

/** A paper-tune run (with `include`, e.g. its shots). */
export async function paperTuneRunFor(
  user: Who,
  runId: number,
  capability: BowCapability,
  { transaction, include = [] }: LoadOptions = {},
) {
  const run = await PaperTuneRun.findByPk(runId, { include, transaction, lock: lockOf(transaction) });
  const access = await grant(user, run && (await Bow.findByPk(run.bowId, { transaction })), capability, 'That paper-tune run', transaction);
  return { ...access, run: run! };
}

/** An arrow of an arrow set, with its set and build. */
export async function arrowFor(
  user: Who,
  arrowId: number,
  capability: BowCapability,
  { transaction }: Pick<LoadOptions, 'transaction'> = {},
) {
  const arrow = await Arrow.findByPk(arrowId, { transaction, lock: lockOf(transaction) });
  const set = arrow ? await ArrowSet.findByPk(arrow.setId, { transaction }) : null;
  const build = set
    ? ((await ArrowBuild.findByPk(set.buildId, { include: [{ model: Bow, as: 'bow' }], transaction })) as
        | (ArrowBuild & { bow: Bow })
        | null)
    : null;
  const access = await grant(user, build?.bow, capability, 'That arrow', transaction);
  return { ...access, arrow: arrow!, set: set!, build: build! };
}

/** A stored photo (of a level-check step). */
export async function photoFor(user: Who, photoId: number, capability: BowCapability) {
  const photo = await Photo.findByPk(photoId);
  const access = await grant(user, photo && (await Bow.findByPk(photo.bowId)), capability, 'That photo');
  return { ...access, photo: photo! };
}
