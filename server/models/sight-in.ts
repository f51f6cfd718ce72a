import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from 'sequelize';
import { sequelize } from '@/server/db';
import type { SightInMark } from './sight-in-mark';

/**
 * A sight-in: bow + build, date, place and air, with the fit the math
 * core computed from its marks when it was saved (`fit`, JSON) and two summary
 * numbers copied from that fit for lists.
 */
export class SightIn extends Model<InferAttributes<SightIn>, InferCreationAttributes<SightIn>> {
  declare id: CreationOptional<number>;
  declare bowId: ForeignKey<number>;
  declare buildId: ForeignKey<number>;
  /** YYYY-MM-DD. */
  declare date: string;
  declare placeLabel: string;
  declare altitudeM: number | null;
  declare temperatureC: number | null;
  declare notes: string;
  declare fit: unknown;
  declare fitSpeedFps: number | null;
  declare fitRmsMm: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Who added it (set on create: server/models/added-by.ts; null once that account is deleted). */
  declare addedById: CreationOptional<number | null>;
  declare marks?: NonAttribute<SightInMark[]>;
}

SightIn.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    date: { type: DataTypes.DATEONLY, allowNull: false },
    placeLabel: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
    altitudeM: { type: DataTypes.DOUBLE, allowNull: true },
    temperatureC: { type: DataTypes.DOUBLE, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false },
    fit: { type: DataTypes.JSON, allowNull: false },
    fitSpeedFps: { type: DataTypes.DOUBLE, allowNull: true },
    fitRmsMm: { type: DataTypes.DOUBLE, allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
    addedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
  },
  { sequelize, tableName: 'sight_ins' },
);
