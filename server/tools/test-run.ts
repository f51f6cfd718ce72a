/**
 * `npm test`: a throwaway database for this run (dropped at the end), the web
 * build, a type-check, the linter and formatter check, then every Jest project. Extra arguments go to Jest.
 */
import { runJestOnScratchDatabase } from './scratch-jest';

runJestOnScratchDatabase({
  prefix: 'pinwright_test',
  buildWeb: true,
  typecheck: true,
  lint: true,
  // --forceExit: a stray keep-alive socket must never hang CI after the summary.
  jestArgs: ['--ci', '--forceExit', ...process.argv.slice(2)],
}).then((code) => process.exit(code));
