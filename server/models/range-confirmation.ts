import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { User } from './user';

/** "Marks confirmed at the range" on a sight-in (migration 0057; shared/staleness.ts). */
export class RangeConfirmation extends Model<InferAttributes<RangeConfirmation>, InferCreationAttributes<RangeConfirmation>> {
  declare id: CreationOptional<number>;
  declare sightInId: number;
  declare userId: number | null;
  declare confirmedAt: Date;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare confirmedBy?: NonAttribute<User | null>;
}

RangeConfirmation.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    sightInId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    confirmedAt: { type: DataTypes.DATE(3), allowNull: false },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'range_confirmations' },
);
