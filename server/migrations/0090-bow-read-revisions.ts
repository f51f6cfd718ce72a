import type { QueryInterface } from 'sequelize';

/**
 * Revisions for the bow read's cache (server/services/bow-read.ts).
 *
 * - `bows.revision` goes up by one, inside the writing transaction, on every
 *   insert, update or delete of the bow or of anything the bow read shows:
 *   its arrow builds, sight-ins and their marks, tapes and range
 *   confirmations, logged changes, level checks and their steps. MariaDB's
 *   triggers do it, so every path that writes (models, raw SQL, later
 *   migrations) bumps it; a foreign-key cascade fires no trigger, but every
 *   cascade here starts at a row whose own trigger bumps the same bow
 *   (deleting a sight-in removes its marks and tapes; deleting a bow leaves
 *   nothing to read).
 * - `read_revisions` row 'user-names' goes up when an account's name changes
 *   or an account is deleted (the read shows who added what, and a deleted
 *   account's rows are set to NULL by cascades that fire no trigger).
 *
 * Each step is idempotent (IF NOT EXISTS, OR REPLACE), since MariaDB DDL is
 * not transactional: a run stopped half way finishes on the next start.
 */
type Bump = { table: string; bowOf: (row: 'NEW' | 'OLD') => string };

const direct = (table: string): Bump => ({ table, bowOf: (row) => `${row}.bow_id` });
const viaSightIn = (table: string): Bump => ({ table, bowOf: (row) => `(SELECT bow_id FROM sight_ins WHERE id = ${row}.sight_in_id)` });

const bumps: Bump[] = [
  direct('arrow_builds'),
  direct('sight_ins'),
  viaSightIn('sight_in_marks'),
  viaSightIn('tapes'),
  viaSightIn('range_confirmations'),
  direct('bow_changes'),
  direct('level_checks'),
  { table: 'level_steps', bowOf: (row) => `(SELECT bow_id FROM level_checks WHERE id = ${row}.check_id)` },
];

const events = ['INSERT', 'UPDATE', 'DELETE'] as const;

function triggers(): { name: string; sql: string }[] {
  const list: { name: string; sql: string }[] = [];
  for (const { table, bowOf } of bumps)
    for (const event of events) {
      const rows = event === 'INSERT' ? [bowOf('NEW')] : event === 'DELETE' ? [bowOf('OLD')] : [bowOf('NEW'), bowOf('OLD')];
      const name = `${table}_${event.toLowerCase()}_bow_revision`;
      list.push({
        name,
        sql: `CREATE OR REPLACE TRIGGER ${name} AFTER ${event} ON ${table} FOR EACH ROW
  UPDATE bows SET revision = revision + 1 WHERE id IN (${rows.join(', ')})`,
      });
    }
  list.push({
    name: 'bows_update_revision',
    sql: `CREATE OR REPLACE TRIGGER bows_update_revision BEFORE UPDATE ON bows FOR EACH ROW
  SET NEW.revision = OLD.revision + 1`,
  });
  list.push({
    name: 'users_update_names_revision',
    sql: `CREATE OR REPLACE TRIGGER users_update_names_revision AFTER UPDATE ON users FOR EACH ROW
  UPDATE read_revisions SET revision = revision + 1 WHERE name = 'user-names' AND NOT (OLD.name <=> NEW.name)`,
  });
  list.push({
    name: 'users_delete_names_revision',
    sql: `CREATE OR REPLACE TRIGGER users_delete_names_revision AFTER DELETE ON users FOR EACH ROW
  UPDATE read_revisions SET revision = revision + 1 WHERE name = 'user-names'`,
  });
  return list;
}

export async function up({ context: qi }: { context: QueryInterface }) {
  const db = qi.sequelize;
  await db.query('ALTER TABLE bows ADD COLUMN IF NOT EXISTS revision BIGINT UNSIGNED NOT NULL DEFAULT 0');
  await db.query(
    'CREATE TABLE IF NOT EXISTS read_revisions (name VARCHAR(32) NOT NULL PRIMARY KEY, revision BIGINT UNSIGNED NOT NULL DEFAULT 0) ENGINE=InnoDB',
  );
  await db.query("INSERT IGNORE INTO read_revisions (name, revision) VALUES ('user-names', 0)");
  for (const trigger of triggers()) await db.query(trigger.sql);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const db = qi.sequelize;
  for (const trigger of triggers()) await db.query(`DROP TRIGGER IF EXISTS ${trigger.name}`);
  await db.query('DROP TABLE IF EXISTS read_revisions');
  await db.query('ALTER TABLE bows DROP COLUMN IF EXISTS revision');
}
