/**
 * Monitor file import benchmark (issue 5): a 2-hour capnogram at 100 Hz (720,000 rows,
 * three shock markers) uploaded through `POST /api/resuscitations/:id/imports`.
 * Run: `NODE_OPTIONS=--conditions=upstroke-source npx tsx bench/import.bench.ts`.
 * Against a running app with BENCH_BASE_URL (+ BENCH_SERVER_PID to sample its memory), or
 * in-process against BENCH_DATABASE_URL (a migrated, seeded database); skips otherwise.
 * Merges into bench/results.json under `import`. Targets: ≤ 10 s; memory bounded.
 */
import { randomUUID } from 'node:crypto';
import {
  createWriteStream,
  existsSync,
  openAsBlob,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { once } from 'node:events';
import { synthCapnogram } from '@upstroke/capno';

const RESULTS = resolve(__dirname, 'results.json');
const HOURS = 2;
const RATE_HZ = 100;
const SHOCKS_SEC = [600, 1500, 4200];
const CLOCK_AHEAD_SEC = 97;
const ARREST_AT = '2026-03-04T10:00:00.000Z';

/** Writes the file in pieces: the generator itself must not need the whole text. */
async function writeFile(path: string): Promise<number> {
  const cap = synthCapnogram({
    seed: 11,
    durationSec: HOURS * 3600,
    sampleRateHz: RATE_HZ,
    levels: [
      [0, 18],
      [7200, 30],
    ],
    noiseMmHg: 0.3,
    compressions: [[0, 7200]],
    artefactMmHg: 2,
  });
  const out = createWriteStream(path);
  const t0 = Date.parse(ARREST_AT) + CLOCK_AHEAD_SEC * 1000;
  const shockRows = new Set(SHOCKS_SEC.map((s) => s * RATE_HZ + 37));
  out.write('# unit=mmHg\ntime,co2,event\n');
  let buf = '';
  for (let i = 0; i < cap.values.length; i++) {
    buf += `${new Date(t0 + i * 10).toISOString()},${cap.values[i].toFixed(2)},${shockRows.has(i) ? 'shock' : ''}\n`;
    if (buf.length > 1 << 20) {
      if (!out.write(buf)) await once(out, 'drain');
      buf = '';
    }
  }
  out.end(buf);
  await once(out, 'finish');
  return cap.values.length;
}

/** Peak RSS (MB) of a process while `work` runs, sampled every 25 ms. */
async function peakRss<T>(pid: number | null, work: () => Promise<T>): Promise<[T, number | null]> {
  const rss = () => {
    if (pid === null) return process.memoryUsage().rss;
    const m = /VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return m ? Number(m[1]) * 1024 : 0;
  };
  let peak = rss();
  const timer = setInterval(() => (peak = Math.max(peak, rss())), 25);
  try {
    const result = await work();
    return [result, Math.round(peak / 1048576)];
  } finally {
    clearInterval(timer);
  }
}

interface BuiltApp {
  listen(port: number, host: string): Promise<unknown>;
  getHttpServer(): { address(): unknown };
  close(): Promise<void>;
}

/** The built API (`npx tsc -b`): tsx cannot emit the decorator metadata Nest needs. */
async function startInProcess(
  databaseUrl: string,
): Promise<{ base: string; close: () => Promise<void> }> {
  const dist = resolve(__dirname, '../api/dist/src');
  if (!existsSync(join(dist, 'app.factory.js')))
    throw new Error('build the API first (npx tsc -b)');
  process.env.LOG_LEVEL = 'silent';
  const factory = (await import(join(dist, 'app.factory.js'))) as {
    createApp(config: unknown): Promise<BuiltApp>;
  };
  const config = (await import(join(dist, 'config.js'))) as { loadConfig(): object };
  const app = await factory.createApp({
    ...config.loadConfig(),
    databaseUrl,
    loginLimitPerMinute: 1000,
  });
  await app.listen(0, '127.0.0.1');
  const { port } = app.getHttpServer().address() as { port: number };
  return { base: `http://127.0.0.1:${port}`, close: () => app.close() };
}

async function main() {
  let base = process.env.BENCH_BASE_URL;
  const dbUrl = process.env.BENCH_DATABASE_URL;
  let close: () => Promise<void> = () => Promise.resolve();
  let pid: number | null = process.env.BENCH_SERVER_PID
    ? Number(process.env.BENCH_SERVER_PID)
    : null;
  if (!base && !dbUrl) {
    console.log(
      'import bench skipped: set BENCH_BASE_URL (running app) or BENCH_DATABASE_URL (migrated, seeded database)',
    );
    return;
  }
  const file = join(tmpdir(), `upstroke-import-bench-${process.pid}.csv`);
  const rows = await writeFile(file);
  if (!base) {
    const started = await startInProcess(dbUrl as string);
    base = started.base;
    close = started.close;
    pid = null; // this process
  }
  try {
    const login = await fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'lead@kestrel.test', password: 'upstroke-demo' }),
    });
    const { accessToken, user } = (await login.json()) as {
      accessToken: string;
      user: { siteIds: string[] };
    };
    const auth = { authorization: `Bearer ${accessToken}` };
    const id = randomUUID();
    await fetch(`${base}/api/resuscitations`, {
      method: 'POST',
      headers: { ...auth, 'content-type': 'application/json' },
      body: JSON.stringify({ id, siteId: user.siteIds[0], arrestAt: ARREST_AT }),
    });
    const events = SHOCKS_SEC.map((s) => ({
      id: randomUUID(),
      at: new Date(Date.parse(ARREST_AT) + s * 1000).toISOString(),
      kind: 'shock',
      data: { energyJ: 200 },
    }));
    await fetch(`${base}/api/resuscitations/${id}/events/batch`, {
      method: 'POST',
      headers: { ...auth, 'content-type': 'application/json' },
      body: JSON.stringify({ events }),
    });
    const form = new FormData();
    form.set('file', await openAsBlob(file), 'two-hours.csv');
    const rssBefore = Math.round(process.memoryUsage().rss / 1048576);
    const s = performance.now();
    const [res, peak] = await peakRss(pid, () =>
      fetch(`${base}/api/resuscitations/${id}/imports`, {
        method: 'POST',
        headers: auth,
        body: form,
      }),
    );
    const body = (await res.json()) as Record<string, unknown>;
    const ms = performance.now() - s;
    const result = {
      measuredAt: new Date().toISOString(),
      node: process.version,
      mode: pid === null && !process.env.BENCH_BASE_URL ? 'in-process' : 'running app',
      file: { rows, sampleRateHz: RATE_HZ, hours: HOURS, bytes: statSync(file).size },
      status: res.status,
      importMs: Math.round(ms),
      rowsPerSec: Math.round(rows / (ms / 1000)),
      offsetSec: body.offsetSec,
      expectedOffsetSec: CLOCK_AHEAD_SEC,
      residualSec: body.residualSec,
      breaths: body.breaths,
      peakRssMB: peak,
      rssBeforeMB: pid === null ? rssBefore : null,
      targets: { importMs: 10_000 },
      pass: res.status === 201 && ms <= 10_000,
    };
    const all = existsSync(RESULTS)
      ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
      : {};
    all.import = result;
    writeFileSync(RESULTS, JSON.stringify(all, null, 2) + '\n');
    console.log(JSON.stringify(result, null, 2));
  } finally {
    rmSync(file, { force: true });
    await close();
  }
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
