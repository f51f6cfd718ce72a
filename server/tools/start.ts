/**
 * `npm start`: the local database, migrations, demo data, the web build, then
 * the server on http://127.0.0.1:3000. Ctrl-C / SIGTERM stops the server and
 * the database it started.
 */
import path from 'node:path';
import { config } from '@/server/config';
import { startLocalDatabase, createDatabase } from './database';
import { exportWebIfStale } from './web-export';

async function main() {
  const root = path.resolve(__dirname, '../..');
  const db = await startLocalDatabase();
  let stopping = false;
  const stopDb = async () => {
    if (stopping) return;
    stopping = true;
    await db.stop();
  };
  try {
    await createDatabase(db, config.db.name);
    const { sequelize } = await import('@/server/db');
    const { migrate } = await import('@/server/migrations');
    const applied = await migrate(sequelize);
    if (applied.length) console.log(`Applied migrations: ${applied.join(', ')}`);
    const { seedDemo, demoAccounts } = await import('@/server/seed/demo');
    await seedDemo();
    // Development: a local fake SMTP service keeps every e-mail (read them at /dev-mail).
    const smtp = config.smtp.fake
      ? await (await import('@/server/mail/fake-smtp')).startFakeSmtp({ port: config.smtp.port, dir: config.mailDir })
      : null;
    await exportWebIfStale(root);
    const { startServer } = await import('@/server/index');
    const { close } = await startServer();
    const url = `http://${config.host}:${config.port}`;
    console.log(`\nPinwright is running at ${url}\n\nDemo sign-ins:`);
    for (const account of demoAccounts) console.log(`  ${account.role.padEnd(7)} ${account.email}  /  ${account.password}`);
    console.log('\nPress Ctrl-C to stop (the database stops with it).');
    const shutdown = async () => {
      console.log('\nStopping…');
      await close().catch(() => {});
      await smtp?.close();
      await stopDb();
      process.exit(0);
    };
    process.once('SIGINT', shutdown);
    process.once('SIGTERM', shutdown);
  } catch (err) {
    console.error(err instanceof Error ? err.message : err);
    await stopDb();
    process.exit(1);
  }
}

main();
