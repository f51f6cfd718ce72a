import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Who added an arrow build (arrow_builds.added_by_id): shown beside it, so an archer sees
 * what a technician added to a shared bow. Existing rows are the bow owner's.
 * When that account is deleted the row stays, attributed to no one (SET NULL:
 * "a former account").
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('arrow_builds', 'added_by_id', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  });
  await qi.sequelize.query('UPDATE arrow_builds t JOIN bows b ON b.id = t.bow_id SET t.added_by_id = b.user_id');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('arrow_builds', 'added_by_id');
}
