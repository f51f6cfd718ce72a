/**
 * Runs Jest against a scratch database on the project-local MariaDB: start
 * (or reuse) the server, create and migrate `<prefix>_<id>`, start the fake
 * SMTP service, run Jest, then drop the database and stop what was started.
 * Used by `npm test` (test-run.ts) and by developers (dev-test-db.ts).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawn } from 'node:child_process';

export type ScratchRunOptions = {
  prefix: string;
  jestArgs: string[];
  /** Rebuild dist/ first when its sources changed (the browser tests use it). */
  buildWeb?: boolean;
  /** Type-check the whole project first; errors fail the run (Jest still runs). */
  typecheck?: boolean;
  /** Run `npm run lint` (ESLint with --max-warnings 0, Prettier --check) first; any finding fails the run (Jest still runs). */
  lint?: boolean;
  quiet?: boolean;
};

const root = path.resolve(__dirname, '../..');

function run(command: string, args: string[], env: NodeJS.ProcessEnv): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(command, args, { cwd: root, stdio: 'inherit', env });
    child.on('exit', (code) => resolve(code ?? 1));
  });
}

export async function runJestOnScratchDatabase(options: ScratchRunOptions): Promise<number> {
  const dbName = `${options.prefix}_${Date.now().toString(36)}_${process.pid}`;
  process.env.DB_NAME = dbName;
  process.env.NODE_ENV = 'test';
  // Every answer from the bow read's cache is checked against a fresh read (server/services/bow-read.ts).
  process.env.PINWRIGHT_CHECK_READ_CACHE ??= '1';
  // Imported only now: config reads DB_NAME when it is first loaded.
  const { startLocalDatabase, createDatabase, dropDatabase } = await import('./database');
  const db = await startLocalDatabase(options.quiet ? () => {} : console.log);
  let smtp: { close: () => Promise<void> } | undefined;
  let code = 1;
  try {
    await createDatabase(db, dbName);
    // Fake SMTP on a free port; its mailbox is a fresh folder the test workers read (MAIL_DIR).
    process.env.MAIL_DIR ||= fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-mail-'));
    const fake = await (await import('@/server/mail/fake-smtp')).startFakeSmtp({ port: 0, dir: process.env.MAIL_DIR! });
    smtp = fake;
    process.env.SMTP_PORT = String(fake.port);
    const { sequelize } = await import('@/server/db');
    await (await import('@/server/migrations')).migrate(sequelize);
    await sequelize.close();
    if (options.buildWeb) await (await import('./web-export')).exportWebIfStale(root);
    let typeErrors = 0;
    if (options.typecheck) {
      console.log('Type-checking (tsc --noEmit)…');
      typeErrors = await run(process.execPath, [path.join(root, 'node_modules/typescript/bin/tsc'), '--noEmit', '-p', root], process.env);
      if (typeErrors) console.error('Type errors above: the run fails, the tests still run.');
    }
    if (options.lint) {
      console.log('Linting (npm run lint: ESLint, then Prettier --check)…');
      const lintErrors = await run('npm', ['run', '--silent', 'lint'], process.env);
      if (lintErrors) console.error('Lint findings above: the run fails, the tests still run. `npm run format` fixes the formatting.');
      typeErrors ||= lintErrors;
    }
    const resultsFile = path.join(os.tmpdir(), `${dbName}-results.json`);
    const jestCode = await run(
      process.execPath,
      [path.join(root, 'node_modules/jest/bin/jest.js'), '--json', `--outputFile=${resultsFile}`, ...options.jestArgs],
      process.env,
    );
    code = jestCode || (typeErrors ? 1 : 0);
    // One plain closing line: what ran, whatever the reporters printed above.
    if (fs.existsSync(resultsFile)) {
      const results = JSON.parse(fs.readFileSync(resultsFile, 'utf8'));
      fs.rmSync(resultsFile, { force: true });
      const skipped = results.numPendingTests + results.numTodoTests;
      console.log(`\nSummary: ${results.numPassedTests} passed, ${results.numFailedTests} failed${skipped ? `, ${skipped} skipped` : ''}`);
    }
  } catch (err) {
    console.error(err instanceof Error ? err.message : err);
  } finally {
    await dropDatabase(db, dbName).catch(() => {});
    await smtp?.close();
    // A server someone else started (e.g. `npm start`) is left running.
    await db.stop();
  }
  return code;
}
