import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
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
  declare altitudeUnit: CreationOptional<'ft' | 'm'>;
  declare temperatureUnit: CreationOptional<'F' | 'C'>;
  declare speedUnit: CreationOptional<'fps' | 'mps'>;
  declare massUnit: CreationOptional<'gr' | 'g'>;
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
      altitudeUnit: this.altitudeUnit,
      temperatureUnit: this.temperatureUnit,
      speedUnit: this.speedUnit,
      massUnit: this.massUnit,
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
    // Migration 0065 (shared/units.ts): the rest of the unit choices.
    altitudeUnit: { type: DataTypes.ENUM('ft', 'm'), allowNull: false, defaultValue: 'm' },
    temperatureUnit: { type: DataTypes.ENUM('F', 'C'), allowNull: false, defaultValue: 'C' },
    speedUnit: { type: DataTypes.ENUM('fps', 'mps'), allowNull: false, defaultValue: 'fps' },
    massUnit: { type: DataTypes.ENUM('gr', 'g'), allowNull: false, defaultValue: 'gr' },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'users' },
);
