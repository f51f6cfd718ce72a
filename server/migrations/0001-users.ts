import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    role: { type: DataTypes.ENUM('archer', 'tech', 'admin'), allowNull: false, defaultValue: 'archer' },
    disabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    distance_unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false, defaultValue: 'yd' },
    length_unit: { type: DataTypes.ENUM('mm', 'in'), allowNull: false, defaultValue: 'mm' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('users');
}
