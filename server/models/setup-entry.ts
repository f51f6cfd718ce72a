import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import { setupMeasureKeys, type SetupMeasureKey } from '@/shared/setup-measures';
import type { User } from './user';

/** One dated entry of a bow's tuning set-up (migration 0051; shared/setup-measures.ts). */
export class SetupEntry extends Model<InferAttributes<SetupEntry>, InferCreationAttributes<SetupEntry>> {
  declare id: CreationOptional<number>;
  declare bowId: number;
  /** Who added it (null once that account is deleted). */
  declare userId: number | null;
  declare measure: SetupMeasureKey;
  declare valueMm: number | null;
  declare choice: string | null;
  declare measuredOn: string;
  declare note: CreationOptional<string>;
  /** The change it logged (it differed from the last entry), or null. */
  declare changeId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare addedBy?: NonAttribute<User | null>;
}

SetupEntry.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    measure: { type: DataTypes.ENUM(...setupMeasureKeys), allowNull: false },
    valueMm: { type: DataTypes.DOUBLE, allowNull: true },
    choice: { type: DataTypes.STRING(30), allowNull: true },
    measuredOn: { type: DataTypes.DATEONLY, allowNull: false },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    changeId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'setup_entries' },
);
