/**
 * Runs the server: connect, migrate, listen; closes cleanly on SIGTERM/SIGINT.
 * `npm start` (server/tools/start.ts) wraps this with the local database.
 */
import type { Server } from 'node:http';
import { createApp } from './app';
import { config } from './config';
import { closeDatabase, sequelize } from './db';
import { migrate } from './migrations';

export async function startServer({ port = config.port, host = config.host } = {}): Promise<{
  server: Server;
  close: () => Promise<void>;
}> {
  await sequelize.authenticate();
  await migrate(sequelize);
  const app = createApp();
  const server = await new Promise<Server>((resolve, reject) => {
    const s = app.listen(port, host, () => resolve(s));
    s.once('error', reject);
  });
  const close = async () => {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeAllConnections?.();
    app.locals.sessionStore?.stopExpiringSessions?.();
    await closeDatabase();
  };
  return { server, close };
}

if (require.main === module) {
  startServer()
    .then(({ close }) => {
      console.log(`Pinwright listening on http://${config.host}:${config.port}`);
      const stop = () => close().then(() => process.exit(0));
      process.once('SIGTERM', stop);
      process.once('SIGINT', stop);
    })
    .catch((err) => {
      console.error(err);
      process.exit(1);
    });
}
