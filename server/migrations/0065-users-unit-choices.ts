import type { QueryInterface } from 'sequelize';

/**
 * The rest of an account's unit choices (shared/units.ts): altitude (ft | m),
 * temperature (F | C), speed (fps | mps) and arrow mass (gr | g). One ALTER
 * (one DDL statement: MariaDB DDL is not transactional). Existing accounts
 * keep what they saw before: metres, °C, fps, grains; a new account's choices
 * follow its distance unit at sign-up.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(
    "ALTER TABLE users ADD COLUMN altitude_unit ENUM('ft','m') NOT NULL DEFAULT 'm' AFTER length_unit, " +
      "ADD COLUMN temperature_unit ENUM('F','C') NOT NULL DEFAULT 'C' AFTER altitude_unit, " +
      "ADD COLUMN speed_unit ENUM('fps','mps') NOT NULL DEFAULT 'fps' AFTER temperature_unit, " +
      "ADD COLUMN mass_unit ENUM('gr','g') NOT NULL DEFAULT 'gr' AFTER speed_unit",
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(
    'ALTER TABLE users DROP COLUMN altitude_unit, DROP COLUMN temperature_unit, DROP COLUMN speed_unit, DROP COLUMN mass_unit',
  );
}
