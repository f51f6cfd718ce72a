import type { QueryInterface } from 'sequelize';

/**
 * "Sight-in" is the one name for a sighting record (a "session" is only ever a
 * sign-in): the tables and columns named after the old word are renamed,
 * keeping every row. One DDL statement per migration (MariaDB DDL is not
 * transactional), so each rename is its own step; InnoDB carries the foreign
 * keys and indexes across a RENAME TABLE / RENAME COLUMN (MariaDB 10.5+).
 * The audit log's record kinds are renamed the same way, so old entries read
 * like new ones.
 */
type Step = { up: (p: { context: QueryInterface }) => Promise<void>; down: (p: { context: QueryInterface }) => Promise<void> };

const sql = (up: string, down: string): Step => ({
  up: async ({ context: qi }) => void (await qi.sequelize.query(up)),
  down: async ({ context: qi }) => void (await qi.sequelize.query(down)),
});

const renameColumn = (table: string): Step =>
  sql(`ALTER TABLE ${table} RENAME COLUMN session_id TO sight_in_id`, `ALTER TABLE ${table} RENAME COLUMN sight_in_id TO session_id`);

const auditKinds: Step = {
  up: async ({ context: qi }) => {
    await qi.sequelize.query(
      "UPDATE audit_entries SET record_type = CASE record_type WHEN 'sight-session' THEN 'sight-in' ELSE 'sight-in-mark' END WHERE record_type IN ('sight-session', 'session-mark')",
    );
  },
  down: async ({ context: qi }) => {
    await qi.sequelize.query(
      "UPDATE audit_entries SET record_type = CASE record_type WHEN 'sight-in' THEN 'sight-session' ELSE 'session-mark' END WHERE record_type IN ('sight-in', 'sight-in-mark')",
    );
  },
};

export const sightInRenames: [string, Step][] = [
  ['0080-rename-sight-sessions-table', sql('RENAME TABLE sight_sessions TO sight_ins', 'RENAME TABLE sight_ins TO sight_sessions')],
  ['0081-rename-session-marks-table', sql('RENAME TABLE session_marks TO sight_in_marks', 'RENAME TABLE sight_in_marks TO session_marks')],
  ['0082-rename-marks-sight-in-column', renameColumn('sight_in_marks')],
  ['0083-rename-tapes-sight-in-column', renameColumn('tapes')],
  ['0084-rename-arrow-fliers-sight-in-column', renameColumn('arrow_fliers')],
  ['0085-rename-range-confirmations-sight-in-column', renameColumn('range_confirmations')],
  ['0086-rename-audit-record-kinds', auditKinds],
];
