import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { User } from './user';

/** An arrow that flew out of the group at a sight-in (migration 0056). */
export class ArrowFlier extends Model<InferAttributes<ArrowFlier>, InferCreationAttributes<ArrowFlier>> {
  declare id: CreationOptional<number>;
  declare arrowId: number;
  declare sightInId: number;
  declare userId: number | null;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare addedBy?: NonAttribute<User | null>;
}

ArrowFlier.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    arrowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    sightInId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    note: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'arrow_fliers' },
);
