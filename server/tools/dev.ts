/**
 * `npm run dev`: the API (with the local database and demo data) on
 * http://127.0.0.1:3000, and the Expo dev server for the web behind it.
 * Express proxies every non-/api request (and the hot-reload web socket)
 * to Metro on 127.0.0.1:8081, so the page and the API share one origin.
 */
import http from 'node:http';
import net from 'node:net';
import path from 'node:path';
import { spawn } from 'node:child_process';
import express from 'express';
import { config } from '@/server/config';
import { startLocalDatabase, createDatabase } from './database';

const METRO_PORT = Number(process.env.METRO_PORT || 8081);

async function main() {
  const root = path.resolve(__dirname, '../..');
  const db = await startLocalDatabase();
  await createDatabase(db, config.db.name);
  const { closeDatabase, sequelize } = await import('@/server/db');
  await (await import('@/server/migrations')).migrate(sequelize);
  const { seedDemo, demoAccounts } = await import('@/server/seed/demo');
  await seedDemo();
  // A local fake SMTP service keeps every e-mail (read them at /dev-mail).
  const smtp = config.smtp.fake
    ? await (await import('@/server/mail/fake-smtp')).startFakeSmtp({ port: config.smtp.port, dir: config.mailDir })
    : null;
  const { createApp } = await import('@/server/app');

  const metro = spawn(
    process.execPath,
    [path.join(root, 'node_modules/expo/bin/cli'), 'start', '--web', '--localhost', '--port', String(METRO_PORT)],
    {
      cwd: root,
      stdio: 'inherit',
      env: { ...process.env, EXPO_NO_TELEMETRY: '1', EXPO_OFFLINE: '1', EXPO_UNSTABLE_HEADLESS: '1', BROWSER: 'none' },
    },
  );

  const outer = express();
  const api = createApp({ webDir: path.join(root, '.no-web-export') });
  outer.use('/api', (req, res, next) => {
    req.url = req.originalUrl;
    api(req, res, next);
  });
  outer.use((req, res) => {
    const upstream = http.request(
      { host: '127.0.0.1', port: METRO_PORT, path: req.originalUrl, method: req.method, headers: req.headers },
      (metroRes) => {
        res.writeHead(metroRes.statusCode ?? 502, metroRes.headers);
        metroRes.pipe(res);
      },
    );
    upstream.on('error', () => res.status(502).send('The Expo dev server is still starting; reload in a moment.'));
    req.pipe(upstream);
  });
  const server = outer.listen(config.port, config.host, () => {
    console.log(`\nPinwright (dev) at http://${config.host}:${config.port}  — Metro on :${METRO_PORT}`);
    for (const a of demoAccounts) console.log(`  ${a.role.padEnd(7)} ${a.email}  /  ${a.password}`);
  });
  // Hot reload runs over a web socket: pass upgrades straight through.
  server.on('upgrade', (req, socket, head) => {
    const upstream = net.connect(METRO_PORT, '127.0.0.1', () => {
      upstream.write(
        `${req.method} ${req.url} HTTP/1.1\r\n${Object.entries(req.headers)
          .map(([k, v]) => `${k}: ${v}`)
          .join('\r\n')}\r\n\r\n`,
      );
      upstream.write(head);
      socket.pipe(upstream).pipe(socket);
    });
    upstream.on('error', () => socket.destroy());
  });
  const stop = async () => {
    metro.kill('SIGTERM');
    await smtp?.close();
    server.close();
    await closeDatabase().catch(() => {});
    await db.stop();
    process.exit(0);
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
