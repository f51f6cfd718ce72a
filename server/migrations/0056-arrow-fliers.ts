import { DataTypes, type QueryInterface } from 'sequelize';

/** An arrow that flew out of the group at a sight-in (one row per arrow and sight-in). */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable(
    'arrow_fliers',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      arrow_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'arrows', key: 'id' }, onDelete: 'CASCADE' },
      session_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'sight_sessions', key: 'id' },
        onDelete: 'CASCADE',
      },
      user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      note: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    },
    { uniqueKeys: { arrow_fliers_arrow_session: { fields: ['arrow_id', 'session_id'] } } } as never,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('arrow_fliers');
}
