/**
 * For developers: run some Jest tests on a scratch database (migrated, dropped
 * after) without rebuilding the web app or type-checking:
 *   npx tsx server/tools/dev-test-db.ts -- --selectProjects api -- tests/api/bows.test.ts
 */
import { runJestOnScratchDatabase } from './scratch-jest';

const args = process.argv.slice(2);
if (args[0] === '--') args.shift();

runJestOnScratchDatabase({ prefix: 'pinwright_dev', jestArgs: args, quiet: true }).then((code) => process.exit(code));
