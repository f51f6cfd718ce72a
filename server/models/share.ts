import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { ShareState } from '@/shared/share';
import type { Bow } from './bow';
import type { User } from './user';

/**
 * One bow shared by its archer with a technician. `invited` until the
 * technician accepts the e-mailed link (then `active`, with techId set);
 * `revoked` by the archer at any time.
 */
export class Share extends Model<InferAttributes<Share>, InferCreationAttributes<Share>> {
  declare id: CreationOptional<number>;
  declare bowId: number;
  declare archerId: number;
  declare techId: number | null;
  declare invitedEmail: string;
  declare state: CreationOptional<ShareState>;
  declare acceptedAt: Date | null;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare bow?: NonAttribute<Bow>;
  declare archer?: NonAttribute<User>;
  declare tech?: NonAttribute<User | null>;
}

Share.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    archerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    techId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    invitedEmail: { type: DataTypes.STRING(254), allowNull: false },
    state: { type: DataTypes.ENUM('invited', 'active', 'revoked'), allowNull: false, defaultValue: 'invited' },
    acceptedAt: { type: DataTypes.DATE(3), allowNull: true },
    revokedAt: { type: DataTypes.DATE(3), allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'shares' },
);
