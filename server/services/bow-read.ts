/**
 * The bow read path (GET /api/bows and GET /api/bows/:id) in one SQL
 * statement: each bow row carries, as JSON arrays built by MariaDB, what the
 * bow list and detail show and what the readiness, level and staleness rules
 * read (builds, sight-ins with their mark counts and longest mark, tapes,
 * logged changes, level checks and the last complete check's steps, range
 * confirmations, who added what), and whether the asking account may read it.
 * One round trip and no model instances, where the model queries took about
 * twenty (measured: tests/bench/api-read.ts). The services then build the
 * same answers as before from these plain rows.
 *
 * Example: const [facts] = await readBowFacts({ bowId: 12 }, user.id); facts?.canRead → true for its owner
 */
import { QueryTypes } from 'sequelize';
import { sequelize } from '@/server/db';
import { YARD_M } from '@/math/units/constants';

/** A DATETIME(3) as MariaDB's JSON writes it ('2026-12-02 11:48:01.952', UTC) → Date. */
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

export type SessionFact = {
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
  sessionId: number;
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
  sessions: SessionFact[];
  /** Oldest first (id). */
  tapes: TapeFact[];
  /** Oldest first (changedAt, then id). */
  changes: ChangeFact[];
  /** Latest completion first, then start, then id (nulls last), as levelStatus reads them. */
  checks: CheckFact[];
  /** Steps of the bow's last complete check. */
  steps: Array<{ id: number; checkId: number; step: string; result: string }>;
  /** Who did each check. */
  performers: Array<{ id: number; name: string }>;
  confirmations: Array<{ sessionId: number; confirmedAt: Date }>;
};

/** A DATETIME(3) column inside JSON_OBJECT: MariaDB writes it as text ('2026-12-02 11:48:01.952'); sqlDate reads it. */
const dt = (column: string) => column;

/**
 * One row per bow: the bow's own columns, then each list as a JSON array.
 * `where` is "b.id = :bowId" or "b.user_id = :userId".
 */
function factsSql(where: string): string {
  return `
SELECT b.id, b.user_id AS userId, b.nickname, b.hand, b.draw_weight_lb AS drawWeightLb, b.draw_length_mm AS drawLengthMm,
  b.let_off_pct AS letOffPct, b.rated_speed_fps AS ratedSpeedFps, b.sight_description AS sightDescription, b.sight_kind AS sightKind,
  b.sight_radius_mm AS sightRadiusMm, b.peep_height_mm AS peepHeightMm, b.scale_direction AS scaleDirection, b.tape_width_mm AS tapeWidthMm,
  b.pin_distances AS pinDistances, b.pin_distance_unit AS pinDistanceUnit, b.notes, b.created_at AS createdAt, b.updated_at AS updatedAt,
  owner.name AS ownerName,
  (b.user_id = :asker) AS owner,
  (b.user_id = :asker OR EXISTS (SELECT 1 FROM shares sh WHERE sh.bow_id = b.id AND sh.tech_id = :asker AND sh.state = 'active')) AS canRead,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT(
      'id', ab.id, 'name', ab.name, 'shaftLabel', ab.shaft_label, 'spine', ab.spine, 'grainsPerInch', ab.grains_per_inch,
      'cutLengthMm', ab.cut_length_mm, 'diameterMm', ab.diameter_mm, 'pointGr', ab.point_gr, 'insertGr', ab.insert_gr,
      'collarGr', ab.collar_gr, 'nockGr', ab.nock_gr, 'vaneCount', ab.vane_count, 'vaneWeightGr', ab.vane_weight_gr,
      'wrapGr', ab.wrap_gr, 'balancePointMm', ab.balance_point_mm, 'speedFps', ab.speed_fps, 'dragCoefficient', ab.drag_coefficient,
      'totalGr', ab.total_gr, 'focPct', ab.foc_pct, 'kineticEnergyFtLb', ab.kinetic_energy_ft_lb, 'kineticEnergyJ', ab.kinetic_energy_j,
      'momentumSlugFtPerS', ab.momentum_slug_ft_per_s, 'momentumKgMPerS', ab.momentum_kg_m_per_s,
      'addedById', ab.added_by_id, 'addedByName', adder.name, 'createdAt', ${dt('ab.created_at')}, 'updatedAt', ${dt('ab.updated_at')}))
    FROM arrow_builds ab LEFT JOIN users adder ON adder.id = ab.added_by_id WHERE ab.bow_id = b.id) AS builds,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT(
      'id', s.id, 'buildId', s.build_id, 'date', s.date, 'placeLabel', s.place_label, 'altitudeM', s.altitude_m,
      'temperatureC', s.temperature_c, 'notes', s.notes, 'fitSpeedFps', s.fit_speed_fps, 'fitRmsMm', s.fit_rms_mm,
      'warningCount', JSON_LENGTH(s.fit, '$.warnings'),
      'addedById', s.added_by_id, 'addedByName', adder.name, 'createdAt', ${dt('s.created_at')}, 'updatedAt', ${dt('s.updated_at')}))
    FROM sight_sessions s LEFT JOIN users adder ON adder.id = s.added_by_id WHERE s.bow_id = b.id) AS sessions,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('position', m.position, 'sessionId', m.session_id, 'distance', m.distance, 'unit', m.unit))
    FROM sight_sessions s STRAIGHT_JOIN session_marks m ON m.session_id = s.id WHERE s.bow_id = b.id) AS marks,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT(
      'id', t.id, 'sessionId', t.session_id, 'fromDistance', t.from_distance, 'toDistance', t.to_distance, 'step', t.step,
      'unit', t.unit, 'orientation', t.orientation, 'widthMm', t.width_mm, 'mirror', t.mirror, 'paper', t.paper, 'label', t.label,
      'createdAt', ${dt('t.created_at')}, 'updatedAt', ${dt('t.updated_at')}))
    FROM sight_sessions s STRAIGHT_JOIN tapes t ON t.session_id = s.id WHERE s.bow_id = b.id) AS tapes,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT(
      'id', c.id, 'kind', c.kind, 'changedAt', ${dt('c.changed_at')}, 'note', c.note, 'createdAt', ${dt('c.created_at')},
      'loggedById', logger.id, 'loggedByName', logger.name))
    FROM bow_changes c LEFT JOIN users logger ON logger.id = c.user_id WHERE c.bow_id = b.id) AS changes,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT(
      'id', lc.id, 'userId', lc.user_id, 'place', lc.place, 'status', lc.status, 'startedAt', ${dt('lc.started_at')},
      'completedAt', ${dt('lc.completed_at')}, 'performerName', performer.name))
    FROM level_checks lc LEFT JOIN users performer ON performer.id = lc.user_id WHERE lc.bow_id = b.id) AS checks,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('id', ls.id, 'checkId', ls.check_id, 'step', ls.step, 'result', ls.result))
    FROM level_steps ls WHERE ls.check_id = (
      SELECT lc2.id FROM level_checks lc2 WHERE lc2.bow_id = b.id AND lc2.status = 'complete' AND lc2.completed_at IS NOT NULL
      ORDER BY lc2.completed_at DESC, lc2.started_at DESC, lc2.id DESC LIMIT 1)) AS steps,
  (SELECT JSON_ARRAYAGG(JSON_OBJECT('sessionId', rc.session_id, 'confirmedAt', ${dt('rc.confirmed_at')}))
    FROM sight_sessions s STRAIGHT_JOIN range_confirmations rc ON rc.session_id = s.id WHERE s.bow_id = b.id) AS confirmations
FROM bows b JOIN users owner ON owner.id = b.user_id
WHERE ${where}
ORDER BY b.id ASC`;
}

type Json = Record<string, unknown>;
const list = (value: unknown): Json[] => {
  if (value === null || value === undefined) return [];
  const parsed = typeof value === 'string' ? JSON.parse(value) : value;
  return Array.isArray(parsed) ? (parsed as Json[]) : [];
};

const time = (date: Date | null) => (date ? date.getTime() : -Infinity);

/** The lists in the orders the screens and rules read (sorted here: ORDER BY inside JSON_ARRAYAGG costs MariaDB a temporary table each). */
function ordered(facts: BowFacts): BowFacts {
  facts.builds.sort((x, y) => x.id - y.id);
  facts.sessions.sort((x, y) => (x.date < y.date ? 1 : x.date > y.date ? -1 : y.id - x.id));
  facts.tapes.sort((x, y) => x.id - y.id);
  facts.changes.sort((x, y) => x.changedAt.getTime() - y.changedAt.getTime() || x.id - y.id);
  facts.checks.sort((x, y) => time(y.completedAt) - time(x.completedAt) || time(y.startedAt) - time(x.startedAt) || y.id - x.id);
  facts.steps.sort((x, y) => x.id - y.id);
  return facts;
}

/**
 * Each sight-in's mark count and longest mark (by its length in metres; the
 * first of equals in the table's order), as session-service's markStats counts them.
 */
function markStatsOf(marks: Json[]): Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null }> {
  const stats = new Map<number, { markCount: number; longestDistance: number | null; longestUnit: 'yd' | 'm' | null; longestM: number }>();
  marks.sort((x, y) => (x.sessionId as number) - (y.sessionId as number) || (x.position as number) - (y.position as number));
  for (const mark of marks) {
    const distance = mark.distance as number;
    const metres = mark.unit === 'yd' ? distance * YARD_M : distance;
    const entry = stats.get(mark.sessionId as number) ?? { markCount: 0, longestDistance: null, longestUnit: null, longestM: -1 };
    entry.markCount += 1;
    if (metres > entry.longestM) {
      entry.longestM = metres;
      entry.longestDistance = distance;
      entry.longestUnit = mark.unit as 'yd' | 'm';
    }
    stats.set(mark.sessionId as number, entry);
  }
  return stats;
}

function toFacts(row: Json): BowFacts {
  const markStats = markStatsOf(list(row.marks));
  const bowId = row.id as number;
  const pins = typeof row.pinDistances === 'string' ? JSON.parse(row.pinDistances) : row.pinDistances;
  const checks = list(row.checks);
  const performers = new Map<number, string>();
  for (const check of checks) if (typeof check.userId === 'number' && typeof check.performerName === 'string') performers.set(check.userId, check.performerName);
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
    builds: list(row.builds).map((b) => ({
      ...(b as unknown as BuildFact),
      bowId,
      createdAt: sqlDate(b.createdAt as string),
      updatedAt: sqlDate(b.updatedAt as string),
    })),
    sessions: list(row.sessions).map((s) => {
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
        markCount: markStats.get(s.id as number)?.markCount ?? 0,
        longestDistance: markStats.get(s.id as number)?.longestDistance ?? null,
        longestUnit: markStats.get(s.id as number)?.longestUnit ?? null,
        addedById: s.addedById as number | null,
        addedByName: s.addedByName as string | null,
        createdAt: sqlDate(s.createdAt as string),
        updatedAt: sqlDate(s.updatedAt as string),
      };
    }),
    tapes: list(row.tapes).map((t) => ({
      ...(t as unknown as TapeFact),
      mirror: Boolean(t.mirror),
      createdAt: sqlDate(t.createdAt as string),
      updatedAt: sqlDate(t.updatedAt as string),
    })),
    changes: list(row.changes).map((c) => ({
      id: c.id as number,
      bowId,
      kind: c.kind as string,
      changedAt: sqlDate(c.changedAt as string),
      note: c.note as string,
      createdAt: sqlDate(c.createdAt as string),
      loggedBy: typeof c.loggedById === 'number' ? { id: c.loggedById, name: c.loggedByName as string } : null,
    })),
    checks: checks.map((c) => ({
      id: c.id as number,
      bowId,
      userId: c.userId as number | null,
      place: c.place as CheckFact['place'],
      status: c.status as CheckFact['status'],
      startedAt: sqlDate(c.startedAt as string),
      completedAt: sqlDate(c.completedAt as string | null),
    })),
    steps: list(row.steps).map((step) => ({ id: step.id as number, checkId: step.checkId as number, step: step.step as string, result: step.result as string })),
    performers: [...performers].map(([id, name]) => ({ id, name })),
    confirmations: list(row.confirmations).map((c) => ({ sessionId: c.sessionId as number, confirmedAt: sqlDate(c.confirmedAt as string) })),
  };
}

/**
 * The facts of one bow (`{ bowId }`) or of every bow of an account
 * (`{ userId }`), oldest bow first, as seen by the account `askerId`.
 */
export async function readBowFacts(which: { bowId: number } | { userId: number }, askerId: number): Promise<BowFacts[]> {
  const where = 'bowId' in which ? 'b.id = :bowId' : 'b.user_id = :userId';
  const rows = await sequelize.query<Json>(factsSql(where), {
    type: QueryTypes.SELECT,
    replacements: { ...which, asker: askerId },
  });
  return rows.map((row) => ordered(toFacts(row)));
}
