import { describe, expect, it } from 'vitest';
import type { AnalysisInput, Waveform } from '@upstroke/contracts';
import { analyze } from '../analyze.js';
import { analyseStored } from '../debrief/compose.js';
import { parseAnalysisInput } from '../input.js';
import { ARREST_AT, at, compressionEvents, ev, record } from '../testing/records.js';
import { synthCapnogram } from '../testing/synth-capnogram.js';
import { monitoringOf } from './runs.js';

const FS = 50;
// 10 min of CPR with a tracheal tube, 10 breaths/min at 20 mmHg (invented signal).
const cap = synthCapnogram({
  seed: 4,
  durationSec: 600,
  sampleRateHz: FS,
  levels: [[0, 20]],
  compressions: [[0, 600]],
  artefactMmHg: 2,
});
const slice = (from: number, to: number, flat = false): Waveform => ({
  startAt: at(from),
  sampleRateHz: FS,
  unit: 'mmHg',
  values: Array.from(cap.values.subarray(from * FS, to * FS), (v) => (flat ? 0 : v)),
});
const events = [...compressionEvents(0, 600), ev('airway', 10, { device: 'tracheal-tube' })];
const kinds = (input: AnalysisInput) => analyze(input).findings.map((f) => f.kind);

describe('a link drop is a data gap, never a clinical finding', () => {
  it('a 90-s gap in the capnogram gives no waveform-absent; the gap is reported as no data', () => {
    const input = record(events, { waveform: [slice(0, 300), slice(390, 600)] });
    const out = analyze(input);
    expect(kinds(input)).not.toContain('waveform-absent');
    expect(out.measures.dataGaps).toEqual([{ startSec: 300, endSec: 390 }]);
    expect(out.measures.monitoredSec).toBe(600);
    expect(out.measures.monitoringCoverage).toBeCloseTo(510 / 600, 10);
  });

  it('a received flat capnogram with a tube in place does raise waveform-absent', () => {
    // A displaced tube shows as no exhaled CO2 (Canadian Airway Focus Group 2021: waveform
    // capnography confirms tube position; PRODUCT.md: absent ≥ 30 s) — here 90 s received flat.
    const input = record(events, {
      waveform: [slice(0, 300), slice(300, 390, true), slice(390, 600)],
    });
    const absent = analyze(input).findings.filter((f) => f.kind === 'waveform-absent');
    expect(absent).toHaveLength(1);
    expect(absent[0].startSec).toBeGreaterThanOrEqual(290);
    expect(absent[0].startSec).toBeLessThanOrEqual(301);
    expect(absent[0].endSec).toBeGreaterThanOrEqual(389);
    expect(absent[0].severity).toBe('critical');
    expect(analyze(input).measures.dataGaps).toEqual([]);
  });

  it('stored chunks with a 90-s gap are analysed as two runs, never zero-filled', () => {
    const chunks = [slice(0, 300), slice(390, 600)].map((w) => ({ ...w, source: 'stream' }));
    const analysis = analyseStored({
      id: 'r',
      siteId: 's',
      unitId: null,
      arrestAt: ARREST_AT,
      events,
      etco2: [],
      waveform: chunks,
    });
    expect(analysis.waveform.map((w) => w.values.length)).toEqual([300 * FS, 210 * FS]);
    expect(analysis.output.findings.map((f) => f.kind)).not.toContain('waveform-absent');
  });

  it('low EtCO2 read off the capnogram does not stand for the time without data', () => {
    const low = synthCapnogram({ seed: 5, durationSec: 600, levels: [[0, 6]] });
    const run = (from: number, to: number): Waveform => ({
      startAt: at(from),
      sampleRateHz: 50,
      unit: 'mmHg',
      values: Array.from(low.values.subarray(from * 50, to * 50)),
    });
    const out = analyze(record(events, { waveform: [run(0, 300), run(390, 600)] }));
    const lows = out.findings.filter((f) => f.kind === 'etco2-low');
    expect(lows.length).toBeGreaterThan(0);
    for (const f of lows) expect(f.endSec <= 300 || f.startSec >= 390).toBe(true);
  });

  it('counts no gap for sample jitter, and the time from the last sample to the end', () => {
    const m = monitoringOf(
      [
        { startSec: 60, endSec: 120 },
        { startSec: 120.5, endSec: 200 },
      ],
      260,
    );
    expect(m).toEqual({
      dataGaps: [{ startSec: 200, endSec: 260 }],
      monitoredSec: 200,
      monitoringCoverage: 139.5 / 200,
    });
    expect(monitoringOf([], 100)).toEqual({
      dataGaps: [],
      monitoredSec: null,
      monitoringCoverage: null,
    });
  });

  it('accepts a list of runs on the command line and names the run at fault', () => {
    const input = record([], {
      waveform: [slice(0, 1), { ...slice(2, 3), unit: 'Torr' as never }],
    });
    const r = parseAnalysisInput(JSON.stringify(input));
    expect(r.ok ? '' : r.message).toMatch(/^waveform\[1\]\.unit: /);
    const ok = parseAnalysisInput(JSON.stringify({ ...input, waveform: [slice(0, 1)] }));
    expect(ok.ok).toBe(true);
  });
});
