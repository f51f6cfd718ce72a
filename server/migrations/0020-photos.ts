import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Photos attached to a bow's records (level-check steps). Only the metadata is
 * here; the bytes are in the photo storage under `storage_key` (random name).
 * Deleting the bow deletes the rows (the level service removes the files it knows of).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('photos', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bow_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'bows', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    storage_key: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    mime_type: { type: DataTypes.ENUM('image/jpeg', 'image/png', 'image/webp'), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('photos');
}
