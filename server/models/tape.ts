import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/server/db';
import type { Paper, TapeOrientation } from '@/shared/tape';

/** A saved tape layout for one sight-in's fit (range, step, unit, orientation, width, mirror, paper, label). */
export class Tape extends Model<InferAttributes<Tape>, InferCreationAttributes<Tape>> {
  declare id: CreationOptional<number>;
  declare sightInId: ForeignKey<number>;
  declare fromDistance: number;
  declare toDistance: number;
  declare step: number;
  declare unit: 'yd' | 'm';
  declare orientation: TapeOrientation;
  declare widthMm: number;
  declare mirror: boolean;
  declare paper: Paper;
  declare label: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Tape.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    fromDistance: { type: DataTypes.DOUBLE, allowNull: false },
    toDistance: { type: DataTypes.DOUBLE, allowNull: false },
    step: { type: DataTypes.DOUBLE, allowNull: false },
    unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false },
    orientation: { type: DataTypes.ENUM('down', 'up'), allowNull: false },
    widthMm: { type: DataTypes.DOUBLE, allowNull: false },
    mirror: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    paper: { type: DataTypes.ENUM('a4', 'letter'), allowNull: false },
    label: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'tapes' },
);
