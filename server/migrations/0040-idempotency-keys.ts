import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Idempotency keys: one row per (account, key) a client sent with a write, with
 * the response the first request got. A replay of the key by the same account
 * gets that stored response and writes nothing again (the phone's outbox
 * resends after a lost answer). status_code null: the first request is still
 * running. Rows go with their account (cascade).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('idempotency_keys', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    idem_key: { type: DataTypes.STRING(100), allowNull: false },
    method: { type: DataTypes.STRING(10), allowNull: false },
    path: { type: DataTypes.STRING(300), allowNull: false },
    request_hash: { type: DataTypes.CHAR(64), allowNull: false },
    status_code: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
    response_body: { type: DataTypes.TEXT('medium'), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('idempotency_keys', ['user_id', 'idem_key'], { unique: true, name: 'idempotency_keys_user_key' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('idempotency_keys');
}
