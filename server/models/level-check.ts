import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { LevelPlace } from '@/shared/level';
import type { LevelStep } from './level-step';
import type { User } from './user';

/** One level check of a bow: started, worked step by step (resumable), completed. */
export class LevelCheck extends Model<InferAttributes<LevelCheck>, InferCreationAttributes<LevelCheck>> {
  declare id: CreationOptional<number>;
  declare bowId: number;
  /** Who performed it (null once that account is deleted). */
  declare userId: number | null;
  declare place: LevelPlace;
  declare status: CreationOptional<'open' | 'complete'>;
  declare startedAt: Date;
  declare completedAt: Date | null;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare steps?: NonAttribute<LevelStep[]>;
  declare performer?: NonAttribute<User | null>;
}

LevelCheck.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    place: { type: DataTypes.ENUM('bench', 'range'), allowNull: false },
    status: { type: DataTypes.ENUM('open', 'complete'), allowNull: false, defaultValue: 'open' },
    startedAt: { type: DataTypes.DATE(3), allowNull: false },
    completedAt: { type: DataTypes.DATE(3), allowNull: true },
    note: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'level_checks' },
);
