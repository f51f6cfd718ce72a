/**
 * For developers: run some Jest tests against the project-local MariaDB with a
 * scratch database (migrated, dropped after), without building the web app.
 *   npx tsx server/tools/dev-test-db.ts -- --selectProjects api tests/api/bows.test.ts
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawn } from 'node:child_process';

async function main() {
  const root = path.resolve(__dirname, '../..');
  const dbName = `pinwright_dev_${Date.now().toString(36)}_${process.pid}`;
  process.env.DB_NAME = dbName;
  process.env.NODE_ENV = 'test';
  const { startLocalDatabase, createDatabase, dropDatabase } = await import('./database');
  const db = await startLocalDatabase(() => {});
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
    const args = process.argv.slice(2).filter((a) => a !== '--');
    code = await new Promise<number>((resolve) => {
      const child = spawn(process.execPath, [path.join(root, 'node_modules/jest/bin/jest.js'), ...args], { cwd: root, stdio: 'inherit', env: process.env });
      child.on('exit', (c) => resolve(c ?? 1));
    });
  } finally {
    await dropDatabase(db, dbName).catch(() => {});
    await smtp?.close();
    // Leave a shared server running if someone else started it; stop ours.
    await db.stop();
  }
  process.exit(code);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
