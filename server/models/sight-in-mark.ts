import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/server/db';

/** One sighted mark of a sight-in: distance (yd or m), scale reading (mm), arrows shot, note. */
export class SightInMark extends Model<InferAttributes<SightInMark>, InferCreationAttributes<SightInMark>> {
  declare id: CreationOptional<number>;
  declare sightInId: ForeignKey<number>;
  /** Entry order within the sight-in, from 0. */
  declare position: number;
  declare distance: number;
  declare unit: 'yd' | 'm';
  declare scaleMm: number;
  declare arrowsShot: number | null;
  declare note: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Who added it (set on create: server/models/added-by.ts; null once that account is deleted). */
  declare addedById: CreationOptional<number | null>;
}

SightInMark.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
    distance: { type: DataTypes.DOUBLE, allowNull: false },
    unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false },
    scaleMm: { type: DataTypes.DOUBLE, allowNull: false },
    arrowsShot: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
    note: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
    addedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
  },
  { sequelize, tableName: 'sight_in_marks' },
);
