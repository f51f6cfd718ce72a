import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp } from '@/server/app';
import { createSequelize } from '@/server/db';
import { config } from '@/server/config';
import { LocalMariaDb } from '@/server/tools/local-mariadb';
import { closeDb, testApp } from '../helpers/api';

afterAll(closeDb);

it('reports ok with the database up', async () => {
  const res = await request(testApp()).get('/api/health');
  expect(res.status).toBe(200);
  expect(res.body).toEqual({ status: 'ok', db: 'up' });
});

it('answers 503 once its database server has stopped', async () => {
  // A second, real MariaDB server of our own on another port, stopped mid-test.
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'pw-health-'));
  const port = 3400 + (process.pid % 500);
  const server = new LocalMariaDb({ dataDir, port, appUser: 'pinwright', appPassword: 'x-health' });
  await server.start();
  const sequelize = createSequelize({ ...config.db, port, password: 'x-health', name: 'mysql' });
  try {
    const app = createApp({ sequelize, sessionExpiryTimer: false });
    expect((await request(app).get('/api/health')).status).toBe(200);
    await server.stop();
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ status: 'degraded', db: 'down', error: { code: 'db_unavailable' } });
  } finally {
    await sequelize.close().catch(() => {});
    await server.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}, 60_000);
