import { DataTypes, type QueryInterface } from 'sequelize';

/** The marks of a sight-in session, in entry order; deleting the session deletes them. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable(
    'session_marks',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      session_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'sight_sessions', key: 'id' },
        onDelete: 'CASCADE',
      },
      position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
      distance: { type: DataTypes.DOUBLE, allowNull: false },
      unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false },
      scale_mm: { type: DataTypes.DOUBLE, allowNull: false },
      arrows_shot: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
      note: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    },
    { uniqueKeys: { session_marks_session_position: { fields: ['session_id', 'position'] } } } as never,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('session_marks');
}
