import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/server/db';

export type TokenPurpose = 'password-reset' | 'share-invite';

/**
 * A single-use, expiring token sent by e-mail. Only its SHA-256 (hex) is
 * stored; the token itself exists only in the message.
 */
export class Token extends Model<InferAttributes<Token>, InferCreationAttributes<Token>> {
  declare id: CreationOptional<number>;
  declare purpose: TokenPurpose;
  declare tokenHash: string;
  /** The account a password reset is for. */
  declare userId: number | null;
  /** The share an invite is for. */
  declare shareId: number | null;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Token.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    purpose: { type: DataTypes.ENUM('password-reset', 'share-invite'), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    shareId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    usedAt: { type: DataTypes.DATE(3), allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'tokens' },
);
