/**
 * A project-local MariaDB instance: its own data directory, port and socket,
 * bound to 127.0.0.1, started from Debian's `mariadbd` (see DEVELOPERS.md).
 *
 * `--no-defaults` must come first, or Debian's /etc/mysql config is read too;
 * the charset and time-zone flags make the server utf8mb4 and UTC.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import os from 'node:os';
import mariadb from 'mariadb';

export type LocalMariaDbOptions = {
  dataDir: string;
  port: number;
  /** The account the app connects with; created on first start. */
  appUser: string;
  appPassword: string;
};

const BIN_DIRS = ['/usr/sbin', '/usr/bin'];

function findBinary(name: string): string {
  for (const dir of BIN_DIRS) {
    const candidate = path.join(dir, name);
    if (fs.existsSync(candidate)) return candidate;
  }
  throw new Error(`${name} was not found; run \`npm start\` once to install MariaDB from Debian's packages`);
}

export class LocalMariaDb {
  readonly socket: string;
  readonly pidFile: string;
  private child: ChildProcess | null = null;

  constructor(readonly options: LocalMariaDbOptions) {
    // A unix socket path must stay under ~100 bytes, so keep it short.
    this.socket = path.join(options.dataDir, 'mysqld.sock');
    this.pidFile = path.join(options.dataDir, 'mysqld.pid');
  }

  /** True when this object started the server (and so must stop it). */
  get startedHere(): boolean {
    return this.child !== null;
  }

  /** Reuse a server already running on this data directory, or start one. */
  async start(log: (line: string) => void = () => {}): Promise<void> {
    if (await this.ping()) {
      log(`MariaDB already running on 127.0.0.1:${this.options.port}; reusing it.`);
      await this.ensureAppUser();
      return;
    }
    const { dataDir, port } = this.options;
    const user = os.userInfo().username;
    if (!fs.existsSync(path.join(dataDir, 'mysql'))) {
      log(`Creating a MariaDB data directory in ${dataDir}…`);
      fs.mkdirSync(dataDir, { recursive: true });
      const init = spawnSync(
        findBinary('mariadb-install-db'),
        [
          '--no-defaults',
          `--user=${user}`,
          `--datadir=${dataDir}`,
          '--auth-root-authentication-method=normal',
          '--skip-test-db',
          '--skip-name-resolve',
        ],
        { encoding: 'utf8' },
      );
      if (init.status !== 0) {
        throw new Error(`mariadb-install-db failed:\n${init.stdout}\n${init.stderr}`);
      }
    }
    fs.rmSync(this.socket, { force: true });
    const logFile = fs.openSync(path.join(dataDir, 'server.log'), 'a');
    this.child = spawn(
      findBinary('mariadbd'),
      [
        '--no-defaults',
        `--user=${user}`,
        `--datadir=${dataDir}`,
        `--port=${port}`,
        '--bind-address=127.0.0.1',
        `--socket=${this.socket}`,
        `--pid-file=${this.pidFile}`,
        '--skip-name-resolve',
        '--character-set-server=utf8mb4',
        '--collation-server=utf8mb4_unicode_ci',
        '--default-time-zone=+00:00',
        '--innodb-buffer-pool-size=64M',
        '--max-connections=200',
      ],
      { stdio: ['ignore', logFile, logFile] },
    );
    const exited = new Promise<number | null>((resolve) => this.child?.once('exit', resolve));
    // Poll every 0.1 s; `mariadb-admin --wait` polls only every 5 s.
    const deadline = Date.now() + 30_000;
    while (Date.now() < deadline) {
      const done = await Promise.race([exited, new Promise((r) => setTimeout(() => r('wait'), 100))]);
      if (done !== 'wait') {
        this.child = null;
        throw new Error(`mariadbd exited at start; see ${path.join(dataDir, 'server.log')}`);
      }
      if (await this.ping()) {
        log(`MariaDB started on 127.0.0.1:${port} (data in ${dataDir}).`);
        await this.ensureAppUser();
        return;
      }
    }
    throw new Error('MariaDB did not become ready within 30 s');
  }

  /** Stop the server if this object started it (SIGTERM: a clean shutdown). */
  async stop(): Promise<void> {
    const child = this.child;
    if (!child) return;
    this.child = null;
    await new Promise<void>((resolve) => {
      const timer = setTimeout(() => {
        child.kill('SIGKILL');
      }, 20_000);
      child.once('exit', () => {
        clearTimeout(timer);
        resolve();
      });
      child.kill('SIGTERM');
    });
  }

  /** Run SQL as root over the socket (local administration only). */
  async rootQuery(sql: string, values?: unknown[]): Promise<unknown> {
    const conn = await mariadb.createConnection({ socketPath: this.socket, user: 'root', connectTimeout: 2000 });
    try {
      return await conn.query(sql, values);
    } finally {
      await conn.end();
    }
  }

  private async ping(): Promise<boolean> {
    if (!fs.existsSync(this.socket)) return false;
    try {
      await this.rootQuery('SELECT 1');
      return true;
    } catch {
      return false;
    }
  }

  private async ensureAppUser(): Promise<void> {
    const { appUser, appPassword } = this.options;
    await this.rootQuery(`CREATE USER IF NOT EXISTS ?@'127.0.0.1' IDENTIFIED BY ?`, [appUser, appPassword]);
    await this.rootQuery(`GRANT ALL PRIVILEGES ON *.* TO ?@'127.0.0.1'`, [appUser]);
  }
}
