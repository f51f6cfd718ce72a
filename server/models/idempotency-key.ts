import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/server/db';

/**
 * One idempotency key an account sent with a write (server/middleware/idempotency.ts):
 * the request it named (method, path) and, once answered, the status and JSON
 * body to replay. statusCode null: the first request is still running.
 */
export class IdempotencyKey extends Model<InferAttributes<IdempotencyKey>, InferCreationAttributes<IdempotencyKey>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare idemKey: string;
  declare method: string;
  declare path: string;
  /** SHA-256 (hex) of the method, path and JSON body: the same key with another request is refused. */
  declare requestHash: string;
  declare statusCode: number | null;
  declare responseBody: string | null;
  declare createdAt: CreationOptional<Date>;
}

IdempotencyKey.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    idemKey: { type: DataTypes.STRING(100), allowNull: false },
    method: { type: DataTypes.STRING(10), allowNull: false },
    path: { type: DataTypes.STRING(300), allowNull: false },
    requestHash: { type: DataTypes.CHAR(64), allowNull: false },
    statusCode: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
    responseBody: { type: DataTypes.TEXT('medium'), allowNull: true },
    createdAt: { type: DataTypes.DATE(3), allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: 'idempotency_keys', timestamps: false },
);
