// `npm run bench`: starts the built app on its own database, then runs every
// bench/*.bench.ts; each merges its figures into bench/results.json under its own key.
// Benchmarks report, they do not fail: a missed target is listed at the end (`pass: false`
// in the results) and leaves the exit code 0. Only a benchmark that could not measure (it
// threw, so its figures are stale) or an app that did not start makes the run exit 1.
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildAll, migrateAndSeed } from './lib/build.mjs';
import { ensureDependencies } from './lib/deps.mjs';
import { freePort } from './lib/ports.mjs';
import { ensureDatabase, startCluster } from './lib/postgres.mjs';
import { log, runAsync } from './lib/run.mjs';
import { settle } from './lib/settle.mjs';
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
  // Over budget is reported like any missed target here; `npm test` is what enforces it.
  await runAsync('node', ['scripts/bundle-budget.mjs', '--record'], { cwd: root });
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
  const failed = [];
  for (const file of files) {
    // The build, the server's worker threads and PostgreSQL settle before each timing.
    const quiet = await settle();
    log(
      `── bench/${file} (CPUs ${Math.round((quiet.idleShare ?? 1) * 100)} % idle after ${quiet.waitedMs} ms)`,
    );
    const code = await runAsync('npx', ['tsx', path.join('bench', file)], {
      cwd: root,
      env: {
        ...process.env,
        NODE_OPTIONS: '--conditions=upstroke-source',
        BENCH_BASE_URL: `http://localhost:${appPort}`,
        BENCH_DATABASE_URL: databaseUrl,
        BENCH_IDLE_SHARE: String(quiet.idleShare ?? ''),
      },
    });
    if (code !== 0) failed.push(file);
  }
  // The results are committed: keep them in the repository's format (npm test checks it).
  await runAsync('npx', ['prettier', '--write', '--log-level', 'warn', 'bench/results.json'], {
    cwd: root,
  });
  const missed = missedTargets(
    JSON.parse(fs.readFileSync(path.join(root, 'bench', 'results.json'), 'utf8')),
  );
  log(`targets missed (reported, not failed): ${missed.length ? missed.join(', ') : 'none'}`);
  if (failed.length) log(`could not measure (exit 1): ${failed.join(', ')}`);
  log(`benchmarks done; results in bench/results.json`);
  return failed.length === 0;
}

/** The paths in the results whose figures say `pass: false` (e.g. `pdfHealth`). */
function missedTargets(value, at = '') {
  if (!value || typeof value !== 'object') return [];
  if (value.pass === false) return [at || '(root)'];
  return Object.entries(value).flatMap(([k, v]) => missedTargets(v, at ? `${at}.${k}` : k));
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
