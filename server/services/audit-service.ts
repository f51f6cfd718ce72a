/**
 * The audit log. Two ways in:
 *  - `recordAudit` — explicit entries (share invited/accepted/revoked, admin
 *    role changes and disables);
 *  - the audit trail — Sequelize hooks on every record that hangs off a bow
 *    (bow, build, sight-in, mark, tape, level check, step, photo, change):
 *    whenever someone who is not the bow's owner (a technician working on a
 *    shared bow) creates, changes or deletes one during an API request, an
 *    entry is written (when the write's transaction commits). Services need
 *    not remember to log their writes, and a write that rolls back leaves no entry.
 *
 * Example: api.use(auditTrail());   // once, before the routers
 *          await listBowAudit(marit, 12, 1)  → { entries: [{ action: 'created', recordType: 'level-check', … }], … }
 */
import { Op, type Model, type ModelStatic, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import { ApiError } from '@/server/errors';
import { ArrowBuild, ArrowSet, AuditEntry, Bow, LevelCheck, PaperTuneRun, SightIn, User } from '@/server/models';
import { bowFor } from '@/server/services/bow-access';
import type { AdminAuditQuery, AuditEntry as AuditEntryJson, AuditList } from '@/shared/audit';
import { auditContext, currentActor } from './audit-context';

const PAGE_SIZE = 50;
const SUMMARY_MAX = 300;

export type AuditInput = {
  actorId: number | null;
  action: string;
  bowId: number | null;
  recordType: string;
  recordId: number | null;
  summary: string;
};

/** Writes one entry (inside `transaction` when given). */
export async function recordAudit(input: AuditInput, transaction?: Transaction | null): Promise<void> {
  const summary = input.summary.length > SUMMARY_MAX ? `${input.summary.slice(0, SUMMARY_MAX - 1)}…` : input.summary;
  await AuditEntry.create({ ...input, summary }, { transaction: transaction ?? undefined });
}

type Names = {
  bows: Map<number, { id: number; nickname: string; userId: number }>;
  users: Map<number, { id: number; name: string; email: string }>;
};

function entryJson(entry: AuditEntry, names: Names): AuditEntryJson {
  const bow = entry.bowId !== null ? names.bows.get(entry.bowId) : undefined;
  const owner = bow ? names.users.get(bow.userId) : undefined;
  const subject = entry.recordType === 'account' && entry.recordId !== null ? names.users.get(entry.recordId) : undefined;
  return {
    id: entry.id,
    actor: entry.actor ? { id: entry.actor.id, name: entry.actor.name, role: entry.actor.role } : null,
    action: entry.action,
    bowId: entry.bowId,
    bow: bow ? { id: bow.id, nickname: bow.nickname, ownerId: bow.userId, ownerName: owner?.name ?? '' } : null,
    account: subject ? { id: subject.id, name: subject.name, email: subject.email } : null,
    recordType: entry.recordType,
    recordId: entry.recordId,
    summary: entry.summary,
    at: entry.at.toISOString(),
  };
}

/** The bows (with their archers) and the accounts a page of entries names, in two queries. */
async function namesOf(entries: readonly AuditEntry[]): Promise<Names> {
  const bowIds = [...new Set(entries.map((entry) => entry.bowId).filter((id): id is number => id !== null))];
  const bows = bowIds.length ? await Bow.findAll({ where: { id: { [Op.in]: bowIds } }, attributes: ['id', 'nickname', 'userId'] }) : [];
  const userIds = new Set(bows.map((bow) => bow.userId));
  for (const entry of entries) if (entry.recordType === 'account' && entry.recordId !== null) userIds.add(entry.recordId);
  const users = userIds.size ? await User.findAll({ where: { id: { [Op.in]: [...userIds] } }, attributes: ['id', 'name', 'email'] }) : [];
  return {
    bows: new Map(bows.map((bow) => [bow.id, { id: bow.id, nickname: bow.nickname, userId: bow.userId }])),
    users: new Map(users.map((user) => [user.id, { id: user.id, name: user.name, email: user.email }])),
  };
}

async function page(where: WhereOptions, pageNumber: number): Promise<AuditList> {
  const { rows, count } = await AuditEntry.findAndCountAll({
    where,
    include: [{ model: User, as: 'actor', attributes: ['id', 'name', 'role'] }],
    order: [['id', 'DESC']],
    limit: PAGE_SIZE,
    offset: (pageNumber - 1) * PAGE_SIZE,
  });
  const names = await namesOf(rows);
  return { entries: rows.map((row) => entryJson(row, names)), total: count, page: pageNumber, pageSize: PAGE_SIZE };
}

/** GET /api/bows/:id/audit — for the bow's archer: every entry about the bow, newest first. */
export async function listBowAudit(user: User, bowId: number, pageNumber = 1): Promise<AuditList> {
  const access = await bowFor(user, bowId, 'read');
  if (!access.owner) throw ApiError.forbidden('Only the bow’s archer reads its audit log.');
  return page({ bowId }, pageNumber);
}

/**
 * GET /api/admin/audit — every entry, newest first; narrowed to one bow, one
 * account (what it did, what was done to the account, and everything about
 * its bows) and one kind of record when asked.
 * Example: await listAllAudit({ page: 1, accountId: 7, kind: 'share' }) → the shares of account 7's bows and of account 7 as technician
 */
export async function listAllAudit({ page: pageNumber, bowId, accountId, kind }: AdminAuditQuery = { page: 1 }): Promise<AuditList> {
  const conditions: WhereOptions[] = [];
  if (bowId !== undefined) conditions.push({ bowId });
  if (kind !== undefined) conditions.push({ recordType: kind });
  let account: { id: number; name: string } | null = null;
  if (accountId !== undefined) {
    const found = await User.findByPk(accountId, { attributes: ['id', 'name'] });
    account = found ? { id: found.id, name: found.name } : null;
    const owned = (await Bow.findAll({ where: { userId: accountId }, attributes: ['id'] })).map((b) => b.id);
    conditions.push({
      [Op.or]: [
        { actorId: accountId },
        { recordType: 'account', recordId: accountId },
        ...(owned.length ? [{ bowId: { [Op.in]: owned } }] : []),
      ],
    });
  }
  const bow = bowId !== undefined ? await Bow.findByPk(bowId, { attributes: ['id', 'nickname'] }) : null;
  const [list, kinds] = await Promise.all([
    page(conditions.length ? { [Op.and]: conditions } : {}, pageNumber),
    AuditEntry.findAll({ attributes: ['recordType'], group: ['recordType'], order: [['recordType', 'ASC']], raw: true }),
  ]);
  return {
    ...list,
    kinds: kinds.map((row) => row.recordType),
    filters: { bow: bow ? { id: bow.id, nickname: bow.nickname } : null, account },
  };
}

// ---- The audit trail: hooks on the records that hang off a bow ----

type Values = Record<string, unknown>;

type Audited = {
  /** Record type as stored, e.g. "sight-in-mark". */
  type: string;
  /** Words for the record, e.g. "a sight-in mark". */
  noun: string;
  /** Words for several, when not the type's words plus "s", e.g. "sight-in marks". */
  plural?: string;
  /** A few words about this record for the summary. */
  describe: (values: Values) => string;
  /** The bow the record belongs to. */
  bowOf: (values: Values, transaction?: Transaction | null) => Promise<number | null>;
  /** A verb of its own for an update (e.g. "Completed" a level check), else the usual "Changed". */
  updateVerb?: (values: Values, fields: string[]) => string | null;
};

/** Fields worked out by the server (refits, totals, time stamps): not named in summaries. */
const derivedFields = new Set([
  'createdAt',
  'updatedAt',
  'fit',
  'fitSpeedFps',
  'fitRmsMm',
  'totalGr',
  'focPct',
  'kineticEnergyFtLb',
  'kineticEnergyJ',
  'momentumSlugFtPerS',
  'momentumKgMPerS',
]);
const fieldWords: Record<string, string> = {
  placeLabel: 'place',
  scaleMm: 'scale reading',
  arrowsShot: 'arrows shot',
  buildId: 'arrow build',
  altitudeM: 'altitude',
  temperatureC: 'temperature',
  completedAt: 'finish time',
  startedAt: 'start time',
  readingUnit: 'reading unit',
  photoId: 'photo',
  changedAt: 'time of the change',
};
/** "placeLabel" → "place", "sightRadiusMm" → "sight radius mm". */
const fieldWord = (field: string) => fieldWords[field] ?? field.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();

const direct = async (values: Values) => (typeof values.bowId === 'number' ? values.bowId : null);
const viaSightIn = async (values: Values, transaction?: Transaction | null) => {
  if (typeof values.sightInId !== 'number') return null;
  const sightIn = await SightIn.findByPk(values.sightInId, { attributes: ['id', 'bowId'], transaction: transaction ?? undefined });
  return sightIn?.bowId ?? null;
};
const viaCheck = async (values: Values, transaction?: Transaction | null) => {
  if (typeof values.checkId !== 'number') return null;
  const check = await LevelCheck.findByPk(values.checkId, { attributes: ['id', 'bowId'], transaction: transaction ?? undefined });
  return check?.bowId ?? null;
};
const viaRun = async (values: Values, transaction?: Transaction | null) => {
  if (typeof values.runId !== 'number') return null;
  const run = await PaperTuneRun.findByPk(values.runId, { attributes: ['id', 'bowId'], transaction: transaction ?? undefined });
  return run?.bowId ?? null;
};
const bowOfBuild = async (buildId: unknown, transaction?: Transaction | null) => {
  if (typeof buildId !== 'number') return null;
  const build = await ArrowBuild.findByPk(buildId, { attributes: ['id', 'bowId'], transaction: transaction ?? undefined });
  return build?.bowId ?? null;
};
const viaBuild = async (values: Values, transaction?: Transaction | null) => bowOfBuild(values.buildId, transaction);
const viaSet = async (values: Values, transaction?: Transaction | null) => {
  if (typeof values.setId !== 'number') return null;
  const set = await ArrowSet.findByPk(values.setId, { attributes: ['id', 'buildId'], transaction: transaction ?? undefined });
  return set ? bowOfBuild(set.buildId, transaction) : null;
};
const text = (value: unknown) => (value === null || value === undefined || value === '' ? '' : String(value));
const number = (value: unknown) => (typeof value === 'number' ? String(Math.round(value * 100) / 100) : text(value));

/** The models the trail watches, by model name. Models not listed here are not audited. */
const audited: Record<string, Audited> = {
  Bow: { type: 'bow', noun: 'the bow', describe: (v) => text(v.nickname), bowOf: async (v) => (typeof v.id === 'number' ? v.id : null) },
  ArrowBuild: { type: 'arrow-build', noun: 'an arrow build', describe: (v) => text(v.name), bowOf: direct },
  SightIn: {
    type: 'sight-in',
    noun: 'a sight-in',
    plural: 'sight-ins',
    describe: (v) => [text(v.date), text(v.placeLabel)].filter(Boolean).join(', '),
    bowOf: direct,
  },
  SightInMark: {
    type: 'sight-in-mark',
    noun: 'a mark',
    plural: 'sight-in marks',
    describe: (v) => (v.distance !== undefined ? `${number(v.distance)} ${text(v.unit)} at ${number(v.scaleMm)} mm` : ''),
    bowOf: viaSightIn,
  },
  Tape: { type: 'tape', noun: 'a tape layout', describe: () => '', bowOf: viaSightIn },
  LevelCheck: {
    type: 'level-check',
    noun: 'a level check',
    describe: (v) => (v.place ? `at the ${text(v.place)}` : ''),
    bowOf: direct,
    updateVerb: (v, fields) => (fields.includes('status') && v.status === 'complete' ? 'Completed' : null),
  },
  LevelStep: {
    type: 'level-step',
    noun: 'a level-check step',
    describe: (v) => [text(v.step).replace(/-/g, ' '), text(v.result)].filter(Boolean).join(': '),
    bowOf: viaCheck,
  },
  Photo: { type: 'photo', noun: 'a photo', describe: () => '', bowOf: direct },
  BowChange: {
    type: 'bow-change',
    noun: 'a change to the bow',
    describe: (v) => [text(v.kind), text(v.note)].filter(Boolean).join(': '),
    bowOf: direct,
  },
  // Tuning records (migrations 0051–0057).
  SetupEntry: {
    type: 'setup-entry',
    noun: 'a set-up entry',
    describe: (v) =>
      [text(v.measure).replace(/-/g, ' '), v.valueMm !== null && v.valueMm !== undefined ? `${number(v.valueMm)} mm` : '', text(v.choice)]
        .filter(Boolean)
        .join(' '),
    bowOf: direct,
  },
  PaperTuneRun: { type: 'paper-tune-run', noun: 'a paper-tune run', describe: (v) => text(v.outcome), bowOf: direct },
  PaperTuneShot: {
    type: 'paper-tune-shot',
    noun: 'a paper-tune shot',
    describe: (v) => [text(v.tear), v.lengthMm ? `${number(v.lengthMm)} mm` : ''].filter(Boolean).join(' '),
    bowOf: viaRun,
  },
  ArrowSet: { type: 'arrow-set', noun: 'an arrow set', describe: (v) => text(v.name), bowOf: viaBuild },
  Arrow: { type: 'arrow', noun: 'an arrow', describe: (v) => (v.number !== undefined ? `arrow ${text(v.number)}` : ''), bowOf: viaSet },
  ArrowFlier: { type: 'arrow-flier', noun: 'an arrow that flew out at a sight-in', describe: () => '', bowOf: viaSightIn },
  RangeConfirmation: { type: 'range-confirmation', noun: 'marks confirmed at the range', describe: () => '', bowOf: viaSightIn },
};

const verbs = { created: 'Added', updated: 'Changed', deleted: 'Deleted' } as const;
type TrailAction = keyof typeof verbs;

function valuesOf(instance: Model): Values {
  return instance.get({ plain: true }) as Values;
}

/** One write of a bow's records by someone who is not its owner, before it becomes an entry. */
type TrailEvent = { modelName: string; action: TrailAction; bowId: number; actorId: number; rows: Values[]; fields: string[] };

/** Events of writes inside a transaction, written once it commits (none if it rolls back). */
const pending = new WeakMap<Transaction, TrailEvent[]>();

/** Columns that are bookkeeping, not content, when telling whether a row came back unchanged. */
const bookkeeping = new Set(['id', 'position', 'createdAt', 'updatedAt']);
/** Same content: every column both rows have, bookkeeping aside, is equal. */
const sameContent = (a: Values, b: Values) =>
  Object.keys(a)
    .filter((key) => !bookkeeping.has(key) && key in b)
    .every((key) => JSON.stringify(a[key]) === JSON.stringify(b[key]));

/**
 * A replaced set (the sight-ins service deletes a sight-in's marks and writes
 * them again) should read as what really changed: a deleted row and a
 * created row of the same kind, on the same bow, with the same content cancel out.
 */
function coalesce(events: TrailEvent[]): TrailEvent[] {
  for (const deleted of events.filter((e) => e.action === 'deleted')) {
    for (const created of events.filter((e) => e.action === 'created' && e.modelName === deleted.modelName && e.bowId === deleted.bowId)) {
      for (const row of [...deleted.rows]) {
        const twin = created.rows.findIndex((other) => sameContent(other, row));
        if (twin < 0) continue;
        created.rows.splice(twin, 1);
        deleted.rows.splice(deleted.rows.indexOf(row), 1);
      }
    }
  }
  return events.filter((event) => event.rows.length > 0);
}

async function writeEvents(events: TrailEvent[]): Promise<void> {
  for (const event of coalesce(events)) {
    const spec = audited[event.modelName];
    const { rows, action } = event;
    const first = rows[0];
    const what = rows.length === 1 ? spec.noun : `${rows.length} ${spec.plural ?? `${spec.type.replace(/-/g, ' ')}s`}`;
    const detail = rows.length === 1 ? spec.describe(first) : '';
    const named = event.fields.filter((field) => !derivedFields.has(field));
    const ownVerb = action === 'updated' ? (spec.updateVerb?.(first, event.fields) ?? null) : null;
    const fields = action === 'updated' && !ownVerb && named.length ? ` (${named.map(fieldWord).join(', ')})` : '';
    await recordAudit({
      actorId: event.actorId,
      action,
      bowId: event.bowId,
      recordType: spec.type,
      recordId: rows.length === 1 && typeof first.id === 'number' ? first.id : null,
      summary: `${ownVerb ?? verbs[action]} ${what}${detail ? `: ${detail}` : ''}${fields}`,
    });
  }
}

/**
 * Notes a write when the actor of this request is not the bow's owner; the
 * entry is written at once, or when the write's transaction commits.
 */
async function trail(
  modelName: string,
  action: TrailAction,
  rows: Values[],
  transaction: Transaction | null | undefined,
  changedFields: string[] = [],
): Promise<void> {
  const actor = currentActor();
  const spec = audited[modelName];
  if (!actor || !spec || rows.length === 0) return;
  // A refit alone (only worked-out fields changed) is no change of the actor's.
  if (action === 'updated' && !spec.updateVerb?.(rows[0], changedFields) && changedFields.every((field) => derivedFields.has(field)))
    return;
  // One event per bow touched (a bulk write of 12 marks is one entry).
  const byBow = new Map<number, Values[]>();
  for (const row of rows) {
    const bowId = await spec.bowOf(row, transaction);
    if (bowId === null) continue;
    byBow.set(bowId, [...(byBow.get(bowId) ?? []), row]);
  }
  const events: TrailEvent[] = [];
  for (const [bowId, bowRows] of byBow) {
    const bow = await Bow.findByPk(bowId, { attributes: ['id', 'userId'], transaction: transaction ?? undefined });
    if (bow && bow.userId !== actor.id) events.push({ modelName, action, bowId, actorId: actor.id, rows: bowRows, fields: changedFields });
  }
  if (events.length === 0) return;
  if (!transaction) return writeEvents(events);
  let queue = pending.get(transaction);
  if (!queue) {
    const created: TrailEvent[] = [];
    queue = created;
    pending.set(transaction, created);
    transaction.afterCommit(() => writeEvents(created));
  }
  queue.push(...events);
}

// Loose on purpose: one shape for the create, update and destroy hooks' options.

type HookOptions = { transaction?: Transaction | null; model?: ModelStatic<Model>; where?: any; attributes?: any; fields?: any };
const stash = Symbol('audit rows');

/** Adds the trail's hooks to every model of `sequelize` (universal hooks). */
function installAuditHooks(sequelize: Sequelize): void {
  const nameOf = (instance: Model) => (instance.constructor as ModelStatic<Model>).name;
  sequelize.addHook('afterCreate', 'audit-trail', async (instance: Model, options: HookOptions) => {
    await trail(nameOf(instance), 'created', [valuesOf(instance)], options.transaction);
  });
  sequelize.addHook('afterBulkCreate', 'audit-trail', async (instances: Model[], options: HookOptions) => {
    if (instances.length) await trail(nameOf(instances[0]), 'created', instances.map(valuesOf), options.transaction);
  });
  sequelize.addHook('beforeUpdate', 'audit-trail', (instance: Model) => {
    (instance as unknown as Record<symbol, string[]>)[stash] = (instance.changed() || []).filter((f) => f !== 'updatedAt');
  });
  sequelize.addHook('afterUpdate', 'audit-trail', async (instance: Model, options: HookOptions) => {
    const fields = (instance as unknown as Record<symbol, string[]>)[stash] ?? [];
    if (fields.length) await trail(nameOf(instance), 'updated', [valuesOf(instance)], options.transaction, fields);
  });
  sequelize.addHook('afterBulkUpdate', 'audit-trail', async (options: HookOptions) => {
    if (!options.model || !audited[options.model.name] || !currentActor()) return;
    const fields = Object.keys(options.attributes ?? {}).filter((f) => f !== 'updatedAt');
    const rows = await options.model.findAll({ where: options.where as never, transaction: options.transaction ?? undefined });
    await trail(options.model.name, 'updated', rows.map(valuesOf), options.transaction, fields);
  });
  sequelize.addHook('afterDestroy', 'audit-trail', async (instance: Model, options: HookOptions) => {
    await trail(nameOf(instance), 'deleted', [valuesOf(instance)], options.transaction);
  });
  sequelize.addHook('beforeBulkDestroy', 'audit-trail', async (options: HookOptions) => {
    if (!options.model || !audited[options.model.name] || !currentActor()) return;
    const rows = await options.model.findAll({ where: options.where as never, transaction: options.transaction ?? undefined });
    (options as Record<symbol, Values[]>)[stash] = rows.map(valuesOf);
  });
  sequelize.addHook('afterBulkDestroy', 'audit-trail', async (options: HookOptions) => {
    const rows = (options as Record<symbol, Values[]>)[stash];
    if (options.model && rows) await trail(options.model.name, 'deleted', rows, options.transaction);
  });
}

/**
 * The middleware that gives the trail its actor (the signed-in user of each
 * API request); installs the hooks once per Sequelize instance.
 */
export function auditTrail() {
  // The hooks go on the instance the models are bound to (server/db.ts).
  return auditContext(AuditEntry.sequelize as Sequelize, installAuditHooks);
}
