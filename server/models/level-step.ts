import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { LevelResult, LevelStepKey, ReadingUnit } from '@/shared/level';
import type { Photo } from './photo';

/** One step of a level check; `result` is null until the step is worked. */
export class LevelStep extends Model<InferAttributes<LevelStep>, InferCreationAttributes<LevelStep>> {
  declare id: CreationOptional<number>;
  declare checkId: number;
  declare step: LevelStepKey;
  declare result: LevelResult | null;
  /** Optional reading in `readingUnit` (degrees, mm offset or bubble widths). */
  declare reading: number | null;
  declare readingUnit: ReadingUnit | null;
  declare adjustment: CreationOptional<string>;
  declare photoId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare photo?: NonAttribute<Photo | null>;
}

LevelStep.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    checkId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    step: { type: DataTypes.ENUM('setup', 'first-axis', 'second-axis', 'third-axis', 'range'), allowNull: false },
    result: { type: DataTypes.ENUM('pass', 'adjusted', 'fail', 'skipped'), allowNull: true },
    reading: { type: DataTypes.DOUBLE, allowNull: true },
    readingUnit: { type: DataTypes.ENUM('deg', 'mm', 'bubble'), allowNull: true },
    adjustment: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    photoId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'level_steps' },
);
