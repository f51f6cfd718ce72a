import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import { bowChangeKinds, type BowChangeKind } from '@/shared/level-status';
import type { User } from './user';

/** A logged change on a bow (new string, sight moved, …); one after the last level check makes the bow due. */
export class BowChange extends Model<InferAttributes<BowChange>, InferCreationAttributes<BowChange>> {
  declare id: CreationOptional<number>;
  declare bowId: number;
  /** Who logged it (null once that account is deleted). */
  declare userId: number | null;
  declare kind: BowChangeKind;
  declare changedAt: Date;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare loggedBy?: NonAttribute<User | null>;
}

BowChange.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    kind: {
      // Kinds from 0050 on: see shared/level-status.ts.
      type: DataTypes.ENUM(...bowChangeKinds),
      allowNull: false,
    },
    changedAt: { type: DataTypes.DATE(3), allowNull: false },
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'bow_changes' },
);
