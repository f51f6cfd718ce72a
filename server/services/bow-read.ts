/**
 * The bow read path (GET /api/bows and GET /api/bows/:id): what the bow list
 * and detail show and what the readiness, level and staleness rules read
 * (builds, sight-ins with their mark counts and longest mark, tapes, logged
 * changes, level checks and the last complete check's steps, range
 * confirmations, who added what), and whether the asking account may read it
 * (bow-access.ts's read rule, `readableBowSql`).
 * Eight plain indexed SELECTs sent as one multi-statement query in one
 * read-only snapshot, no model instances. (One statement with JSON arrays, the first
 * rewrite, cost MariaDB about 1.7 ms a bow mostly writing doubles and dates
 * into JSON; plain rows cost it a fraction of that: tests/benchmarks/api-read.ts.)
 * The services then build the same answers as before from these rows.
 *
 * Example: const [facts] = await readBowFacts({ bowId: 12 }, user.id); facts?.canRead → true for its owner
 */
import { bowReadPool } from '@/server/db';
import { YARD_M } from '@/math/units/constants';
import { readableBowSql } from './bow-access';

/** A DATETIME(3) as text ('2026-12-02 11:48:01.952', UTC) or as a Date already → Date. */
export function sqlDate(value: string | Date): Date;
export function sqlDate(value: string | Date | null): Date | null;
export function sqlDate(value: string | Date | null): Date | null {
  if (value === null) return null;
  if (value instanceof Date) return value;
  return new Date(`${value.replace(' ', 'T')}Z`);
}

export type BuildFact = {
  id: number;
  bowId: number;
  name: string;
  shaftLabel: string;
  spine: number | null;
  grainsPerInch: number;
  cutLengthMm: number;
  diameterMm: number;
  pointGr: number;
  insertGr: number;
  collarGr: number;
  nockGr: number;
  vaneCount: number;
  vaneWeightGr: number;
  wrapGr: number;
  balancePointMm: number | null;
  speedFps: number | null;
  dragCoefficient: number | null;
  totalGr: number;
  focPct: number | null;
  kineticEnergyFtLb: number | null;
  kineticEnergyJ: number | null;
  momentumSlugFtPerS: number | null;
  momentumKgMPerS: number | null;
  addedById: number | null;
  addedByName: string | null;
  createdAt: Date;
  updatedAt: Date;
};

export type SightInFact = {
  id: number;
  bowId: number;
  buildId: number;
  date: string;
  placeLabel: string;
  altitudeM: number | null;
  temperatureC: number | null;
  notes: string;
  fitSpeedFps: number | null;
  fitRmsMm: number | null;
  warningCount: number;
  markCount: number;
  longestDistance: number | null;
  longestUnit: 'yd' | 'm' | null;
  addedById: number | null;
  addedByName: string | null;
  createdAt: Date;
  updatedAt: Date;
};

export type TapeFact = {
  id: number;
  sightInId: number;
  fromDistance: number;
  toDistance: number;
  step: number;
  unit: 'yd' | 'm';
  orientation: 'down' | 'up';
  widthMm: number;
  mirror: boolean;
  paper: 'a4' | 'letter';
  label: string;
  createdAt: Date;
  updatedAt: Date;
};

export type ChangeFact = {
  id: number;
  bowId: number;
  kind: string;
  changedAt: Date;
  note: string;
  createdAt: Date;
  loggedBy: { id: number; name: string } | null;
};

export type CheckFact = {
  id: number;
  bowId: number;
  userId: number | null;
  place: 'bench' | 'range';
  status: 'open' | 'complete';
  startedAt: Date;
  completedAt: Date | null;
};

export type BowFacts = {
  bow: {
    id: number;
    userId: number;
    nickname: string;
    hand: 'right' | 'left';
    drawWeightLb: number;
    drawLengthMm: number;
    letOffPct: number | null;
    ratedSpeedFps: number | null;
    sightDescription: string;
    sightKind: 'single-pin-slider' | 'fixed-multi-pin' | 'hybrid';
    sightRadiusMm: number;
    peepHeightMm: number;
    scaleDirection: 'down' | 'up';
    tapeWidthMm: number;
    pinDistances: number[];
    pinDistanceUnit: 'yd' | 'm';
    notes: string;
    createdAt: Date;
    updatedAt: Date;
  };
  ownerName: string;
  /** The asking account owns the bow or holds an active share of it. */
  canRead: boolean;
  owner: boolean;
  builds: BuildFact[];
  /** Newest first (date, then id), as the lists show them. */
  sightIns: SightInFact[];
  /** Oldest first (id). */
  tapes: TapeFact[];
  /** Oldest first (changedAt, then id). */
  changes: ChangeFact[];
  /** Latest completion first, then start, then id (nulls last), as levelStatus reads them. */
  checks: CheckFact[];
  /** Steps of the bow's last complete check. */
  steps: { id: number; checkId: number; step: string; result: string }[];
  /** Who did each check. */
  performers: { id: number; name: string }[];
  confirmations: { sightInId: number; confirmedAt: Date }[];
};

/** A row as the connector returns it (dates as text, UTC; bow-read pool in server/db.ts). */
type Row = Record<string, unknown>;

/**
 * The statements of one read, each a plain indexed SELECT of one table (with
 * who added or did what); `scope` narrows the bows ("b.id = ?" or
 * "b.user_id = ?", one parameter). Child rows come through a join to bows,
 * so one scope serves both reads. The first takes the asking account thrice first.
 */
function statements(scope: string): { key: keyof RawRows; sql: string }[] {
  return [
    {
      key: 'bows',
      sql: `SELECT b.id, b.user_id AS userId, b.nickname, b.hand, b.draw_weight_lb AS drawWeightLb, b.draw_length_mm AS drawLengthMm,
  b.let_off_pct AS letOffPct, b.rated_speed_fps AS ratedSpeedFps, b.sight_description AS sightDescription, b.sight_kind AS sightKind,
  b.sight_radius_mm AS sightRadiusMm, b.peep_height_mm AS peepHeightMm, b.scale_direction AS scaleDirection, b.tape_width_mm AS tapeWidthMm,
  b.pin_distances AS pinDistances, b.pin_distance_unit AS pinDistanceUnit, b.notes, b.created_at AS createdAt, b.updated_at AS updatedAt,
  owner.name AS ownerName, (b.user_id = ?) AS owner,
  ${readableBowSql} AS canRead, b.revision, (SELECT revision FROM read_revisions WHERE name = 'user-names') AS namesRevision
FROM bows b JOIN users owner ON owner.id = b.user_id WHERE ${scope}`,
    },
    {
      key: 'builds',
      sql: `SELECT ab.id, ab.bow_id AS bowId, ab.name, ab.shaft_label AS shaftLabel, ab.spine, ab.grains_per_inch AS grainsPerInch,
  ab.cut_length_mm AS cutLengthMm, ab.diameter_mm AS diameterMm, ab.point_gr AS pointGr, ab.insert_gr AS insertGr,
  ab.collar_gr AS collarGr, ab.nock_gr AS nockGr, ab.vane_count AS vaneCount, ab.vane_weight_gr AS vaneWeightGr,
  ab.wrap_gr AS wrapGr, ab.balance_point_mm AS balancePointMm, ab.speed_fps AS speedFps, ab.drag_coefficient AS dragCoefficient,
  ab.total_gr AS totalGr, ab.foc_pct AS focPct, ab.kinetic_energy_ft_lb AS kineticEnergyFtLb, ab.kinetic_energy_j AS kineticEnergyJ,
  ab.momentum_slug_ft_per_s AS momentumSlugFtPerS, ab.momentum_kg_m_per_s AS momentumKgMPerS,
  ab.added_by_id AS addedById, adder.name AS addedByName, ab.created_at AS createdAt, ab.updated_at AS updatedAt
FROM bows b JOIN arrow_builds ab ON ab.bow_id = b.id LEFT JOIN users adder ON adder.id = ab.added_by_id WHERE ${scope}`,
    },
    {
      key: 'sightIns',
      sql: `SELECT s.id, s.bow_id AS bowId, s.build_id AS buildId, s.date, s.place_label AS placeLabel, s.altitude_m AS altitudeM,
  s.temperature_c AS temperatureC, s.notes, s.fit_speed_fps AS fitSpeedFps, s.fit_rms_mm AS fitRmsMm,
  s.fit_warning_count AS warningCount,
  s.added_by_id AS addedById, adder.name AS addedByName, s.created_at AS createdAt, s.updated_at AS updatedAt
FROM bows b JOIN sight_ins s ON s.bow_id = b.id LEFT JOIN users adder ON adder.id = s.added_by_id WHERE ${scope}`,
    },
    {
      key: 'marks',
      sql: `SELECT m.sight_in_id AS sightInId, m.position, m.distance, m.unit
FROM bows b JOIN sight_ins s ON s.bow_id = b.id JOIN sight_in_marks m ON m.sight_in_id = s.id WHERE ${scope}`,
    },
    {
      key: 'tapes',
      sql: `SELECT t.id, t.sight_in_id AS sightInId, t.from_distance AS fromDistance, t.to_distance AS toDistance, t.step, t.unit,
  t.orientation, t.width_mm AS widthMm, t.mirror, t.paper, t.label, t.created_at AS createdAt, t.updated_at AS updatedAt
FROM bows b JOIN sight_ins s ON s.bow_id = b.id JOIN tapes t ON t.sight_in_id = s.id WHERE ${scope}`,
    },
    {
      key: 'changes',
      sql: `SELECT c.id, c.bow_id AS bowId, c.kind, c.changed_at AS changedAt, c.note, c.created_at AS createdAt,
  logger.id AS loggedById, logger.name AS loggedByName
FROM bows b JOIN bow_changes c ON c.bow_id = b.id LEFT JOIN users logger ON logger.id = c.user_id WHERE ${scope}`,
    },
    {
      // The checks, and with the bow's last complete check (levelStatus's order: completion, start, id) its steps, one row each.
      key: 'checks',
      sql: `SELECT lc.id, lc.bow_id AS bowId, lc.user_id AS userId, lc.place, lc.status, lc.started_at AS startedAt,
  lc.completed_at AS completedAt, performer.name AS performerName, ls.id AS stepId, ls.step, ls.result
FROM bows b JOIN level_checks lc ON lc.bow_id = b.id LEFT JOIN users performer ON performer.id = lc.user_id
  LEFT JOIN level_steps ls ON ls.check_id = lc.id AND lc.id = (
    SELECT lc2.id FROM level_checks lc2 WHERE lc2.bow_id = b.id AND lc2.status = 'complete' AND lc2.completed_at IS NOT NULL
    ORDER BY lc2.completed_at DESC, lc2.started_at DESC, lc2.id DESC LIMIT 1)
WHERE ${scope}`,
    },
    {
      key: 'confirmations',
      sql: `SELECT rc.sight_in_id AS sightInId, rc.confirmed_at AS confirmedAt
FROM bows b JOIN sight_ins s ON s.bow_id = b.id JOIN range_confirmations rc ON rc.sight_in_id = s.id WHERE ${scope}`,
    },
  ];
}

const reads = { bow: statements('b.id = ?'), account: statements('b.user_id = ?') };

type RawRows = {
  bows: Row[];
  builds: Row[];
  sightIns: Row[];
  marks: Row[];
  tapes: Row[];
  changes: Row[];
  checks: Row[];
  steps: Row[];
  confirmations: Row[];
};

/**
 * Runs the statements for the bow (`bow`) or the account (`account`) with id
 * `scope` as one multi-statement query on the bow-read pool (server/db.ts):
 * one write, one round trip. They run inside one read-only transaction so
 * they all see the same snapshot (InnoDB REPEATABLE READ): a sight-in deleted
 * mid-read cannot leave its bow with a sight-in but no marks.
 */
async function readRows(which: keyof typeof reads, scope: number, askerId: number): Promise<RawRows> {
  const connection = await bowReadPool().getConnection();
  try {
    const list = reads[which];
    const sql = ['START TRANSACTION WITH CONSISTENT SNAPSHOT, READ ONLY', ...list.map((statement) => statement.sql), 'COMMIT'].join(';\n');
    const values = list.flatMap((_, index) => (index === 0 ? [askerId, askerId, askerId, scope] : [scope]));
    let answers: Row[][];
    try {
      answers = (await connection.query(sql, values)) as Row[][];
    } catch (error) {
      // A statement failed: the ones after it, COMMIT included, never ran.
      await connection.query('ROLLBACK').catch(() => {});
      throw error;
    }
    const rows = { steps: [] as Row[] } as RawRows;
    list.forEach((statement, index) => {
      rows[statement.key] = [...answers[index + 1]];
    });
    // A check's steps came as extra rows of that check: one check each, the steps apart.
    const checks = new Map<number, Row>();
    for (const row of rows.checks) {
      if (!checks.has(row.id as number)) checks.set(row.id as number, row);
      if (row.stepId !== null && row.stepId !== undefined)
        rows.steps.push({ id: row.stepId, checkId: row.id, step: row.step, result: row.result });
    }
    rows.checks = [...checks.values()];
    return rows;
  } finally {
    await connection.release();
  }
}

const time = (date: Date | null) => (date ? date.getTime() : -Infinity);

/** The lists in the orders the screens and rules read (sorted here, on a few rows each, rather than by MariaDB). */
function ordered(facts: BowFacts): BowFacts {
  facts.builds.sort((x, y) => x.id - y.id);
  facts.sightIns.sort((x, y) => (x.date < y.date ? 1 : x.date > y.date ? -1 : y.id - x.id));
  facts.tapes.sort((x, y) => x.id - y.id);
  facts.changes.sort((x, y) => x.changedAt.getTime() - y.changedAt.getTime() || x.id - y.id);
  facts.checks.sort((x, y) => time(y.completedAt) - time(x.completedAt) || time(y.startedAt) - time(x.startedAt) || y.id - x.id);
  facts.steps.sort((x, y) => x.id - y.id);
  return facts;
}

/**
 * Each sight-in's mark count and longest mark (by its length in metres; the
 * first of equals in the table's order), as sight-in-service's markStats counts them.
 */
function markStatsOf(marks: Row[]): Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null }> {
  const stats = new Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null; longestM: number }>();
  marks.sort((x, y) => (x.sightInId as number) - (y.sightInId as number) || (x.position as number) - (y.position as number));
  for (const mark of marks) {
    const distance = mark.distance as number;
    const metres = mark.unit === 'yd' ? distance * YARD_M : distance;
    const entry = stats.get(mark.sightInId as number) ?? { markCount: 0, longestDistance: null, longestUnit: null, longestM: -1 };
    entry.markCount += 1;
    if (metres > entry.longestM) {
      entry.longestM = metres;
      entry.longestDistance = distance;
      entry.longestUnit = mark.unit as 'yd' | 'm';
    }
    stats.set(mark.sightInId as number, entry);
  }
  return stats;
}

/** Rows grouped by their bow's id. */
function byBow(rows: Row[], bowOf: (row: Row) => number | undefined): Map<number, Row[]> {
  const groups = new Map<number, Row[]>();
  for (const row of rows) {
    const bowId = bowOf(row);
    if (bowId === undefined) continue;
    const group = groups.get(bowId);
    if (group) group.push(row);
    else groups.set(bowId, [row]);
  }
  return groups;
}

function toFacts(row: Row, child: (key: Exclude<keyof RawRows, 'bows'>) => Row[]): BowFacts {
  const markStats = markStatsOf(child('marks'));
  const bowId = row.id as number;
  const pins = typeof row.pinDistances === 'string' ? JSON.parse(row.pinDistances) : row.pinDistances;
  const checks = child('checks');
  const performers = new Map<number, string>();
  for (const check of checks)
    if (typeof check.userId === 'number' && typeof check.performerName === 'string') performers.set(check.userId, check.performerName);
  return {
    bow: {
      id: bowId,
      userId: row.userId as number,
      nickname: row.nickname as string,
      hand: row.hand as BowFacts['bow']['hand'],
      drawWeightLb: row.drawWeightLb as number,
      drawLengthMm: row.drawLengthMm as number,
      letOffPct: row.letOffPct as number | null,
      ratedSpeedFps: row.ratedSpeedFps as number | null,
      sightDescription: row.sightDescription as string,
      sightKind: row.sightKind as BowFacts['bow']['sightKind'],
      sightRadiusMm: row.sightRadiusMm as number,
      peepHeightMm: row.peepHeightMm as number,
      scaleDirection: row.scaleDirection as BowFacts['bow']['scaleDirection'],
      tapeWidthMm: row.tapeWidthMm as number,
      pinDistances: pins as number[],
      pinDistanceUnit: row.pinDistanceUnit as BowFacts['bow']['pinDistanceUnit'],
      notes: row.notes as string,
      createdAt: sqlDate(row.createdAt as string | Date),
      updatedAt: sqlDate(row.updatedAt as string | Date),
    },
    ownerName: (row.ownerName as string | null) ?? '',
    owner: Number(row.owner) === 1,
    canRead: Number(row.canRead) === 1,
    builds: child('builds').map((b) => ({
      ...(b as unknown as BuildFact),
      createdAt: sqlDate(b.createdAt as string | Date),
      updatedAt: sqlDate(b.updatedAt as string | Date),
    })),
    sightIns: child('sightIns').map((s) => {
      const stats = markStats.get(s.id as number);
      return {
        id: s.id as number,
        bowId,
        buildId: s.buildId as number,
        date: s.date as string,
        placeLabel: s.placeLabel as string,
        altitudeM: s.altitudeM as number | null,
        temperatureC: s.temperatureC as number | null,
        notes: s.notes as string,
        fitSpeedFps: s.fitSpeedFps as number | null,
        fitRmsMm: s.fitRmsMm as number | null,
        warningCount: Number(s.warningCount ?? 0),
        markCount: stats?.markCount ?? 0,
        longestDistance: stats?.longestDistance ?? null,
        longestUnit: stats?.longestUnit ?? null,
        addedById: s.addedById as number | null,
        addedByName: s.addedByName as string | null,
        createdAt: sqlDate(s.createdAt as string | Date),
        updatedAt: sqlDate(s.updatedAt as string | Date),
      };
    }),
    tapes: child('tapes').map((t) => ({
      ...(t as unknown as TapeFact),
      mirror: Boolean(t.mirror),
      createdAt: sqlDate(t.createdAt as string | Date),
      updatedAt: sqlDate(t.updatedAt as string | Date),
    })),
    changes: child('changes').map((c) => ({
      id: c.id as number,
      bowId,
      kind: c.kind as string,
      changedAt: sqlDate(c.changedAt as string | Date),
      note: c.note as string,
      createdAt: sqlDate(c.createdAt as string | Date),
      loggedBy: typeof c.loggedById === 'number' ? { id: c.loggedById, name: c.loggedByName as string } : null,
    })),
    checks: checks.map((c) => ({
      id: c.id as number,
      bowId,
      userId: c.userId as number | null,
      place: c.place as CheckFact['place'],
      status: c.status as CheckFact['status'],
      startedAt: sqlDate(c.startedAt as string | Date),
      completedAt: sqlDate(c.completedAt as string | Date | null),
    })),
    steps: child('steps').map((step) => ({
      id: step.id as number,
      checkId: step.checkId as number,
      step: step.step as string,
      result: step.result as string,
    })),
    performers: [...performers].map(([id, name]) => ({ id, name })),
    confirmations: child('confirmations').map((c) => ({
      sightInId: c.sightInId as number,
      confirmedAt: sqlDate(c.confirmedAt as string | Date),
    })),
  };
}

/** The facts read afresh from the database, with the revisions they were read at. */
async function freshFacts(which: keyof typeof reads, scope: number, askerId: number): Promise<{ facts: BowFacts[]; revisions: Revisions }> {
  const rows = await readRows(which, scope, askerId);
  const bowOfSightIn = new Map(rows.sightIns.map((s) => [s.id as number, s.bowId as number]));
  const bowOfCheck = new Map(rows.checks.map((c) => [c.id as number, c.bowId as number]));
  const ofBow = (row: Row) => row.bowId as number;
  const ofSightIn = (row: Row) => bowOfSightIn.get(row.sightInId as number);
  const groups: Record<Exclude<keyof RawRows, 'bows'>, Map<number, Row[]>> = {
    builds: byBow(rows.builds, ofBow),
    sightIns: byBow(rows.sightIns, ofBow),
    marks: byBow(rows.marks, ofSightIn),
    tapes: byBow(rows.tapes, ofSightIn),
    changes: byBow(rows.changes, ofBow),
    checks: byBow(rows.checks, ofBow),
    steps: byBow(rows.steps, (row) => bowOfCheck.get(row.checkId as number)),
    confirmations: byBow(rows.confirmations, ofSightIn),
  };
  rows.bows.sort((x, y) => (x.id as number) - (y.id as number));
  return {
    facts: rows.bows.map((row) => ordered(toFacts(row, (key) => groups[key].get(row.id as number) ?? []))),
    revisions: revisionsOf(rows.bows),
  };
}

/**
 * The read cache. A bow read's rows change only when `bows.revision` of one
 * of its bows, or the account-names revision, goes up: MariaDB's triggers
 * raise them in the same transaction as every write the read shows
 * (migration 0090). So a read first asks for those revisions alone (one
 * small indexed statement), and when they are the ones the cached facts
 * were read at, in the same snapshot, it answers from the cache. Who may
 * read (owner, active share) is asked afresh every time and never cached;
 * what depends on today (readiness, staleness, level age) is worked out from
 * the facts on every request by the services, as before.
 *
 * PINWRIGHT_BOW_READ_CACHE=off reads afresh every time (npm run bench measures
 * both side by side). With PINWRIGHT_CHECK_READ_CACHE=1 (the test runs) every answer from the
 * cache is also read afresh and compared, and a difference is an error: the
 * API, property and browser tests then prove that no write path leaves it stale.
 */
type Revisions = { key: string; access: Map<number, { owner: boolean; canRead: boolean }> };

function revisionsOf(rows: Row[]): Revisions {
  const names = rows.length ? Number(rows[0].namesRevision) : 0;
  return {
    key: `${names}|${rows.map((row) => `${row.id}:${row.revision}`).join(',')}`,
    access: new Map(rows.map((row) => [row.id as number, { owner: Number(row.owner) === 1, canRead: Number(row.canRead) === 1 }])),
  };
}

const revisionSql = (scope: string) => `SELECT b.id, b.revision, (b.user_id = ?) AS owner, ${readableBowSql} AS canRead,
  (SELECT revision FROM read_revisions WHERE name = 'user-names') AS namesRevision
FROM bows b WHERE ${scope} ORDER BY b.id`;
const revisionReads = { bow: revisionSql('b.id = ?'), account: revisionSql('b.user_id = ?') };

async function currentRevisions(which: keyof typeof reads, scope: number, askerId: number): Promise<Revisions> {
  const connection = await bowReadPool().getConnection();
  try {
    return revisionsOf([...((await connection.query(revisionReads[which], [askerId, askerId, askerId, scope])) as Row[])]);
  } finally {
    await connection.release();
  }
}

/** Least recently used first; a few kB an entry. */
const cache = new Map<string, { revisionKey: string; facts: readonly BowFacts[] }>();
const CACHE_ENTRIES = 500;

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const inner of Object.values(value)) deepFreeze(inner);
  }
  return value;
}

/** The cached facts with who may read them as of now (the arrays shared, frozen). */
function withAccess(facts: readonly BowFacts[], access: Revisions['access']): BowFacts[] {
  return facts.map((fact) => ({ ...fact, ...(access.get(fact.bow.id) ?? { owner: false, canRead: false }) }));
}

/**
 * The facts of one bow (`{ bowId }`) or of every bow of an account
 * (`{ userId }`), oldest bow first, as seen by the account `askerId`.
 * The lists are frozen: they may be shared with other reads.
 */
export async function readBowFacts(which: { bowId: number } | { userId: number }, askerId: number): Promise<BowFacts[]> {
  const [kind, scope] = 'bowId' in which ? (['bow', which.bowId] as const) : (['account', which.userId] as const);
  const key = `${kind}:${scope}`;
  const useCache = process.env.PINWRIGHT_BOW_READ_CACHE !== 'off'; // off: the bench's side-by-side "without" figures
  const cached = useCache ? cache.get(key) : undefined;
  if (cached) {
    const now = await currentRevisions(kind, scope, askerId);
    if (now.key === cached.revisionKey) {
      cache.delete(key);
      cache.set(key, cached);
      const facts = withAccess(cached.facts, now.access);
      if (process.env.PINWRIGHT_CHECK_READ_CACHE === '1') await checkAgainstFresh(kind, scope, askerId, facts, cached.revisionKey);
      return facts;
    }
  }
  const fresh = await freshFacts(kind, scope, askerId);
  cache.delete(key);
  if (useCache && fresh.facts.length) {
    cache.set(key, { revisionKey: fresh.revisions.key, facts: deepFreeze(fresh.facts) });
    if (cache.size > CACHE_ENTRIES) cache.delete(cache.keys().next().value!);
  }
  return fresh.facts;
}

async function checkAgainstFresh(kind: keyof typeof reads, scope: number, askerId: number, facts: BowFacts[], revisionKey: string) {
  const fresh = await freshFacts(kind, scope, askerId);
  // A write between the two reads raises a revision too: only at equal revisions is a difference a stale cache.
  if (fresh.revisions.key === revisionKey && JSON.stringify(fresh.facts) !== JSON.stringify(facts))
    throw new Error(`the bow read's cache is stale for ${kind} ${scope} (a write that raised no revision: see migration 0090)`);
}
