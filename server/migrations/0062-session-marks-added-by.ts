import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Who added a mark (session_marks.added_by_id): shown beside it, so an archer sees
 * what a technician added to a shared bow. Existing rows are the bow owner's.
 * When that account is deleted the row stays, attributed to no one (SET NULL:
 * "a former account").
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('session_marks', 'added_by_id', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  });
  await qi.sequelize.query(
    'UPDATE session_marks t JOIN sight_sessions s ON s.id = t.session_id JOIN bows b ON b.id = s.bow_id SET t.added_by_id = b.user_id',
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('session_marks', 'added_by_id');
}
