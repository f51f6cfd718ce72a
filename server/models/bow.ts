import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/server/db';
import type { Hand, ScaleDirection, SightKind } from '@/shared/bow';

/** A bow, owned by one account. Lengths in mm (converted at the UI's edge). */
export class Bow extends Model<InferAttributes<Bow>, InferCreationAttributes<Bow>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<number>;
  declare nickname: string;
  declare hand: Hand;
  declare drawWeightLb: number;
  declare drawLengthMm: number;
  declare letOffPct: number | null;
  declare ratedSpeedFps: number | null;
  declare sightDescription: string;
  declare sightKind: SightKind;
  declare sightRadiusMm: number;
  declare peepHeightMm: number;
  declare scaleDirection: ScaleDirection;
  declare tapeWidthMm: number;
  declare pinDistances: number[];
  declare pinDistanceUnit: 'yd' | 'm';
  declare notes: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Bow.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    nickname: { type: DataTypes.STRING(60), allowNull: false },
    hand: { type: DataTypes.ENUM('right', 'left'), allowNull: false },
    drawWeightLb: { type: DataTypes.DOUBLE, allowNull: false },
    drawLengthMm: { type: DataTypes.DOUBLE, allowNull: false },
    letOffPct: { type: DataTypes.DOUBLE, allowNull: true },
    ratedSpeedFps: { type: DataTypes.DOUBLE, allowNull: true },
    sightDescription: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    sightKind: { type: DataTypes.ENUM('single-pin-slider', 'fixed-multi-pin', 'hybrid'), allowNull: false },
    sightRadiusMm: { type: DataTypes.DOUBLE, allowNull: false },
    peepHeightMm: { type: DataTypes.DOUBLE, allowNull: false },
    scaleDirection: { type: DataTypes.ENUM('down', 'up'), allowNull: false, defaultValue: 'down' },
    tapeWidthMm: { type: DataTypes.DOUBLE, allowNull: false },
    pinDistances: { type: DataTypes.JSON, allowNull: false },
    pinDistanceUnit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false, defaultValue: 'yd' },
    notes: { type: DataTypes.TEXT, allowNull: false },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'bows' },
);
