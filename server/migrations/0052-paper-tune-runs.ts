import { DataTypes, type QueryInterface } from 'sequelize';

/** Paper-tune runs of a bow: distance to the paper, start date, outcome (open, clean, pro shop). */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('paper_tune_runs', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bow_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'bows', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'arrow_builds', key: 'id' }, onDelete: 'SET NULL' },
    distance: { type: DataTypes.DOUBLE, allowNull: false },
    unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false },
    started_on: { type: DataTypes.DATEONLY, allowNull: false },
    outcome: { type: DataTypes.ENUM('open', 'clean', 'pro-shop'), allowNull: false, defaultValue: 'open' },
    ended_at: { type: DataTypes.DATE(3), allowNull: true },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    end_note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('paper_tune_runs');
}
