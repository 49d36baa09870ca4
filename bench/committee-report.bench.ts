/**
 * Monthly committee report benchmark (issue 17): the PDF of the seeded demo data for the
 * latest month with records, downloaded from the running built app as a quality user
 * (figures gathered in SQL, six control charts, Utstein table, review queue, rendered in
 * the worker pool). One warm-up (worker thread start, fonts), then 5 timed downloads, one
 * after another. Target: median ≤ 2 s per report (the slowest is reported beside it). Needs BENCH_BASE_URL (set by `npm run bench`);
 * skips without it. Merges its figures into bench/results.json under `committeeReport`.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { resolve } from 'node:path';

const RESULTS = resolve(__dirname, 'results.json');
const baseUrl = process.env.BENCH_BASE_URL;
const RUNS = 5;
const TARGET_MS = 2000;

async function signIn(): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'quality@kestrel.test', password: 'upstroke-demo' }),
  });
  return ((await res.json()) as { accessToken: string }).accessToken;
}

async function get(path: string, token: string): Promise<Buffer> {
  const res = await fetch(`${baseUrl}/api${path}`, {
    headers: { Authorization: `Bearer ${token}` },
  });
  const buf = Buffer.from(await res.arrayBuffer());
  if (res.status !== 200) throw new Error(`GET ${path}: HTTP ${res.status} ${buf}`);
  return buf;
}

async function main() {
  if (!baseUrl) {
    console.log('BENCH_BASE_URL not set: skipped (run through `npm run bench`)');
    return;
  }
  const token = await signIn();
  const trends = JSON.parse((await get('/trends', token)).toString()) as {
    months: string[];
    total: number;
  };
  const month = trends.months.at(-1);
  if (!month) throw new Error('no seeded records to report on');
  const path = `/trends/monthly-report.pdf?month=${month}`;
  await get(path, token);
  const times: number[] = [];
  let size = 0;
  for (let i = 0; i < RUNS; i++) {
    const s = performance.now();
    size = (await get(path, token)).length;
    times.push(performance.now() - s);
  }
  times.sort((a, b) => a - b);
  const result = {
    measuredAt: new Date().toISOString(),
    node: process.version,
    // The machine's load during the run: timings stretch on a shared, busy host.
    loadAverage: loadavg().map((x) => Math.round(x * 10) / 10),
    data: { month, recordsInView: trends.total, chartMonths: 12 },
    runs: RUNS,
    medianMs: Math.round(times[Math.floor(RUNS / 2)]),
    maxMs: Math.round(times[RUNS - 1]),
    sizeBytes: size,
    targets: { renderMs: TARGET_MS },
    // The median against the target, as for the record PDF (pdf.bench.ts); the slowest beside.
    pass: times[Math.floor(RUNS / 2)] <= TARGET_MS,
  };
  const all = existsSync(RESULTS)
    ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
    : {};
  all.committeeReport = result;
  writeFileSync(RESULTS, `${JSON.stringify(all, null, 2)}\n`);
  console.log(JSON.stringify(result, null, 2));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
