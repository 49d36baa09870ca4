/**
 * Figures for docs/scaling.md, measured on the running app (`npm run bench`, which sets
 * BENCH_BASE_URL and BENCH_DATABASE_URL): events stored per second by one API instance
 * (tablets posting batches side by side), and the bytes an hour of 100 Hz waveform takes in
 * PostgreSQL once synced (table, index and TOAST growth). Merges them into
 * bench/results.json under `scaling`, with the machine's load beside them.
 */
import { randomUUID } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { resolve } from 'node:path';
import { createKnex } from '../api/src/db/knex';

const RESULTS = resolve(__dirname, 'results.json');
const BASE = process.env.BENCH_BASE_URL ?? 'http://localhost:8092';
const TABLETS = 8;
const BATCHES_PER_TABLET = 10;
const EVENTS_PER_BATCH = 100;
const ARREST = Date.parse('2026-03-04T10:00:00.000Z');

async function api(path: string, token: string, body?: object) {
  const res = await fetch(`${BASE}/api${path}`, {
    method: body ? 'POST' : 'GET',
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body ? JSON.stringify(body) : undefined,
  });
  if (!res.ok) throw new Error(`${path}: HTTP ${res.status} ${await res.text()}`);
  return res.json() as Promise<Record<string, unknown>>;
}

async function signIn(): Promise<string> {
  const res = await fetch(`${BASE}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'recorder@kestrel.test', password: 'upstroke-demo' }),
  });
  if (!res.ok) throw new Error(`sign-in: HTTP ${res.status}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

async function newRecord(token: string): Promise<string> {
  const ctx = (await api('/context', token)) as {
    sites: { id: string; units: { id: string }[] }[];
  };
  const id = randomUUID();
  const [site] = ctx.sites;
  const arrestAt = new Date(ARREST).toISOString();
  await api('/resuscitations', token, { id, siteId: site.id, unitId: site.units[0].id, arrestAt });
  return id;
}

const note = (i: number) => ({
  id: randomUUID(),
  at: new Date(ARREST + i * 1000).toISOString(),
  kind: 'note',
  data: { text: `n${i}` },
});

/** Tablets side by side, each posting its batches one after another to its own record. */
async function eventsPerSecond(token: string) {
  const records = await Promise.all(Array.from({ length: TABLETS }, () => newRecord(token)));
  const t0 = performance.now();
  await Promise.all(
    records.map(async (id) => {
      for (let b = 0; b < BATCHES_PER_TABLET; b++) {
        const events = Array.from({ length: EVENTS_PER_BATCH }, (_, k) =>
          note(b * EVENTS_PER_BATCH + k),
        );
        const r = await api(`/resuscitations/${id}/events/batch`, token, { events });
        if (r.accepted !== EVENTS_PER_BATCH) throw new Error(`batch: ${JSON.stringify(r)}`);
      }
    }),
  );
  const seconds = (performance.now() - t0) / 1000;
  const events = TABLETS * BATCHES_PER_TABLET * EVENTS_PER_BATCH;
  return {
    tablets: TABLETS,
    eventsPerBatch: EVENTS_PER_BATCH,
    events,
    seconds,
    perSec: events / seconds,
  };
}

/** One hour at 100 Hz synced as 10-s chunks; the growth of the table with its index and TOAST. */
async function waveformBytesPerHour(token: string) {
  const db = createKnex(process.env.BENCH_DATABASE_URL ?? '');
  const size = async () =>
    Number(
      (
        await db.raw<{ rows: { n: string }[] }>(
          "select pg_total_relation_size('waveform_chunks') as n",
        )
      ).rows[0].n,
    );
  try {
    const id = await newRecord(token);
    const before = await size();
    for (let c = 0; c < 360; c += 20) {
      const chunks = Array.from({ length: 20 }, (_, k) => ({
        id: randomUUID(),
        startAt: new Date(ARREST + (c + k) * 10_000).toISOString(),
        sampleRateHz: 100,
        unit: 'mmHg',
        seq: c + k,
        values: Array.from(
          { length: 1000 },
          (_, s) => 20 + 15 * Math.sin((s / 100) * 2) + Math.random(),
        ),
      }));
      const r = await api(`/resuscitations/${id}/waveform/batch`, token, { chunks });
      if (r.accepted !== chunks.length) throw new Error(`waveform batch: ${JSON.stringify(r)}`);
    }
    await db.raw('vacuum analyze waveform_chunks');
    const bytes = (await size()) - before;
    return { samples: 360_000, chunkSec: 10, bytes, rawFloat32Bytes: 360_000 * 4 };
  } finally {
    await db.destroy();
  }
}

async function main() {
  const token = await signIn();
  const result = {
    measuredAt: new Date().toISOString(),
    loadAverage: loadavg().map((x) => Math.round(x * 10) / 10),
    eventsOneInstance: await eventsPerSecond(token),
    waveformOneHour100Hz: await waveformBytesPerHour(token),
  };
  const all = existsSync(RESULTS)
    ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
    : {};
  all.scaling = result;
  writeFileSync(RESULTS, `${JSON.stringify(all, null, 2)}\n`);
  process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
}

void main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
