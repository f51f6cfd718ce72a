/**
 * Migrations, listed explicitly so the same code runs under tsx, in Jest and
 * in a build. One DDL change per migration: MariaDB DDL is not transactional.
 * Add new ones at the end; never edit one that has shipped.
 */
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import * as m0001 from './0001-users';
import * as m0002 from './0002-web-sessions';
import * as m0010 from './0010-bows';
import * as m0011 from './0011-arrow-builds';
import * as m0012 from './0012-sight-sessions';
import * as m0013 from './0013-session-marks';
import * as m0014 from './0014-tapes';
import * as m0020 from './0020-photos';
import * as m0021 from './0021-level-checks';
import * as m0022 from './0022-level-steps';
import * as m0023 from './0023-bow-changes';
import * as m0030 from './0030-shares';
import * as m0031 from './0031-tokens';
import * as m0032 from './0032-audit-entries';
import * as m0040 from './0040-idempotency-keys';
import * as m0060 from './0060-arrow-builds-added-by';
import * as m0061 from './0061-sight-sessions-added-by';
import * as m0062 from './0062-session-marks-added-by';
import * as m0065 from './0065-users-unit-choices';
import * as m0050 from './0050-tuning-change-kinds';
import * as m0051 from './0051-setup-entries';
import * as m0052 from './0052-paper-tune-runs';
import * as m0053 from './0053-paper-tune-shots';
import * as m0054 from './0054-arrow-sets';
import * as m0055 from './0055-arrows';
import * as m0056 from './0056-arrow-fliers';
import * as m0057 from './0057-range-confirmations';
import * as m0058 from './0058-setup-sight-radius';
import * as m0075 from './0075-sight-sessions-warning-count';
import * as m0090 from './0090-bow-read-revisions';
import { sightInRenames } from './0080-sight-in-names';

type Step = { up: (p: { context: QueryInterface }) => Promise<void>; down: (p: { context: QueryInterface }) => Promise<void> };

export const migrations: [string, Step][] = [
  ['0001-users', m0001],
  ['0002-web-sessions', m0002],
  ['0010-bows', m0010],
  ['0011-arrow-builds', m0011],
  ['0012-sight-sessions', m0012],
  ['0013-session-marks', m0013],
  ['0014-tapes', m0014],
  ['0020-photos', m0020],
  ['0021-level-checks', m0021],
  ['0022-level-steps', m0022],
  ['0023-bow-changes', m0023],
  ['0030-shares', m0030],
  ['0031-tokens', m0031],
  ['0032-audit-entries', m0032],
  ['0040-idempotency-keys', m0040],
  ['0060-arrow-builds-added-by', m0060],
  ['0061-sight-sessions-added-by', m0061],
  ['0062-session-marks-added-by', m0062],
  ['0065-users-unit-choices', m0065],
  ['0050-tuning-change-kinds', m0050],
  ['0051-setup-entries', m0051],
  ['0052-paper-tune-runs', m0052],
  ['0053-paper-tune-shots', m0053],
  ['0054-arrow-sets', m0054],
  ['0055-arrows', m0055],
  ['0056-arrow-fliers', m0056],
  ['0057-range-confirmations', m0057],
  ['0058-setup-sight-radius', m0058],
  ['0075-sight-sessions-warning-count', m0075],
  ...sightInRenames,
  ['0090-bow-read-revisions', m0090],
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
