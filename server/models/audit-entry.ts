import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute } from 'sequelize';
import { sequelize } from '@/server/db';
import type { User } from './user';

/**
 * One line of the audit log: who (actor) did what (action) to which record
 * (bow, record type and id), a one-line summary, and when. Never updated.
 */
export class AuditEntry extends Model<InferAttributes<AuditEntry>, InferCreationAttributes<AuditEntry>> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare action: string;
  declare bowId: number | null;
  declare recordType: string;
  declare recordId: number | null;
  declare summary: string;
  declare at: CreationOptional<Date>;

  declare actor?: NonAttribute<User | null>;
}

AuditEntry.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    action: { type: DataTypes.STRING(40), allowNull: false },
    bowId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    recordType: { type: DataTypes.STRING(40), allowNull: false },
    recordId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    summary: { type: DataTypes.STRING(300), allowNull: false },
    at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: 'audit_entries', timestamps: false },
);
