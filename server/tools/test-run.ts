/**
 * `npm test`: the local database with a throwaway database for this run
 * (dropped at the end), the web build, then every Jest project.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawn } from 'node:child_process';

async function main() {
  const root = path.resolve(__dirname, '../..');
  const dbName = `pinwright_test_${Date.now().toString(36)}_${process.pid}`;
  process.env.DB_NAME = dbName;
  process.env.NODE_ENV = 'test';
  const { startLocalDatabase, createDatabase, dropDatabase } = await import('./database');
  const { exportWebIfStale } = await import('./web-export');
  const db = await startLocalDatabase();
  let code = 1;
  let smtp: { close: () => Promise<void> } | undefined;
  try {
    await createDatabase(db, dbName);
    // Fake SMTP on a free port; its mailbox is a fresh folder the test workers read (MAIL_DIR).
    process.env.MAIL_DIR ||= fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-mail-'));
    const fake = await (await import('@/server/mail/fake-smtp')).startFakeSmtp({ port: 0, dir: process.env.MAIL_DIR! });
    smtp = fake;
    process.env.SMTP_PORT = String(fake.port);
    const { sequelize } = await import('@/server/db');
    const { migrate } = await import('@/server/migrations');
    await migrate(sequelize);
    await sequelize.close();
    await exportWebIfStale(root);
    const args = [path.join(root, 'node_modules/jest/bin/jest.js'), '--ci', ...process.argv.slice(2)];
    code = await new Promise<number>((resolve) => {
      const child = spawn(process.execPath, args, { cwd: root, stdio: 'inherit', env: { ...process.env, DB_NAME: dbName } });
      child.on('exit', (exitCode) => resolve(exitCode ?? 1));
    });
  } catch (err) {
    console.error(err instanceof Error ? err.message : err);
  } finally {
    await dropDatabase(db, dbName).catch(() => {});
    await smtp?.close();
    await db.stop();
  }
  process.exit(code);
}

main();
