/**
 * Migrations, listed explicitly so the same code runs under tsx, in Jest and
 * in a build. One DDL change per migration: MariaDB DDL is not transactional.
 * Add new ones at the end; never edit one that has shipped.
 */
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import * as m0001 from './0001-users';
import * as m0002 from './0002-web-sessions';

type Step = { up: (p: { context: QueryInterface }) => Promise<void>; down: (p: { context: QueryInterface }) => Promise<void> };

export const migrations: Array<[string, Step]> = [
  ['0001-users', m0001],
  ['0002-web-sessions', m0002],
];

export function migrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: migrations.map(([name, step]) => ({ name, up: step.up, down: step.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const done = await migrator(sequelize).up();
  return done.map((m) => m.name);
}
