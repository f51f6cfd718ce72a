import { DataTypes, type QueryInterface } from 'sequelize';

/** One shot of a paper-tune run: the tear, its length (mm), arrows, note, what was changed before it. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable(
    'paper_tune_shots',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      run_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'paper_tune_runs', key: 'id' },
        onDelete: 'CASCADE',
      },
      user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
      position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
      tear: {
        type: DataTypes.ENUM('up', 'up-right', 'right', 'down-right', 'down', 'down-left', 'left', 'up-left', 'clean'),
        allowNull: false,
      },
      length_mm: { type: DataTypes.DOUBLE, allowNull: true },
      arrows: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 1 },
      note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      changed_before: {
        type: DataTypes.ENUM('none', 'nock-height', 'rest', 'cams', 'string', 'd-loop', 'other'),
        allowNull: false,
        defaultValue: 'none',
      },
      change_note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      change_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'bow_changes', key: 'id' },
        onDelete: 'SET NULL',
      },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    },
    { uniqueKeys: { paper_tune_shots_run_position: { fields: ['run_id', 'position'] } } } as never,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('paper_tune_shots');
}
