import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { Arrow } from './arrow';
import type { User } from './user';

/** A numbered arrow set of an arrow build (migration 0054). */
export class ArrowSet extends Model<InferAttributes<ArrowSet>, InferCreationAttributes<ArrowSet>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare userId: number | null;
  declare name: string;
  declare toleranceGr: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare addedBy?: NonAttribute<User | null>;
  declare arrows?: NonAttribute<Arrow[]>;
}

ArrowSet.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    name: { type: DataTypes.STRING(60), allowNull: false },
    toleranceGr: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 2 },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'arrow_sets' },
);
