import type { QueryInterface } from 'sequelize';

/**
 * How many warnings a sight-in's saved fit carries (sight_sessions.fit_warning_count),
 * as a column MariaDB computes itself from `fit` (STORED generated column), so
 * the bow read (server/services/bow-read.ts) need not parse each ~5 KB fit on
 * every read. Nothing writes it: MariaDB recomputes it on every insert and
 * update of `fit`, whatever path writes (models, raw SQL, cascades), so it
 * cannot go stale. NULL when a fit has no warnings list, as JSON_LENGTH gives.
 * Measured on the demo bow (mariadb client, 2,000 runs): the sight-ins' part of the read about 0.2 → 0.1 ms in MariaDB.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query("ALTER TABLE sight_sessions ADD COLUMN fit_warning_count INT AS (JSON_LENGTH(fit, '$.warnings')) STORED");
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('sight_sessions', 'fit_warning_count');
}
