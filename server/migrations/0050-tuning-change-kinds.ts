import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Tuning changes in the bow's change log: nock height, D-loop, cams and sight
 * radius join the kinds (a set-up entry, a paper-tune adjustment or an edit of
 * the bow's sight radius logs one). Widening an ENUM keeps every stored row.
 */
const before = ['string', 'cables', 'sight-moved', 'sight-remounted', 'rest', 'peep', 'arrows', 'other'];
const after = [...before, 'nock-height', 'd-loop', 'cams', 'sight-radius'];

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.changeColumn('bow_changes', 'kind', { type: DataTypes.ENUM(...after), allowNull: false });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`DELETE FROM bow_changes WHERE kind IN ('nock-height', 'd-loop', 'cams', 'sight-radius')`);
  await qi.changeColumn('bow_changes', 'kind', { type: DataTypes.ENUM(...before), allowNull: false });
}
