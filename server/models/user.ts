import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/server/db';
import type { User as PublicUser } from '@/shared/auth';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare email: string;
  declare passwordHash: string;
  declare role: CreationOptional<'archer' | 'tech' | 'admin'>;
  declare disabled: CreationOptional<boolean>;
  declare distanceUnit: CreationOptional<'yd' | 'm'>;
  declare lengthUnit: CreationOptional<'mm' | 'in'>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The fields a client may see: never the password hash. */
  toPublic(): PublicUser {
    return {
      id: this.id,
      name: this.name,
      email: this.email,
      role: this.role,
      distanceUnit: this.distanceUnit,
      lengthUnit: this.lengthUnit,
    };
  }
}

User.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    role: { type: DataTypes.ENUM('archer', 'tech', 'admin'), allowNull: false, defaultValue: 'archer' },
    disabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    distanceUnit: { type: DataTypes.ENUM('yd', 'm'), allowNull: false, defaultValue: 'yd' },
    lengthUnit: { type: DataTypes.ENUM('mm', 'in'), allowNull: false, defaultValue: 'mm' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'users' },
);
