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
