import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional } from 'sequelize';
import { sequelize } from '@/server/db';

/** A signed-in browser session (express-session's store). `userId` lets us end all of an account's sessions. */
export class WebSession extends Model<InferAttributes<WebSession>, InferCreationAttributes<WebSession>> {
  declare sid: string;
  declare userId: number | null;
  declare expires: Date | null;
  declare data: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

WebSession.init(
  {
    sid: { type: DataTypes.STRING(36), primaryKey: true },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    expires: { type: DataTypes.DATE(3), allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: 'web_sessions' },
);
