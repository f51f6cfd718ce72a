import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import { tearValues, type Tear } from '@/shared/paper-tune-rules';
import { tuneAdjustmentKinds, type TuneAdjustmentKind } from '@/shared/paper-tune';
import type { User } from './user';

/** One shot through the paper (migration 0053). */
export class PaperTuneShot extends Model<InferAttributes<PaperTuneShot>, InferCreationAttributes<PaperTuneShot>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare userId: number | null;
  declare position: number;
  declare tear: Tear;
  declare lengthMm: number | null;
  declare arrows: number;
  declare note: CreationOptional<string>;
  declare changedBefore: CreationOptional<TuneAdjustmentKind>;
  declare changeNote: CreationOptional<string>;
  declare changeId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare addedBy?: NonAttribute<User | null>;
}

PaperTuneShot.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    runId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
    tear: { type: DataTypes.ENUM(...tearValues), allowNull: false },
    lengthMm: { type: DataTypes.DOUBLE, allowNull: true },
    arrows: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 1 },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    changedBefore: { type: DataTypes.ENUM(...tuneAdjustmentKinds), allowNull: false, defaultValue: 'none' },
    changeNote: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    changeId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'paper_tune_shots' },
);
