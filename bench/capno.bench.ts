/**
 * Benchmark of the analysis engine (packages/capno). Run: `npx tsx bench/capno.bench.ts`
 * (with NODE_OPTIONS=--conditions=upstroke-source so that workspace packages load from
 * source). Merges its figures into bench/results.json under the key `capno`.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { resolve } from 'node:path';
import type { AnalysisEvent, AnalysisInput } from '@upstroke/contracts';
import { analyze, LiveAnalyzer, synthCapnogram } from '@upstroke/capno';
import { findScipyPython, scipyBreaths } from '../packages/capno/src/testing/node/scipy';

const RESULTS = resolve(__dirname, 'results.json');
const FS = 100;
const ARREST = Date.parse('2026-03-04T10:00:00.000Z');
const iso = (sec: number) => new Date(ARREST + sec * 1000).toISOString();

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[s.length >> 1] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
}

/** 400 events over the record: compression cycles with checks, shocks and drugs. */
function eventsFor(durationSec: number, count = 400): AnalysisEvent[] {
  const kinds = ['compressions-stop', 'rhythm', 'shock', 'compressions-start', 'drug'] as const;
  const out: AnalysisEvent[] = [];
  const step = durationSec / count;
  for (let i = 0; i < count; i++) {
    const t = i * step;
    const id = `b-${i}`;
    const kind = i === 0 ? 'compressions-start' : kinds[i % kinds.length];
    const data =
      kind === 'rhythm'
        ? { rhythm: 'vf' }
        : kind === 'shock'
          ? { energyJ: 200 }
          : kind === 'drug'
            ? { drug: 'epinephrine' }
            : {};
    out.push({ id, at: iso(t), kind, data } as AnalysisEvent);
  }
  return out;
}

function recordOf(minutes: number) {
  const durationSec = minutes * 60;
  const s = synthCapnogram({
    seed: 42,
    durationSec,
    sampleRateHz: FS,
    levels: [
      [0, 12],
      [durationSec, 30],
    ],
    compressions: [[0, durationSec]],
    artefactMmHg: 2,
    noiseMmHg: 0.3,
    sidestreamDelaySec: 2,
  });
  const values = Array.from(s.values);
  const input: AnalysisInput = {
    arrestAt: iso(0),
    events: eventsFor(durationSec),
    waveform: { startAt: iso(0), sampleRateHz: FS, unit: 'mmHg', values },
  };
  return { input, values };
}

/** CPU time of this process (ms): unlike wall time, not stretched while others hold the CPU. */
const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

function timeAnalyze(input: AnalysisInput, runs: number) {
  const times: number[] = [];
  const cpu: number[] = [];
  let breaths = 0;
  for (let i = 0; i < 3; i++) analyze(input); // warm-up: steady-state (JIT-compiled) timings
  for (let i = 0; i < runs; i++) {
    const [t0, c0] = [performance.now(), cpuMs()];
    breaths = analyze(input).breaths.length;
    cpu.push(cpuMs() - c0);
    times.push(performance.now() - t0);
  }
  return { medianMs: median(times), minMs: Math.min(...times), cpuMedianMs: median(cpu), breaths };
}

function peakMemory(input: AnalysisInput) {
  const gc = (globalThis as { gc?: () => void }).gc;
  gc?.();
  const before = process.memoryUsage();
  analyze(input);
  const after = process.memoryUsage();
  return {
    heapDeltaMB: (after.heapUsed - before.heapUsed) / 2 ** 20,
    rssMB: after.rss / 2 ** 20,
    gcExposed: gc !== undefined,
  };
}

/** One new second of samples into a live analyzer that already holds `minutes` of record. */
function incremental(values: number[], input: AnalysisInput, minutes: number) {
  const times: number[] = [];
  // Three passes over the same 100 s, the first one a warm-up (as on a tablet a minute in).
  for (let pass = 0; pass < 3; pass++) {
    const live = new LiveAnalyzer({ arrestAt: input.arrestAt, sampleRateHz: FS, unit: 'mmHg' });
    input.events.forEach((e) => live.pushEvent(e));
    const warm = (minutes - 2) * 60 * FS;
    live.pushSamples(0, values.slice(0, warm));
    for (let k = warm, sec = 0; k + FS <= values.length && sec < 100; k += FS, sec++) {
      const chunk = values.slice(k, k + FS);
      const t0 = performance.now();
      live.pushSamples(k / FS, chunk);
      live.activeFindings((k + FS) / FS);
      if (pass > 0) times.push(performance.now() - t0);
    }
  }
  return { medianMs: median(times), samplesPerUpdate: FS, updates: times.length };
}

function scipyRatio(values: number[], ours: { medianMs: number; cpuMedianMs: number }) {
  const python = findScipyPython();
  if (!python) return { available: false };
  const r = scipyBreaths(python, values, FS, 15);
  const [scipyMs, scipyCpuMs] = [r.computeSec * 1000, r.cpuSec * 1000];
  return {
    available: true,
    python,
    scipyMedianMs: scipyMs,
    scipyCpuMedianMs: scipyCpuMs,
    scipyBreaths: r.breaths.length,
    timesFasterThanScipy: scipyMs / ours.medianMs,
    timesFasterThanScipyCpu: scipyCpuMs / ours.cpuMedianMs,
    targetTimesFaster: 5,
    pass: scipyMs / ours.medianMs >= 5,
  };
}

function main() {
  const runs = Number(process.env.BENCH_RUNS ?? 60);
  const main60 = recordOf(60);
  const t60 = timeAnalyze(main60.input, runs);
  const scaling: Record<string, number> = {};
  for (const m of [15, 60, 240]) {
    scaling[`${m}min`] =
      m === 60
        ? t60.medianMs
        : timeAnalyze(recordOf(m).input, Math.max(3, Math.round(runs / (m / 30)))).medianMs;
  }
  const inc = incremental(main60.values, main60.input, 60);
  const result = {
    measuredAt: new Date().toISOString(),
    node: process.version,
    // The machine is shared: its load (1, 5, 15 min) beside the figures it slows down.
    loadAverage: loadavg().map((x) => Math.round(x * 10) / 10),
    analyze60min100Hz: {
      samples: main60.values.length,
      events: main60.input.events.length,
      runs,
      ...t60,
      targetMs: 3,
      pass: t60.medianMs <= 3,
    },
    memory60min: peakMemory(main60.input),
    scipy60min: scipyRatio(main60.values, t60),
    incrementalOneSecond: { ...inc, targetMs: 0.1, pass: inc.medianMs <= 0.1 },
    scalingMedianMs: scaling,
  };
  const all = existsSync(RESULTS)
    ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
    : {};
  all.capno = result;
  writeFileSync(RESULTS, `${JSON.stringify(all, null, 2)}\n`);
  process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
}

main();
