import { DataTypes, type QueryInterface } from 'sequelize';

/** Bows, owned by a user; deleting the user deletes their bows. Lengths in mm. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('bows', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    nickname: { type: DataTypes.STRING(60), allowNull: false },
    hand: { type: DataTypes.ENUM('right', 'left'), allowNull: false },
    draw_weight_lb: { type: DataTypes.DOUBLE, allowNull: false },
    draw_length_mm: { type: DataTypes.DOUBLE, allowNull: false },
    let_off_pct: { type: DataTypes.DOUBLE, allowNull: true },
    rated_speed_fps: { type: DataTypes.DOUBLE, allowNull: true },
    sight_description: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    sight_kind: { type: DataTypes.ENUM('single-pin-slider', 'fixed-multi-pin', 'hybrid'), allowNull: false },
    sight_radius_mm: { type: DataTypes.DOUBLE, allowNull: false },
    peep_height_mm: { type: DataTypes.DOUBLE, allowNull: false },
    scale_direction: { type: DataTypes.ENUM('down', 'up'), allowNull: false, defaultValue: 'down' },
    tape_width_mm: { type: DataTypes.DOUBLE, allowNull: false },
    pin_distances: { type: DataTypes.JSON, allowNull: false },
    pin_distance_unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false, defaultValue: 'yd' },
    notes: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('bows');
}
