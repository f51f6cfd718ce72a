import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Sight-in sessions: bow + build, with the stored fit (JSON) and two summary
 * columns from it for lists. Deleting the bow deletes its sessions.
 * build_id cascades too, although the API refuses to delete a build that has
 * sessions (409, build-service): with RESTRICT here, InnoDB would refuse the
 * bow's (and an account's) cascading delete, because it reaches the builds
 * before the sessions that reference them.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('sight_sessions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bow_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'bows', key: 'id' },
      onDelete: 'CASCADE',
    },
    build_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'arrow_builds', key: 'id' },
      onDelete: 'CASCADE',
    },
    date: { type: DataTypes.DATEONLY, allowNull: false },
    place_label: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
    altitude_m: { type: DataTypes.DOUBLE, allowNull: true },
    temperature_c: { type: DataTypes.DOUBLE, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false },
    fit: { type: DataTypes.JSON, allowNull: false },
    fit_speed_fps: { type: DataTypes.DOUBLE, allowNull: true },
    fit_rms_mm: { type: DataTypes.DOUBLE, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('sight_sessions');
}
