/**
 * The real app, on a scratch database seeded with the invented demo, serving
 * a given web export on a free port of 127.0.0.1; dropped again afterwards.
 * For tools that measure or record the web app in a browser
 * (tests/benchmarks/web.ts, record-start-up-modules.ts).
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { demoAccounts as DemoAccounts } from '../seed/demo';

export type DemoApp = { baseUrl: string; demoAccounts: typeof DemoAccounts };

/** `prefix` names the scratch database; DB_NAME is set before server/config.ts is first loaded. */
export async function withDemoApp<T>(prefix: string, webDir: string, run: (app: DemoApp) => Promise<T>): Promise<T> {
  const dbName = `${prefix}_${Date.now().toString(36)}_${process.pid}`;
  process.env.DB_NAME = dbName;
  process.env.NODE_ENV ||= 'test';
  const { config } = await import('../config');
  if (config.db.name !== dbName) throw new Error('DB_NAME must be set before server/config.ts is first loaded');
  const { startLocalDatabase, createDatabase, dropDatabase } = await import('./database');
  const db = await startLocalDatabase(() => {});
  let server: Server | undefined;
  let closeDatabase: (() => Promise<void>) | undefined;
  try {
    await createDatabase(db, dbName);
    const dbModule = await import('../db');
    closeDatabase = dbModule.closeDatabase;
    const { sequelize } = dbModule;
    await (await import('../migrations')).migrate(sequelize);
    const { seedDemo, demoAccounts } = await import('../seed/demo');
    await seedDemo();
    const { createApp } = await import('../app');
    const app = createApp({ sessionExpiryTimer: false, webDir });
    server = await new Promise<Server>((resolve) => {
      const s = app.listen(0, '127.0.0.1', () => resolve(s));
    });
    return await run({ baseUrl: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, demoAccounts });
  } finally {
    if (server) {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server!.close(() => resolve()));
    }
    // Also when `run` failed: an open pool would try to reconnect to the stopped server and crash.
    await closeDatabase?.().catch(() => {});
    await dropDatabase(db, dbName).catch(() => {});
    await db.stop();
  }
}
