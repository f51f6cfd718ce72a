import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The change log of a bow (new string, sight moved, …): what, when (full
 * timestamp, compared with the checks'), a note, and who logged it. Deleting
 * the bow deletes its log.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('bow_changes', {
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
    kind: {
      type: DataTypes.ENUM('string', 'cables', 'sight-moved', 'sight-remounted', 'rest', 'peep', 'arrows', 'other'),
      allowNull: false,
    },
    changed_at: { type: DataTypes.DATE(3), allowNull: false },
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('bow_changes');
}
