import { DataTypes, type QueryInterface } from 'sequelize';

/** "Marks confirmed at the range" on a sight-in: clears the changes before it (shared/staleness.ts). */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('range_confirmations', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    session_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'sight_sessions', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    confirmed_at: { type: DataTypes.DATE(3), allowNull: false },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('range_confirmations');
}
