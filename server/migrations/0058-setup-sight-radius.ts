import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Sight radius joins the set-up measures (shared/setup-measures.ts), so a
 * technician can record a new sight radius on a shared bow as an attributed
 * entry of their own, as they can a peep height. Widening an ENUM keeps every
 * stored row.
 */
const before = [
  'centre-shot',
  'nock-height',
  'brace-height',
  'axle-to-axle',
  'peep-height',
  'd-loop',
  'cam-timing',
  'cam-lean',
  'rest-kind',
  'cam-system',
];
const after = [...before, 'sight-radius'];

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.changeColumn('setup_entries', 'measure', { type: DataTypes.ENUM(...after), allowNull: false });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`DELETE FROM setup_entries WHERE measure = 'sight-radius'`);
  await qi.changeColumn('setup_entries', 'measure', { type: DataTypes.ENUM(...before), allowNull: false });
}
