/**
 * The renaming migrations (0080–0086) keep every row: a database migrated only
 * up to 0075, holding a bow with a sight-in, marks, a tape, a flier, a range
 * confirmation and audit entries under the old names, reads the same after
 * the renames under the new ones, and the old names are gone. Runs on a
 * database of its own (created and dropped here), so the suite's shared
 * database is never migrated down.
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import { config } from '@/server/config';
import { createSequelize } from '@/server/db';
import { migrator } from '@/server/migrations';

const name = `pinwright_rename_${Date.now().toString(36)}_${process.pid}`;
let admin: Sequelize;
let db: Sequelize;

beforeAll(async () => {
  admin = createSequelize(config.db);
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  db = createSequelize({ ...config.db, name });
});

afterAll(async () => {
  await db?.close();
  await admin?.query(`DROP DATABASE IF EXISTS \`${name}\``);
  await admin?.close();
});

const rows = <T extends object = Record<string, unknown>>(sql: string): Promise<T[]> => db.query<T>(sql, { type: QueryTypes.SELECT });

it('renames the sight-in tables, columns and audit kinds and keeps every row', async () => {
  await migrator(db).up({ to: '0075-sight-sessions-warning-count' });
  const now = "'2026-11-02 10:00:00'";
  await db.query(
    `INSERT INTO users (id, email, password_hash, name, created_at, updated_at) VALUES (1, 'a@example.test', 'x', 'Ada Test', ${now}, ${now})`,
  );
  await db.query(
    `INSERT INTO bows (id, user_id, nickname, hand, draw_weight_lb, draw_length_mm, sight_kind, sight_radius_mm, peep_height_mm, tape_width_mm, pin_distances, notes, created_at, updated_at)
     VALUES (1, 1, 'Test bow', 'right', 60, 720, 'single-pin-slider', 820, 110, 12, '[]', '', ${now}, ${now})`,
  );
  await db.query(`INSERT INTO arrow_builds (id, bow_id, name, grains_per_inch, cut_length_mm, diameter_mm, point_gr, insert_gr, collar_gr, nock_gr, vane_count, vane_weight_gr, wrap_gr, total_gr, created_at, updated_at)
     VALUES (1, 1, 'Test build', 9, 720, 6.5, 100, 16, 0, 10, 3, 6, 0, 420, ${now}, ${now})`);
  await db.query(
    `INSERT INTO sight_sessions (id, bow_id, build_id, date, notes, fit, created_at, updated_at) VALUES (7, 1, 1, '2026-11-02', '', '{"warnings":["w"]}', ${now}, ${now})`,
  );
  await db.query(
    `INSERT INTO session_marks (session_id, position, distance, unit, scale_mm, created_at, updated_at)
     VALUES (7, 0, 20, 'yd', 12.5, ${now}, ${now}), (7, 1, 40, 'yd', 25.5, ${now}, ${now})`,
  );
  await db.query(
    `INSERT INTO audit_entries (action, record_type, record_id, summary, at) VALUES ('created', 'sight-session', 7, 'x', ${now}), ('created', 'session-mark', 1, 'y', ${now})`,
  );

  const applied = await migrator(db).up();
  expect(applied.map((step) => step.name)).toEqual(
    expect.arrayContaining(['0080-rename-sight-sessions-table', '0086-rename-audit-record-kinds']),
  );

  const tables = (
    await rows<{ name: string }>('SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE()')
  ).map((t) => t.name);
  expect(tables).toEqual(expect.arrayContaining(['sight_ins', 'sight_in_marks']));
  expect(tables).not.toContain('sight_sessions');
  expect(tables).not.toContain('session_marks');
  const oldColumns = await rows<{ t: string }>(
    "SELECT table_name AS t FROM information_schema.columns WHERE table_schema = DATABASE() AND column_name = 'session_id'",
  );
  expect(oldColumns).toEqual([]);

  expect(await rows('SELECT id, bow_id AS bowId, fit_warning_count AS warnings FROM sight_ins')).toEqual([
    { id: 7, bowId: 1, warnings: 1 },
  ]);
  expect(await rows('SELECT sight_in_id AS sightInId, distance FROM sight_in_marks ORDER BY position')).toEqual([
    { sightInId: 7, distance: 20 },
    { sightInId: 7, distance: 40 },
  ]);
  expect((await rows<{ kind: string }>('SELECT record_type AS kind FROM audit_entries ORDER BY id')).map((r) => r.kind)).toEqual([
    'sight-in',
    'sight-in-mark',
  ]);

  // The foreign keys came along: deleting the sight-in still deletes its marks.
  await db.query('DELETE FROM sight_ins WHERE id = 7');
  expect(await rows('SELECT * FROM sight_in_marks')).toEqual([]);
});
