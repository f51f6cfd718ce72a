import { DataTypes, type QueryInterface } from 'sequelize';

/** Numbered arrow sets of an arrow build, with the weight tolerance around the set's median (gr). */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('arrow_sets', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'arrow_builds', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    name: { type: DataTypes.STRING(60), allowNull: false },
    tolerance_gr: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 2 },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('arrow_sets');
}
