/**
 * Event-loop benchmark (issue 15): `/api/health` answers while 4 PDF reports of a 60-minute
 * record (400 events, EtCO2 every 30 s, a 50 Hz capnogram) render at once, against the
 * running built app. The record is stored through the API, signed, then 4 downloads are
 * kept in flight while health is asked one call after another. Target: health p99 ≤ 100 ms.
 * Needs BENCH_BASE_URL (set by `npm run bench`); skips without it. Merges its figures into
 * bench/results.json under `pdfHealth`.
 */
import { randomUUID } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { resolve } from 'node:path';
import { longRecordParts } from './support/long-record';

const RESULTS = resolve(__dirname, 'results.json');
const baseUrl = process.env.BENCH_BASE_URL;
const IN_FLIGHT = 4;
const PDFS = Number(process.env.BENCH_PDFS ?? 24);
const TARGET_P99_MS = 100;

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
const stats = (ms: number[]) => {
  const s = [...ms].sort((a, b) => a - b);
  const r = (x: number) => Math.round(x * 10) / 10;
  return {
    samples: s.length,
    p50Ms: r(percentile(s, 50)),
    p95Ms: r(percentile(s, 95)),
    p99Ms: r(percentile(s, 99)),
    maxMs: r(s[s.length - 1]),
  };
};

async function call(path: string, token: string, method = 'GET', body?: unknown) {
  const res = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const buf = Buffer.from(await res.arrayBuffer());
  if (res.status >= 300) throw new Error(`${method} ${path}: HTTP ${res.status} ${buf}`);
  return buf;
}

async function signIn(): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'lead@kestrel.test', password: 'upstroke-demo' }),
  });
  return ((await res.json()) as { accessToken: string }).accessToken;
}

/** The long invented record, stored and signed through the API; returns its id. */
async function storeLongRecord(token: string): Promise<string> {
  const { stored, header } = longRecordParts(60, 400);
  const context = JSON.parse((await call('/context', token)).toString()) as {
    sites: { id: string }[];
  };
  const id = header.record.id;
  await call('/resuscitations', token, 'POST', {
    id,
    siteId: context.sites[0].id,
    arrestAt: header.record.arrestAt,
    location: header.record.location,
    patientRef: header.record.patientRef,
  });
  const url = `/resuscitations/${id}`;
  const events = stored.events.map(({ id: eid, at, kind, data }) => ({ id: eid, at, kind, data }));
  await call(`${url}/events/batch`, token, 'POST', { events });
  const samples = stored.etco2.map((e) => ({
    id: randomUUID(),
    at: e.at,
    value: e.value,
    unit: e.unit,
    source: 'manual',
  }));
  await call(`${url}/etco2/batch`, token, 'POST', { samples });
  const chunks = (stored.waveform ?? []).map((c, i) => ({
    id: randomUUID(),
    startAt: c.startAt,
    sampleRateHz: c.sampleRateHz,
    unit: c.unit,
    seq: i,
    values: Array.from(c.values, (v) => Math.round(v * 100) / 100),
  }));
  for (let k = 0; k < chunks.length; k += 100)
    await call(`${url}/waveform/batch`, token, 'POST', { chunks: chunks.slice(k, k + 100) });
  await call(url, token, 'PATCH', {
    outcome: 'died',
    firstRhythm: 'vf',
    witnessed: true,
    monitored: true,
  });
  await call(`${url}/sign`, token, 'POST');
  return id;
}

/** Health asked one call after another until `until` resolves; each call's time. */
async function healthWhile(until: Promise<unknown>): Promise<number[]> {
  let done = false;
  void until.finally(() => (done = true));
  const ms: number[] = [];
  while (!done) {
    const t0 = performance.now();
    const res = await fetch(`${baseUrl}/api/health`);
    await res.arrayBuffer();
    ms.push(performance.now() - t0);
    await new Promise((r) => setTimeout(r, 5));
  }
  return ms;
}

/** PDFS downloads, IN_FLIGHT at a time; each download's time. */
async function renderPdfs(url: string, token: string): Promise<number[]> {
  const times: number[] = [];
  let next = 0;
  const lane = async () => {
    while (next < PDFS) {
      next += 1;
      const t0 = performance.now();
      const file = await call(url, token);
      if (file.subarray(0, 5).toString() !== '%PDF-') throw new Error('not a PDF');
      times.push(performance.now() - t0);
    }
  };
  await Promise.all(Array.from({ length: IN_FLIGHT }, lane));
  return times;
}

async function main() {
  if (!baseUrl) {
    console.log('pdf-health bench skipped: BENCH_BASE_URL is not set (run `npm run bench`)');
    return;
  }
  const token = await signIn();
  const id = await storeLongRecord(token);
  const pdfUrl = `/resuscitations/${id}/report.pdf`;
  await call(pdfUrl, token); // warm-up: worker threads started, fonts read
  const idle = await healthWhile(new Promise((r) => setTimeout(r, 2000)));
  const rendering = renderPdfs(pdfUrl, token);
  const [busy, pdfMs] = await Promise.all([healthWhile(rendering), rendering]);
  const healthBusy = stats(busy);
  const result = {
    measuredAt: new Date().toISOString(),
    node: process.version,
    cpus: availableParallelism(),
    loadAverage1m: Math.round(loadavg()[0] * 100) / 100,
    record: { minutes: 60, events: 400, waveformSamples: 180_000 },
    pdfsInFlight: IN_FLIGHT,
    pdfs: PDFS,
    pdfDownload: stats(pdfMs),
    healthIdle: stats(idle),
    healthWhileRendering: healthBusy,
    targets: { healthP99Ms: TARGET_P99_MS },
    pass: healthBusy.p99Ms <= TARGET_P99_MS,
  };
  const all = existsSync(RESULTS)
    ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
    : {};
  all.pdfHealth = result;
  writeFileSync(RESULTS, `${JSON.stringify(all, null, 2)}\n`);
  console.log(JSON.stringify(result, null, 2));
}

void main();
