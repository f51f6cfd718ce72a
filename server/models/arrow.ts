import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { ArrowStatus, SpinKind } from '@/shared/arrow-set';
import type { ArrowFlier } from './arrow-flier';

/** One numbered arrow of a set (migration 0055). */
export class Arrow extends Model<InferAttributes<Arrow>, InferCreationAttributes<Arrow>> {
  declare id: CreationOptional<number>;
  declare setId: number;
  declare number: number;
  declare weightGr: number;
  declare spinKind: SpinKind;
  declare runout: number | null;
  declare note: CreationOptional<string>;
  declare status: ArrowStatus;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare fliers?: NonAttribute<ArrowFlier[]>;
}

Arrow.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    setId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    number: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
    weightGr: { type: DataTypes.DOUBLE, allowNull: false },
    spinKind: { type: DataTypes.ENUM('none', 'thou', 'mm', 'pass', 'fail'), allowNull: false, defaultValue: 'none' },
    runout: { type: DataTypes.DOUBLE, allowNull: true },
    note: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    status: { type: DataTypes.ENUM('quiver', 'practice', 'retired'), allowNull: false, defaultValue: 'quiver' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'arrows' },
);
