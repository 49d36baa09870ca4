/**
 * PDF report benchmark: a 60-minute record with 400 events, EtCO2 every 30 s and a 50 Hz
 * capnogram. Run: `NODE_OPTIONS=--conditions=upstroke-source npx tsx bench/pdf.bench.ts`
 * (PDF_OUT=file.pdf keeps the rendered file). Merges into bench/results.json under `pdf`.
 * Targets: render ≤ 1.5 s, file ≤ 2 MB (reported as `pass`; a miss never fails the run).
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { composeDebrief } from '@upstroke/capno';
import { renderReportPdf } from '../api/src/modules/exports/pdf/report-pdf';
import { longRecordParts } from './support/long-record';

const RESULTS = resolve(__dirname, 'results.json');

async function main() {
  const parts = longRecordParts(60, 400);
  const t0 = performance.now();
  const { debrief } = composeDebrief(parts.stored, parts.header);
  const analyzeMs = performance.now() - t0;
  const opts = { version: 'bench', generatedAt: new Date('2026-03-04T12:00:00Z'), timeZone: 'UTC' };
  await renderReportPdf(debrief, opts); // warm-up: fonts read and parsed once per process
  const times: number[] = [];
  let size = 0;
  let file: Buffer = Buffer.alloc(0);
  for (let i = 0; i < 5; i++) {
    const s = performance.now();
    file = await renderReportPdf(debrief, opts);
    times.push(performance.now() - s);
    size = file.length;
  }
  if (process.env.PDF_OUT) writeFileSync(process.env.PDF_OUT, file);
  times.sort((a, b) => a - b);
  const result = {
    measuredAt: new Date().toISOString(),
    node: process.version,
    record: {
      minutes: 60,
      events: parts.stored.events.length,
      etco2Values: parts.stored.etco2.length,
      waveformSamples: (parts.stored.waveform ?? []).reduce((n, c) => n + c.values.length, 0),
      findings: debrief.findings.length,
    },
    composeDebriefMs: Math.round(analyzeMs),
    renderMedianMs: Math.round(times[2]),
    renderMaxMs: Math.round(times[4]),
    sizeBytes: size,
    pages: (file.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length,
    targets: { renderMs: 1500, sizeBytes: 2 * 1024 * 1024 },
    pass: times[2] + analyzeMs <= 1500 && size <= 2 * 1024 * 1024,
  };
  const all = existsSync(RESULTS)
    ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
    : {};
  all.pdf = result;
  writeFileSync(RESULTS, `${JSON.stringify(all, null, 2)}\n`);
  console.log(JSON.stringify(result, null, 2));
}

void main();
