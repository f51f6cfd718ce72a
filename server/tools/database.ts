/**
 * The local database for the start and test commands: starts (or reuses) the
 * project-local MariaDB and makes sure the named database exists.
 */
import { config } from '@/server/config';
import { LocalMariaDb } from './local-mariadb';

export async function startLocalDatabase(log: (line: string) => void = console.log): Promise<LocalMariaDb> {
  const db = new LocalMariaDb({
    dataDir: config.db.dataDir,
    port: config.db.port,
    appUser: config.db.user,
    appPassword: config.db.password,
  });
  await db.start(log);
  return db;
}

export async function createDatabase(db: LocalMariaDb, name: string): Promise<void> {
  if (!/^[A-Za-z0-9_]+$/.test(name)) throw new Error(`unsafe database name: ${name}`);
  await db.rootQuery(`CREATE DATABASE IF NOT EXISTS \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
}

export async function dropDatabase(db: LocalMariaDb, name: string): Promise<void> {
  if (!/^[A-Za-z0-9_]+$/.test(name)) throw new Error(`unsafe database name: ${name}`);
  await db.rootQuery(`DROP DATABASE IF EXISTS \`${name}\``);
}
