import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Arrow builds, each on one bow; deleting the bow deletes them. Masses in
 * grains, lengths in mm; the derived columns (total_gr … momentum) are written
 * by the server from the math core on every save.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('arrow_builds', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bow_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'bows', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(60), allowNull: false },
    shaft_label: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
    spine: { type: DataTypes.INTEGER, allowNull: true },
    grains_per_inch: { type: DataTypes.DOUBLE, allowNull: false },
    cut_length_mm: { type: DataTypes.DOUBLE, allowNull: false },
    diameter_mm: { type: DataTypes.DOUBLE, allowNull: false },
    point_gr: { type: DataTypes.DOUBLE, allowNull: false },
    insert_gr: { type: DataTypes.DOUBLE, allowNull: false },
    collar_gr: { type: DataTypes.DOUBLE, allowNull: false },
    nock_gr: { type: DataTypes.DOUBLE, allowNull: false },
    vane_count: { type: DataTypes.INTEGER, allowNull: false },
    vane_weight_gr: { type: DataTypes.DOUBLE, allowNull: false },
    wrap_gr: { type: DataTypes.DOUBLE, allowNull: false },
    balance_point_mm: { type: DataTypes.DOUBLE, allowNull: true },
    speed_fps: { type: DataTypes.DOUBLE, allowNull: true },
    drag_coefficient: { type: DataTypes.DOUBLE, allowNull: true },
    total_gr: { type: DataTypes.DOUBLE, allowNull: false },
    foc_pct: { type: DataTypes.DOUBLE, allowNull: true },
    kinetic_energy_ft_lb: { type: DataTypes.DOUBLE, allowNull: true },
    kinetic_energy_j: { type: DataTypes.DOUBLE, allowNull: true },
    momentum_slug_ft_per_s: { type: DataTypes.DOUBLE, allowNull: true },
    momentum_kg_m_per_s: { type: DataTypes.DOUBLE, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('arrow_builds');
}
