import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/server/db';

export type PhotoMimeType = 'image/jpeg' | 'image/png' | 'image/webp';

/** A photo's metadata; the bytes are in the photo storage (server/storage) under `storageKey`. */
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<number>;
  declare bowId: number;
  /** Who uploaded it (null once that account is deleted). */
  declare userId: number | null;
  declare storageKey: string;
  declare mimeType: PhotoMimeType;
  declare sizeBytes: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Photo.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    storageKey: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    mimeType: { type: DataTypes.ENUM('image/jpeg', 'image/png', 'image/webp'), allowNull: false },
    sizeBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'photos' },
);
