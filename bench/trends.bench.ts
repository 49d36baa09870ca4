/**
 * Benchmark of the quality trends API over 10,000 signed records (five years, three sites).
 * Run: `NODE_OPTIONS=--conditions=upstroke-source npx tsx bench/trends.bench.ts` with
 * BENCH_DATABASE_URL (loaded with `seed:large` here when it holds fewer records) and
 * optionally BENCH_BASE_URL (else the built API is started on BENCH_DATABASE_URL).
 * Merges its figures into bench/results.json under `trends`; EXPLAIN plans go to
 * bench/trends-explain.txt.
 */
import { spawn } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { createKnex, type Db } from '../api/src/db/knex';
import {
  monthlySeriesQuery,
  type ScopedFilter,
  utsteinQuery,
} from '../api/src/modules/trends/trends.queries';
import { seedLarge } from '../db/scripts/seed-large';

const ROOT = resolve(__dirname, '..');
const RESULTS = resolve(__dirname, 'results.json');
const RECORDS = Number(process.env.BENCH_RECORDS ?? 10_000);
const RUNS = Number(process.env.BENCH_RUNS ?? 60);
// 10,000 records (the default) are recorded under `trends`, any other count beside them
// (`trends100k` for 100,000), so the two figures stand side by side.
const KEY = RECORDS === 10_000 ? 'trends' : `trends${Math.round(RECORDS / 1000)}k`;
const EXPLAIN = KEY === 'trends' ? 'trends-explain.txt' : `${KEY}-explain.txt`;

const percentile = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
};

async function timed(url: string, token: string, runs: number) {
  const ms: number[] = [];
  for (let i = 0; i < runs + 5; i++) {
    const t0 = performance.now();
    const res = await fetch(url, { headers: { Authorization: `Bearer ${token}` } });
    if (!res.ok) throw new Error(`${url}: HTTP ${res.status}`);
    await res.arrayBuffer();
    if (i >= 5) ms.push(performance.now() - t0); // five warm-up calls first
  }
  return { runs, p50Ms: percentile(ms, 50), p95Ms: percentile(ms, 95), maxMs: Math.max(...ms) };
}

async function startApi(databaseUrl: string): Promise<{ url: string; stop: () => void }> {
  const port = Number(process.env.BENCH_PORT ?? 8198);
  const child = spawn('node', ['api/dist/src/main.js'], {
    cwd: ROOT,
    stdio: ['ignore', 'ignore', 'inherit'],
    env: {
      ...process.env,
      // The built API loads the built packages, not their sources.
      NODE_OPTIONS: '',
      PORT: String(port),
      DATABASE_URL: databaseUrl,
      JWT_SECRET: 'bench',
      LOG_LEVEL: 'warn',
      LOGIN_LIMIT_PER_MINUTE: '1000',
    },
  });
  const url = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 100; i++) {
    if (
      await fetch(`${url}/api/health`).then(
        (r) => r.ok,
        () => false,
      )
    )
      return { url, stop: () => child.kill('SIGTERM') };
    await new Promise((r) => setTimeout(r, 200));
  }
  child.kill('SIGTERM');
  throw new Error('the built API (api/dist) did not start: run `npm run build` first');
}

async function explain(db: Db, filters: [string, ScopedFilter][]): Promise<string> {
  let out = '';
  for (const [name, f] of filters) {
    for (const [what, q] of [
      ['monthly series', monthlySeriesQuery(db, f)],
      ['Utstein', utsteinQuery(db, f)],
    ] as const) {
      const { rows } = await db.raw<{ rows: { 'QUERY PLAN': string }[] }>(
        `explain (analyze, buffers) ${q.toString()}`,
      );
      out += `-- ${what}, ${name}\n${rows.map((r) => r['QUERY PLAN']).join('\n')}\n\n`;
    }
  }
  return out;
}

async function main(): Promise<void> {
  const databaseUrl = process.env.BENCH_DATABASE_URL;
  if (!databaseUrl) {
    console.log('trends bench skipped: set BENCH_DATABASE_URL (a migrated database it may fill).');
    return;
  }
  const db = createKnex(databaseUrl);
  const signed = async () =>
    Number((await db('recordSummaries').count<{ n: number }[]>({ n: '*' }))[0].n);
  if ((await signed()) < RECORDS) {
    const t0 = Date.now();
    // seed:large writes through plain knex (snake_case), as the command does.
    const raw = (await import('knex')).default({ client: 'pg', connection: databaseUrl });
    await seedLarge(raw, RECORDS, () => undefined);
    await raw.destroy();
    console.log(`seed:large ${RECORDS} records: ${((Date.now() - t0) / 1000).toFixed(1)} s`);
  }
  const api = process.env.BENCH_BASE_URL
    ? { url: process.env.BENCH_BASE_URL, stop: () => undefined }
    : await startApi(databaseUrl);
  try {
    const login = await fetch(`${api.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'quality@kestrel.test', password: 'upstroke-demo' }),
    });
    const { accessToken, user } = (await login.json()) as {
      accessToken: string;
      user: { siteIds: string[] };
    };
    const today = new Date();
    const from = new Date(Date.UTC(today.getUTCFullYear() - 5, today.getUTCMonth(), 1))
      .toISOString()
      .slice(0, 10);
    const to = new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth() + 1, 1))
      .toISOString()
      .slice(0, 10);
    const q = `from=${from}&to=${to}`;
    const series = await timed(`${api.url}/api/trends?${q}`, accessToken, RUNS);
    const utstein = await timed(`${api.url}/api/trends/utstein?${q}`, accessToken, RUNS);
    const records = await timed(
      `${api.url}/api/trends/records?${q}&sort=compressionFraction`,
      accessToken,
      RUNS,
    );
    // Control limits are computed per request over the monthly counts (SQL), then in capno.
    const controlChart = await timed(
      `${api.url}/api/trends/control-chart?${q}&measure=compressionFractionMet`,
      accessToken,
      RUNS,
    );
    const funnel = await timed(
      `${api.url}/api/trends/funnel?${q}&measure=anyRosc`,
      accessToken,
      RUNS,
    );
    const t0 = performance.now();
    const csv = await (
      await fetch(`${api.url}/api/trends/export.csv`, {
        headers: { Authorization: `Bearer ${accessToken}` },
      })
    ).text();
    const exportMs = performance.now() - t0;
    const unit = await db('units').where('siteId', user.siteIds[0]).first<{ id: string }>('id');
    const plans = await explain(db, [
      ['3 sites x 5 years', { siteIds: user.siteIds, from, to }],
      [
        'one unit, one quarter',
        {
          siteIds: user.siteIds,
          unitId: unit.id,
          from: `${today.getUTCFullYear() - 1}-01-01`,
          to: `${today.getUTCFullYear() - 1}-04-01`,
        },
      ],
    ]);
    writeFileSync(resolve(__dirname, EXPLAIN), plans);
    const result = {
      measuredAt: new Date().toISOString(),
      node: process.version,
      records: await signed(),
      sites: user.siteIds.length,
      period: { from, to },
      trendsSeries: { ...series, targetP95Ms: 200 },
      utstein: { ...utstein, targetP95Ms: 300 },
      controlChart: { ...controlChart, targetP95Ms: 200 },
      funnel: { ...funnel, targetP95Ms: 200 },
      recordsPage: records,
      csvExport: {
        rows: csv.trim().split('\r\n').length - 1,
        bytes: csv.length,
        ms: exportMs,
        targetMs: 3000,
      },
      explainFile: `bench/${EXPLAIN}`,
      indexUsedForUnitQuarter: /Index|Bitmap/.test(
        plans.split('-- monthly series, one unit')[1] ?? '',
      ),
    };
    const all = existsSync(RESULTS)
      ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
      : {};
    writeFileSync(RESULTS, `${JSON.stringify({ ...all, [KEY]: result }, null, 2)}\n`);
    console.log(JSON.stringify(result, null, 2));
  } finally {
    api.stop();
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
