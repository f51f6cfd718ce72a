/**
 * The one Sequelize instance. Models bind to it at import; nothing connects
 * until the first query.
 */
import { Sequelize } from 'sequelize';
import mariadb from 'mariadb';
import { config } from './config';

export function createSequelize(db = config.db): Sequelize {
  return new Sequelize(db.name, db.user, db.password, {
    host: db.host,
    port: db.port,
    dialect: 'mariadb',
    // mariadb 3.0.2 is pinned on purpose: Sequelize 6.37 with mariadb >= 3.1
    // fails on raw queries and removeColumn (sequelize#15701, connector #234).
    dialectModule: mariadb,
    dialectOptions: { timezone: '+00:00', connectTimeout: 3000 },
    timezone: '+00:00',
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 10_000 },
    define: { underscored: true },
  });
}

export const sequelize = createSequelize();

let multiStatementPool: mariadb.Pool | undefined;

/**
 * A small pool of plain connector connections that take several statements in
 * one query, for the bow read's fixed SQL only (services/bow-read.ts): the
 * read's statements go out in one write and come back in one round trip,
 * where one write per statement on Sequelize's connections cost the server
 * about a tenth of a bow read (a CPU profile under load). Values are still
 * `?` parameters, escaped by the connector; nothing else may use it (the
 * rest of the app keeps single-statement connections, so an escaping slip
 * there cannot chain a second statement). Dates come back as text (UTC, as
 * stored); made at the first read, ended by closeDatabase.
 */
export function bowReadPool(db = config.db): mariadb.Pool {
  multiStatementPool ??= mariadb.createPool({
    host: db.host,
    port: db.port,
    user: db.user,
    password: db.password,
    database: db.name,
    multipleStatements: true,
    dateStrings: true,
    bigIntAsNumber: true,
    initSql: "SET time_zone = '+00:00'",
    connectTimeout: 3000,
    connectionLimit: 4, // (minimumIdle: 0 leaves mariadb 3.0.2's pool never connecting; the default keeps the four open)
  });
  return multiStatementPool;
}

/** Closes every connection to the database: Sequelize's and the bow read's. */
export async function closeDatabase(): Promise<void> {
  const pool = multiStatementPool;
  multiStatementPool = undefined;
  await pool?.end();
  await sequelize.close();
}
