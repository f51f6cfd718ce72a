import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * One row per step of a level check (created with the check, result null until
 * worked), each step once per check. Deleting the check deletes its steps; a
 * deleted photo leaves the step without one.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable(
    'level_steps',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      check_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'level_checks', key: 'id' },
        onDelete: 'CASCADE',
      },
      step: { type: DataTypes.ENUM('setup', 'first-axis', 'second-axis', 'third-axis', 'range'), allowNull: false },
      result: { type: DataTypes.ENUM('pass', 'adjusted', 'fail', 'skipped'), allowNull: true },
      reading: { type: DataTypes.DOUBLE, allowNull: true },
      reading_unit: { type: DataTypes.ENUM('deg', 'mm', 'bubble'), allowNull: true },
      adjustment: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      photo_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'photos', key: 'id' },
        onDelete: 'SET NULL',
      },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    },
    // Created within the same CREATE TABLE statement (one DDL change).
    { uniqueKeys: { level_steps_check_step: { fields: ['check_id', 'step'] } } } as never,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('level_steps');
}
