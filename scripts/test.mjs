// `npm test`: set-up on a throwaway database, then lint, type-check, unit and integration
// suites and the browser end-to-end tests. Exits non-zero on any failure.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { migrateAndSeed } from './lib/build.mjs';
import { ensureDependencies } from './lib/deps.mjs';
import { ensureDatabase, ensureRoles } from './lib/postgres.mjs';
import { aptInstall, capture, log, runAsync } from './lib/run.mjs';
import { countsOf } from './lib/test-counts.mjs';
import { startTestApp, startTestCluster } from './lib/test-services.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const work = path.join(root, '.local', `test-${process.pid}`);
// Preferred ports; any that is taken (another run, `npm start`) is swapped for a free one.
const preferredPorts = {
  pg: Number(process.env.TEST_PG_PORT ?? 54339),
  app: Number(process.env.TEST_PORT ?? 8091),
  smtp: Number(process.env.TEST_SMTP_PORT ?? 2526),
};
const cleanups = [];
const results = [];
// For a developer's quicker loop: `npm test -- --only=build,e2e --e2e=trends` runs only the
// named steps (lint, format, build, unit, api, e2e) and only the e2e files whose name holds
// one of the given texts (comma-separated). With no options, everything runs (as CI does).
const options = Object.fromEntries(
  process.argv
    .slice(2)
    .map((arg) => /^--(only|e2e)=(.*)$/.exec(arg))
    .filter(Boolean)
    .map((m) => [m[1], m[2]]),
);
const onlySteps = options.only ? new Set(options.only.split(',')) : null;
const wants = (name) =>
  !onlySteps || onlySteps.has(name) || (name === 'build' && onlySteps.has('e2e'));

function cleanup() {
  while (cleanups.length) {
    try {
      cleanups.pop()();
    } catch {
      // Keep cleaning.
    }
  }
}

function ensureSystemPackages() {
  const missing = [];
  if (!fs.existsSync('/usr/bin/chromium')) missing.push('chromium');
  if (capture('pdffonts', ['-v']).status !== 0 && !fs.existsSync('/usr/bin/pdffonts'))
    missing.push('poppler-utils');
  if (capture('/usr/bin/python3', ['-c', 'import scipy.signal']).status !== 0)
    missing.push('python3-scipy');
  if (missing.length) aptInstall(missing);
}

async function step(name, cmd, args, options = {}) {
  log(`── ${name}`);
  const started = Date.now();
  const code = await runAsync(cmd, args, { cwd: root, ...options });
  const counts = options.countsFile ? countsOf(options.countsFile) : null;
  results.push({ name, ok: code === 0, counts, seconds: (Date.now() - started) / 1000 });
  return code === 0;
}

async function main() {
  ensureDependencies(root);
  ensureSystemPackages();
  fs.mkdirSync(work, { recursive: true });
  cleanups.push(() => fs.rmSync(work, { recursive: true, force: true }));
  const cluster = await startTestCluster(root, work, preferredPorts.pg);
  cleanups.push(cluster.stop);
  const pgPort = cluster.port;
  const databaseUrl = ensureDatabase({
    bin: cluster.bin,
    port: pgPort,
    name: 'upstroke_test',
    drop: true,
  });
  const apiDbUrl = ensureDatabase({
    bin: cluster.bin,
    port: pgPort,
    name: 'upstroke_api_test',
    drop: true,
  });
  // As under `npm start`: migrated by the owner role, served to the browser tests by the
  // API's least-privilege role.
  const roles = ensureRoles({ bin: cluster.bin, port: pgPort, name: 'upstroke_test' });
  migrateAndSeed(root, roles.ownerUrl);
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    NODE_OPTIONS: '--conditions=upstroke-source',
  };
  const out = (name) => path.join(work, name);

  if (wants('lint'))
    await step('lint (ESLint, zero warnings)', 'npx', ['eslint', '.', '--max-warnings', '0']);
  if (wants('format'))
    await step('format (Prettier)', 'npx', ['prettier', '--check', '--log-level', 'warn', '.']);
  const built =
    wants('build') &&
    (await step('type-check and build (tsc -b, vite build)', 'node', [
      'scripts/lib/build-cli.mjs',
    ]));
  if (built)
    await step('JavaScript budget per first screen (web/dist, gzip)', 'node', [
      'scripts/bundle-budget.mjs',
    ]);
  if (wants('unit'))
    await step(
      'unit tests (vitest: packages, web)',
      'npx',
      [
        'vitest',
        'run',
        '--reporter=default',
        '--reporter=json',
        `--outputFile.json=${out('vitest.json')}`,
      ],
      { env, countsFile: out('vitest.json') },
    );
  if (wants('api'))
    await step(
      'API tests (jest + supertest, real PostgreSQL)',
      'npx',
      ['jest', '--runInBand', '--json', `--outputFile=${out('jest.json')}`],
      {
        cwd: path.join(root, 'api'),
        env: { ...env, TEST_DATABASE_URL: apiDbUrl },
        countsFile: out('jest.json'),
      },
    );
  if (built && wants('e2e')) {
    const preferred = { app: preferredPorts.app, smtp: preferredPorts.smtp };
    const server = await startTestApp(root, work, preferred, ({ app, smtp }) => ({
      ...process.env,
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      PORT: String(app),
      DATABASE_URL: roles.appUrl,
      WEB_DIST: path.join(root, 'web', 'dist'),
      SMTP_SINK_PORT: String(smtp),
      SMTP_PORT: String(smtp),
      PUBLIC_URL: `http://localhost:${app}`,
      JWT_SECRET: 'e2e-secret',
      LOGIN_LIMIT_PER_MINUTE: '200',
      LOGIN_IP_LIMIT_PER_MINUTE: '1000',
    }));
    cleanups.push(server.stop);
    const { port: appPort, smtpPort } = server;
    if (server.up) log(`the app for browser tests on :${appPort}, mail sink on :${smtpPort}`);
    if (!server.up)
      results.push({
        name: 'start the app for end-to-end tests',
        ok: false,
        counts: null,
        seconds: 0,
      });
    else {
      const passed = await step(
        'end-to-end tests (playwright-core + Debian Chromium)',
        'node',
        [
          '--conditions=upstroke-source',
          '--import',
          'tsx',
          '--test',
          '--test-concurrency=1',
          // A journey that hangs fails after 5 minutes instead of holding the run.
          '--test-timeout=300000',
          '--test-reporter=spec',
          '--test-reporter-destination=stdout',
          '--test-reporter=tap',
          `--test-reporter-destination=${out('e2e.tap')}`,
          ...e2eFiles(),
        ],
        {
          env: {
            ...env,
            E2E_BASE_URL: `http://localhost:${appPort}`,
            E2E_DATABASE_URL: databaseUrl,
            E2E_SMTP_PORT: String(smtpPort),
          },
          countsFile: out('e2e.tap'),
        },
      );
      if (!passed) server.keep('the app under the browser tests');
    }
  } else if (wants('e2e')) {
    results.push({
      name: 'end-to-end tests (not run: the build failed)',
      ok: false,
      counts: null,
      seconds: 0,
    });
  }
}

function e2eFiles() {
  const dir = path.join(root, 'e2e', 'tests');
  return fs
    .readdirSync(dir)
    .filter(
      (f) =>
        f.endsWith('.spec.ts') &&
        (!options.e2e || options.e2e.split(',').some((part) => f.includes(part))),
    )
    .sort()
    .map((f) => path.join('e2e', 'tests', f));
}

function summarise() {
  let passed = 0;
  let failed = 0;
  process.stdout.write('\nUpstroke test summary\n');
  for (const r of results) {
    const c = r.counts;
    const detail = c ? `${c.passed} passed, ${c.failed} failed` : r.ok ? 'ok' : 'FAILED';
    process.stdout.write(
      `  ${r.ok ? 'ok  ' : 'FAIL'} ${r.name}: ${detail} (${r.seconds.toFixed(1)} s)\n`,
    );
    if (c) {
      passed += c.passed;
      failed += c.failed;
    }
    // A failing step without test counts (lint, type-check, a crashed runner) counts as one failure.
    if (!r.ok && (!c || c.failed === 0)) failed += 1;
  }
  process.stdout.write(`\n${passed} passed, ${failed} failed\n`);
  return failed === 0 && results.every((r) => r.ok);
}

process.on('SIGINT', () => {
  cleanup();
  process.exit(130);
});
let ok = false;
try {
  await main();
  ok = summarise();
} catch (error) {
  process.stderr.write(
    `npm test set-up failed: ${error instanceof Error ? error.message : String(error)}\n`,
  );
  summarise();
} finally {
  cleanup();
}
process.exit(ok ? 0 : 1);
