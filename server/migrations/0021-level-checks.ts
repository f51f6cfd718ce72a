import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Level checks of a bow: who performed it (kept as null if that account is
 * deleted, so the bow's record survives), where, when started and completed.
 * Deleting the bow deletes its checks.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('level_checks', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bow_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'bows', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    place: { type: DataTypes.ENUM('bench', 'range'), allowNull: false },
    status: { type: DataTypes.ENUM('open', 'complete'), allowNull: false, defaultValue: 'open' },
    started_at: { type: DataTypes.DATE(3), allowNull: false },
    completed_at: { type: DataTypes.DATE(3), allowNull: true },
    note: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('level_checks');
}
