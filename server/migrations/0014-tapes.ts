import { DataTypes, type QueryInterface } from 'sequelize';

/** Saved tape layouts for a session's fit; deleting the session deletes them. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('tapes', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    session_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'sight_sessions', key: 'id' },
      onDelete: 'CASCADE',
    },
    from_distance: { type: DataTypes.DOUBLE, allowNull: false },
    to_distance: { type: DataTypes.DOUBLE, allowNull: false },
    step: { type: DataTypes.DOUBLE, allowNull: false },
    unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false },
    orientation: { type: DataTypes.ENUM('down', 'up'), allowNull: false },
    width_mm: { type: DataTypes.DOUBLE, allowNull: false },
    mirror: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    paper: { type: DataTypes.ENUM('a4', 'letter'), allowNull: false },
    label: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('tapes');
}
