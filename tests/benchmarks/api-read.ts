/**
 * npm run bench, API read section: requests a second for the signed-in
 * account (GET /api/me), the bow list (GET /api/bows) and one bow with
 * everything on it (GET /api/bows/:id), in one run, 20 connections over
 * loopback (autocannon), and the bow reads' ratio to /api/me. Goal: both
 * ratios at least 0.5 (issue 11). The bow reads are measured twice, side by
 * side: with the read cache (server/services/bow-read.ts) and with it off.
 *
 * Self-contained: it creates a scratch database on the project-local MariaDB,
 * starts two servers in child processes (so the load generator does not share
 * their event loop; the second with PINWRIGHT_BOW_READ_CACHE=off), migrates,
 * seeds the demo scenario, signs in as the demo archer, measures, then stops
 * the servers and drops the database. Each endpoint gets a 1 s warm-up, then
 * three interleaved rounds of BENCH_API_SECONDS (default 3) each; about a
 * minute and a half in all.
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

/** Child mode: migrate and seed the database named in DB_NAME (unless BENCH_SEEDED=1), listen on a free port, print it. */
async function serve() {
  if (process.env.BENCH_SEEDED !== '1') {
    const { sequelize } = await import('@/server/db');
    await (await import('@/server/migrations')).migrate(sequelize);
    await (await import('@/server/seed/demo')).seedDemo();
  }
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

/**
 * The measured rates: /api/me, then the list and the bow from the server as it
 * runs (the read cache on), then the same two from a second server with the
 * cache off (PINWRIGHT_BOW_READ_CACHE=off: every read afresh, the read path as
 * it was before the cache), all in the same interleaved rounds.
 */
export async function measureApiReads({ seconds = Number(process.env.BENCH_API_SECONDS || 3) } = {}): Promise<Rate[]> {
  const dbName = `pinwright_bench_${Date.now().toString(36)}_${process.pid}`;
  const { startLocalDatabase, createDatabase, dropDatabase } = await import('@/server/tools/database');
  const db = await startLocalDatabase(() => {});
  const children: ChildProcess[] = [];
  try {
    await createDatabase(db, dbName);
    const env = { ...process.env, DB_NAME: dbName, NODE_ENV: 'development' as const, FAKE_SMTP: '0', PINWRIGHT_CHECK_READ_CACHE: '0' };
    const cached = await startServer(env); // migrates and seeds first
    children.push(cached.child);
    const uncached = await startServer({ ...env, PINWRIGHT_BOW_READ_CACHE: 'off', BENCH_SEEDED: '1' });
    children.push(uncached.child);
    const bases = [`http://127.0.0.1:${cached.port}`, `http://127.0.0.1:${uncached.port}`];
    const cookies = [await signIn(bases[0]), await signIn(bases[1])];
    const bows = (await (await fetch(`${bases[0]}/api/bows`, { headers: { cookie: cookies[0] } })).json()) as {
      bows: { id: number; readiness: { sightInCount: number } }[];
    };
    if (!bows.bows?.length) throw new Error('the demo archer has no bows to read');
    const busiest = [...bows.bows].sort((a, b) => b.readiness.sightInCount - a.readiness.sightInCount)[0];
    const list = `GET /api/bows (${bows.bows.length} bows)`;
    const one = `GET /api/bows/:id (${busiest.readiness.sightInCount} sight-ins)`;
    const targets = [
      { name: 'GET /api/me', path: '/api/me', server: 0 },
      { name: list, path: '/api/bows', server: 0 },
      { name: one, path: `/api/bows/${busiest.id}`, server: 0 },
      { name: `${list}, cache off`, path: '/api/bows', server: 1 },
      { name: `${one}, cache off`, path: `/api/bows/${busiest.id}`, server: 1 },
    ];
    // Rounds interleave the endpoints, so a neighbour's burst of CPU on a shared
    // machine lands on all alike; the ratios are taken per round, then the median.
    // Only one server is under load at a time; the other idles.
    const samples = targets.map(() => ({ perSecond: [] as number[], p99Ms: [] as number[] }));
    const load = (target: (typeof targets)[number], duration: number) =>
      autocannon({
        url: `${bases[target.server]}${target.path}`,
        connections: CONNECTIONS,
        duration,
        headers: { cookie: cookies[target.server] },
      });
    for (const target of targets) await load(target, 1); // warm-up
    for (let round = 0; round < ROUNDS; round += 1) {
      for (const [index, target] of targets.entries()) {
        const result = await load(target, seconds);
        if (result.non2xx || result.errors)
          throw new Error(`${target.name}: ${result.non2xx} non-2xx answers, ${result.errors} errors under load`);
        samples[index].perSecond.push(result.requests.average);
        samples[index].p99Ms.push(result.latency.p99);
      }
    }
    return targets.map((target, index) => ({
      name: target.name,
      path: target.path,
      perSecond: median(samples[index].perSecond),
      p99Ms: median(samples[index].p99Ms),
      ratio: index === 0 ? 1 : median(samples[index].perSecond.map((rate, round) => rate / samples[0].perSecond[round])),
    }));
  } finally {
    for (const child of children)
      if (child.exitCode === null) {
        const exited = new Promise((resolve) => child.once('exit', resolve));
        child.kill('SIGTERM');
        await Promise.race([exited, new Promise((resolve) => setTimeout(resolve, 5000))]);
      }
    await dropDatabase(db, dbName).catch(() => {});
    await db.stop();
  }
}

/**
 * Prints the section: the rates with p99 latency and each bow read's ratio to
 * /api/me, with the read cache off (before) and on (after) side by side, and
 * whether the goal is met.
 */
export async function apiReadSection(): Promise<void> {
  const rates = await measureApiReads();
  const width = Math.max(...rates.map((rate) => rate.name.length));
  console.log(`\nAPI reads, req/s (${CONNECTIONS} connections, loopback, autocannon; median of ${ROUNDS} interleaved rounds)`);
  for (const rate of rates)
    console.log(
      `  ${rate.name.padEnd(width)}  ${rate.perSecond.toFixed(0).padStart(7)} req/s   p99 ${rate.p99Ms.toFixed(0).padStart(4)} ms` +
        (rate.ratio === 1 ? '' : `   ${rate.ratio.toFixed(2)} × /api/me`),
    );
  const [, list, one, listOff, oneOff] = rates;
  console.log(
    `  ratio to /api/me, cache off → on: list ${listOff.ratio.toFixed(2)} → ${list.ratio.toFixed(2)}, bow ${oneOff.ratio.toFixed(2)} → ${one.ratio.toFixed(2)}`,
  );
  console.log('  (as filed in issue 11, before any of this work: list 0.23, bow 0.16)');
  const ratios = [list.ratio, one.ratio];
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
