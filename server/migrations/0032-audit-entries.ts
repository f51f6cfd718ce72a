import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The audit log: who did what to which record, when. Append-only (no
 * updated_at). Entries outlive the bow they name (bow_id becomes null) so the
 * administrator's log stays whole.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('audit_entries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    actor_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    action: { type: DataTypes.STRING(40), allowNull: false },
    bow_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'bows', key: 'id' },
      onDelete: 'SET NULL',
    },
    record_type: { type: DataTypes.STRING(40), allowNull: false },
    record_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    summary: { type: DataTypes.STRING(300), allowNull: false },
    at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('audit_entries');
}
