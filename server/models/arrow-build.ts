import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/server/db';

/**
 * An arrow build on one bow. Masses in grains, lengths in mm, speed in fps.
 * The derived columns (totalGr … momentumKgMPerS) are computed by the math core
 * and written by the build service on every save; nothing else writes them.
 */
export class ArrowBuild extends Model<InferAttributes<ArrowBuild>, InferCreationAttributes<ArrowBuild>> {
  declare id: CreationOptional<number>;
  declare bowId: ForeignKey<number>;
  declare name: string;
  declare shaftLabel: string;
  declare spine: number | null;
  declare grainsPerInch: number;
  declare cutLengthMm: number;
  declare diameterMm: number;
  declare pointGr: number;
  declare insertGr: number;
  declare collarGr: number;
  declare nockGr: number;
  declare vaneCount: number;
  declare vaneWeightGr: number;
  declare wrapGr: number;
  declare balancePointMm: number | null;
  declare speedFps: number | null;
  declare dragCoefficient: number | null;
  declare totalGr: number;
  declare focPct: number | null;
  declare kineticEnergyFtLb: number | null;
  declare kineticEnergyJ: number | null;
  declare momentumSlugFtPerS: number | null;
  declare momentumKgMPerS: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Who added it (set on create: server/models/added-by.ts; null once that account is deleted). */
  declare addedById: CreationOptional<number | null>;
}

ArrowBuild.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(60), allowNull: false },
    shaftLabel: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
    spine: { type: DataTypes.INTEGER, allowNull: true },
    grainsPerInch: { type: DataTypes.DOUBLE, allowNull: false },
    cutLengthMm: { type: DataTypes.DOUBLE, allowNull: false },
    diameterMm: { type: DataTypes.DOUBLE, allowNull: false },
    pointGr: { type: DataTypes.DOUBLE, allowNull: false },
    insertGr: { type: DataTypes.DOUBLE, allowNull: false },
    collarGr: { type: DataTypes.DOUBLE, allowNull: false },
    nockGr: { type: DataTypes.DOUBLE, allowNull: false },
    vaneCount: { type: DataTypes.INTEGER, allowNull: false },
    vaneWeightGr: { type: DataTypes.DOUBLE, allowNull: false },
    wrapGr: { type: DataTypes.DOUBLE, allowNull: false },
    balancePointMm: { type: DataTypes.DOUBLE, allowNull: true },
    speedFps: { type: DataTypes.DOUBLE, allowNull: true },
    dragCoefficient: { type: DataTypes.DOUBLE, allowNull: true },
    totalGr: { type: DataTypes.DOUBLE, allowNull: false },
    focPct: { type: DataTypes.DOUBLE, allowNull: true },
    kineticEnergyFtLb: { type: DataTypes.DOUBLE, allowNull: true },
    kineticEnergyJ: { type: DataTypes.DOUBLE, allowNull: true },
    momentumSlugFtPerS: { type: DataTypes.DOUBLE, allowNull: true },
    momentumKgMPerS: { type: DataTypes.DOUBLE, allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
    addedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
  },
  { sequelize, tableName: 'arrow_builds' },
);
