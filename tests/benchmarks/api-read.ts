/**
 * npm run bench, API read section: requests a second for the signed-in
 * account (GET /api/me), the bow list (GET /api/bows) and one bow with
 * everything on it (GET /api/bows/:id), in one run, 20 connections over
 * loopback (autocannon), and the bow reads' ratio to /api/me. Goal: both
 * ratios at least 0.5 (issue 11).
 *
 * Self-contained: it creates a scratch database on the project-local MariaDB,
 * starts the server in a child process (so the load generator does not share
 * its event loop), migrates, seeds the demo scenario, signs in as the demo
 * archer, measures, then stops the server and drops the database. Each
 * endpoint gets a 1 s warm-up, then three interleaved rounds of
 * BENCH_API_SECONDS (default 3) each; about a minute in all.
 *
 * Run alone: npx tsx tests/benchmarks/api-read.ts
 */
import path from 'node:path';
import { spawn, type ChildProcess } from 'node:child_process';
import autocannon from 'autocannon';

const root = path.resolve(__dirname, '../..');
const CONNECTIONS = 20;

type Rate = { name: string; path: string; perSecond: number; p99Ms: number; ratio: number };

/** Rounds of (me, list, bow); each endpoint BENCH_API_SECONDS (default 3) a round. */
const ROUNDS = 3;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

/** Child mode: migrate and seed the database named in DB_NAME, listen on a free port, print it. */
async function serve() {
  const { sequelize } = await import('@/server/db');
  await (await import('@/server/migrations')).migrate(sequelize);
  await (await import('@/server/seed/demo')).seedDemo();
  const { createApp } = await import('@/server/app');
  const server = createApp({ sessionExpiryTimer: false, webDir: path.join(root, '.no-web-export') }).listen(0, '127.0.0.1', () => {
    const address = server.address();
    console.log(`listening ${typeof address === 'object' && address ? address.port : 0}`);
  });
  process.on('SIGTERM', () => {
    server.closeAllConnections();
    server.close();
    process.exit(0); // in-flight requests end with the process; nothing here needs a clean database close
  });
}

function startServer(env: NodeJS.ProcessEnv): Promise<{ child: ChildProcess; port: number }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [path.join(root, 'node_modules/tsx/dist/cli.mjs'), __filename, '--serve'], {
      cwd: root,
      env,
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let out = '';
    const timer = setTimeout(() => reject(new Error('the bench server did not start within 120 s')), 120_000);
    child.stdout!.on('data', (chunk: Buffer) => {
      out += chunk.toString();
      const match = /listening (\d+)/.exec(out);
      if (match) {
        clearTimeout(timer);
        resolve({ child, port: Number(match[1]) });
      }
    });
    child.on('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`the bench server exited (${code}) before listening`));
    });
  });
}

async function signIn(base: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Pinwright-Csrf': '1' },
    body: JSON.stringify({ email: 'marit@demo.pinwright.test', password: 'pinwright-archer' }),
  });
  if (res.status !== 200) throw new Error(`sign-in for the bench failed: ${res.status} ${await res.text()}`);
  const cookie = res.headers.get('set-cookie');
  if (!cookie) throw new Error('sign-in for the bench set no cookie');
  return cookie.split(';')[0];
}

/** The measured rates, in the order /api/me, /api/bows, /api/bows/:id. */
export async function measureApiReads({ seconds = Number(process.env.BENCH_API_SECONDS || 3) } = {}): Promise<Rate[]> {
  const dbName = `pinwright_bench_${Date.now().toString(36)}_${process.pid}`;
  const { startLocalDatabase, createDatabase, dropDatabase } = await import('@/server/tools/database');
  const db = await startLocalDatabase(() => {});
  let child: ChildProcess | undefined;
  try {
    await createDatabase(db, dbName);
    const started = await startServer({ ...process.env, DB_NAME: dbName, NODE_ENV: 'development', FAKE_SMTP: '0' });
    child = started.child;
    const base = `http://127.0.0.1:${started.port}`;
    const cookie = await signIn(base);
    const headers = { cookie };
    const bows = (await (await fetch(`${base}/api/bows`, { headers })).json()) as {
      bows: { id: number; readiness: { sightInCount: number } }[];
    };
    if (!bows.bows?.length) throw new Error('the demo archer has no bows to read');
    const busiest = [...bows.bows].sort((a, b) => b.readiness.sightInCount - a.readiness.sightInCount)[0];
    const targets = [
      { name: 'GET /api/me', path: '/api/me' },
      { name: `GET /api/bows (${bows.bows.length} bows)`, path: '/api/bows' },
      { name: `GET /api/bows/:id (${busiest.readiness.sightInCount} sight-ins)`, path: `/api/bows/${busiest.id}` },
    ];
    // Rounds interleave the three endpoints, so a neighbour's burst of CPU on a shared
    // machine lands on all three alike; the ratios are taken per round, then the median.
    const samples = targets.map(() => ({ perSecond: [] as number[], p99Ms: [] as number[] }));
    for (const target of targets) await autocannon({ url: `${base}${target.path}`, connections: CONNECTIONS, duration: 1, headers }); // warm-up
    for (let round = 0; round < ROUNDS; round += 1) {
      for (const [index, target] of targets.entries()) {
        const result = await autocannon({ url: `${base}${target.path}`, connections: CONNECTIONS, duration: seconds, headers });
        if (result.non2xx || result.errors)
          throw new Error(`${target.name}: ${result.non2xx} non-2xx answers, ${result.errors} errors under load`);
        samples[index].perSecond.push(result.requests.average);
        samples[index].p99Ms.push(result.latency.p99);
      }
    }
    const rates: Rate[] = targets.map((target, index) => ({
      ...target,
      perSecond: median(samples[index].perSecond),
      p99Ms: median(samples[index].p99Ms),
      ratio: index === 0 ? 1 : median(samples[index].perSecond.map((rate, round) => rate / samples[0].perSecond[round])),
    }));
    return rates;
  } finally {
    if (child && child.exitCode === null) {
      const exited = new Promise((resolve) => child!.once('exit', resolve));
      child.kill('SIGTERM');
      await Promise.race([exited, new Promise((resolve) => setTimeout(resolve, 5000))]);
    }
    await dropDatabase(db, dbName).catch(() => {});
    await db.stop();
  }
}

/** Prints the section: three rates with p99 latency, the two ratios and whether the goal is met. */
export async function apiReadSection(): Promise<void> {
  const rates = await measureApiReads();
  const width = Math.max(...rates.map((rate) => rate.name.length));
  console.log(`\nAPI reads, req/s (${CONNECTIONS} connections, loopback, autocannon; median of ${ROUNDS} interleaved rounds)`);
  for (const rate of rates)
    console.log(
      `  ${rate.name.padEnd(width)}  ${rate.perSecond.toFixed(0).padStart(7)} req/s   p99 ${rate.p99Ms.toFixed(0).padStart(4)} ms`,
    );
  const [, list, one] = rates;
  const ratios = [list.ratio, one.ratio];
  console.log(`  ratio to /api/me: list ${ratios[0].toFixed(2)}, bow ${ratios[1].toFixed(2)}`);
  console.log(`goal: both bow reads at least 0.5 × /api/me — ${ratios.every((ratio) => ratio >= 0.5) ? 'met' : 'NOT met'}`);
}

if (require.main === module) {
  if (process.argv.includes('--serve')) {
    serve().catch((error) => {
      console.error(error);
      process.exit(1);
    });
  } else {
    apiReadSection().catch((error) => {
      console.error(error);
      process.exitCode = 1;
    });
  }
}
