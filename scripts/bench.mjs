// `npm run bench`: starts the built app on its own database, then runs every
// bench/*.bench.ts; each merges its figures into bench/results.json under its own key.
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildAll, migrateAndSeed } from './lib/build.mjs';
import { ensureDependencies } from './lib/deps.mjs';
import { freePort } from './lib/ports.mjs';
import { ensureDatabase, startCluster } from './lib/postgres.mjs';
import { log, runAsync } from './lib/run.mjs';
import { waitForHttp } from './lib/wait.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const work = path.join(root, '.local', 'bench');
// Preferred ports; one that is taken (a test run, `npm start`) is swapped for a free one.
const pgPort = await freePort(Number(process.env.BENCH_PG_PORT ?? 54349));
const appPort = await freePort(Number(process.env.BENCH_PORT ?? 8092), new Set([pgPort]));
const only = process.argv.slice(2);
const cleanups = [];

function cleanup() {
  while (cleanups.length) {
    try {
      cleanups.pop()();
    } catch {
      // Keep cleaning.
    }
  }
}

async function main() {
  ensureDependencies(root);
  const cluster = startCluster({
    dataDir: path.join(work, 'pg'),
    runDir: path.join(work, 'run'),
    port: pgPort,
    fast: true,
  });
  cleanups.push(cluster.stop);
  const databaseUrl = ensureDatabase({ bin: cluster.bin, port: pgPort, name: 'upstroke_bench' });
  migrateAndSeed(root, databaseUrl);
  buildAll(root);
  log('── JavaScript per first screen (scripts/bundle-budget.mjs)');
  const budgetOk =
    (await runAsync('node', ['scripts/bundle-budget.mjs', '--record'], { cwd: root })) === 0;
  const server = spawn('node', ['api/dist/src/main.js'], {
    cwd: root,
    stdio: ['ignore', 'ignore', 'inherit'],
    env: {
      ...process.env,
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      PORT: String(appPort),
      DATABASE_URL: databaseUrl,
      WEB_DIST: path.join(root, 'web', 'dist'),
      JWT_SECRET: 'bench-secret',
      LOGIN_LIMIT_PER_MINUTE: '1000',
    },
  });
  cleanups.push(() => server.kill('SIGTERM'));
  if (!(await waitForHttp(`http://127.0.0.1:${appPort}/api/health`, 30_000, server)))
    throw new Error('the app did not start');
  const files = fs
    .readdirSync(path.join(root, 'bench'))
    .filter(
      (f) => f.endsWith('.bench.ts') && (only.length === 0 || only.some((o) => f.startsWith(o))),
    )
    .sort();
  let failed = 0;
  for (const file of files) {
    log(`── bench/${file}`);
    const code = await runAsync('npx', ['tsx', path.join('bench', file)], {
      cwd: root,
      env: {
        ...process.env,
        NODE_OPTIONS: '--conditions=upstroke-source',
        BENCH_BASE_URL: `http://localhost:${appPort}`,
        BENCH_DATABASE_URL: databaseUrl,
      },
    });
    if (code !== 0) failed += 1;
  }
  log(
    `benchmarks done (${files.length - failed} ok, ${failed} failed); results in bench/results.json`,
  );
  return failed === 0 && budgetOk;
}

process.on('SIGINT', () => {
  cleanup();
  process.exit(130);
});
let ok = false;
try {
  ok = await main();
} catch (error) {
  process.stderr.write(
    `npm run bench failed: ${error instanceof Error ? error.message : String(error)}\n`,
  );
} finally {
  cleanup();
}
process.exit(ok ? 0 : 1);
