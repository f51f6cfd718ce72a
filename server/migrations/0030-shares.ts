import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A bow shared by its archer with a technician: invited (by e-mail address,
 * no technician yet), active (accepted) or revoked. Deleting the bow or either
 * account deletes the share.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('shares', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bow_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'bows', key: 'id' },
      onDelete: 'CASCADE',
    },
    archer_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    tech_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    invited_email: { type: DataTypes.STRING(254), allowNull: false },
    state: { type: DataTypes.ENUM('invited', 'active', 'revoked'), allowNull: false, defaultValue: 'invited' },
    accepted_at: { type: DataTypes.DATE(3), allowNull: true },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('shares');
}
