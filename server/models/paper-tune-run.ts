import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { RunOutcome } from '@/shared/paper-tune';
import type { PaperTuneShot } from './paper-tune-shot';
import type { User } from './user';

/** A paper-tune run of a bow (migration 0052). */
export class PaperTuneRun extends Model<InferAttributes<PaperTuneRun>, InferCreationAttributes<PaperTuneRun>> {
  declare id: CreationOptional<number>;
  declare bowId: number;
  declare userId: number | null;
  declare buildId: number | null;
  declare distance: number;
  declare unit: 'yd' | 'm';
  declare startedOn: string;
  declare outcome: CreationOptional<RunOutcome>;
  declare endedAt: CreationOptional<Date | null>;
  declare note: CreationOptional<string>;
  declare endNote: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare addedBy?: NonAttribute<User | null>;
  declare shots?: NonAttribute<PaperTuneShot[]>;
}

PaperTuneRun.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    distance: { type: DataTypes.DOUBLE, allowNull: false },
    unit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false },
    startedOn: { type: DataTypes.DATEONLY, allowNull: false },
    outcome: { type: DataTypes.ENUM('open', 'clean', 'pro-shop'), allowNull: false, defaultValue: 'open' },
    endedAt: { type: DataTypes.DATE(3), allowNull: true },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    endNote: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'paper_tune_runs' },
);
