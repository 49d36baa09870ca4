import { describe, expect, it } from 'vitest';
import { analyze } from '../analyze.js';
import { at, compressionEvents, ev, record } from '../testing/records.js';
import { synthCapnogram } from '../testing/synth-capnogram.js';
import { LiveAnalyzer } from './live-analyzer.js';

const s = synthCapnogram({
  seed: 11,
  durationSec: 400,
  sampleRateHz: 50,
  compressions: [[0, 400]],
  artefactMmHg: 2,
  noiseMmHg: 0.3,
  levels: [[0, 20]],
  modifiers: [{ kind: 'dislodged', atSec: 300 }],
});
const events = [
  ...compressionEvents(0, 400),
  ev('airway', 30, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
];

function feed(live: LiveAnalyzer, untilSec: number, chunkSec = 0.2) {
  const n = Math.round(chunkSec * 50);
  for (let k = 0; k < untilSec * 50; k += n)
    live.pushSamples(k / 50, s.values.subarray(k, Math.min(k + n, untilSec * 50)));
}

describe('LiveAnalyzer', () => {
  it('gives the same breaths and findings as batch analysis of the same record', () => {
    const live = new LiveAnalyzer({ arrestAt: at(0), sampleRateHz: 50, unit: 'kPa' });
    const kPa = s.values.map((v) => v / 7.50062);
    for (let k = 0; k < kPa.length; k += 25) live.pushSamples(k / 50, kPa.subarray(k, k + 25));
    events.forEach((e) => live.pushEvent(e));
    const batch = analyze(
      record(events, {
        waveform: { startAt: at(0), sampleRateHz: 50, unit: 'kPa', values: Array.from(kPa) },
      }),
    );
    expect(live.breaths).toEqual(batch.breaths);
    expect(live.snapshot()).toEqual(batch);
  });

  it('reports findings in progress: an ongoing pause, an absent waveform after dislodgement', () => {
    const live = new LiveAnalyzer({ arrestAt: at(0), sampleRateHz: 50, unit: 'mmHg' });
    live.pushEvent(ev('compressions-start', 0, {}));
    live.pushEvent(
      ev('airway', 30, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
    );
    feed(live, 280);
    expect(live.activeFindings(280).map((f) => f.kind)).toEqual(['rhythm-check-late']);
    [120, 240].forEach((t) => live.pushEvent(ev('rhythm', t, { rhythm: 'pea' })));
    expect(live.activeFindings(280)).toEqual([]);
    live.pushEvent(ev('compressions-stop', 270, {}));
    expect(live.activeFindings(285).map((f) => f.kind)).toEqual(['pause-long']);
    live.pushEvent(ev('compressions-start', 286, {}));
    expect(live.activeFindings(287)).toEqual([]); // ended at 286 s: no longer in progress
    feed(live, 340);
    const active = live.activeFindings(340);
    expect(active.map((f) => f.kind)).toEqual(['waveform-absent']);
    expect(active[0].startSec).toBeGreaterThan(295);
  });

  it('restarts the detector at a gap in the stream instead of joining across it', () => {
    const live = new LiveAnalyzer({ arrestAt: at(0), sampleRateHz: 50, unit: 'mmHg' });
    live.pushSamples(0, s.values.subarray(0, 3000));
    live.pushSamples(100, s.values.subarray(5000, 8000));
    expect(live.breaths.every((b) => b.tSec < 60 || b.tSec >= 100)).toBe(true);
    expect(live.breaths.filter((b) => b.tSec >= 100).length).toBeGreaterThan(4);
  });

  it('a snapshot up to a time leaves out later breaths and values, and its breaths are a copy', () => {
    const live = new LiveAnalyzer({ arrestAt: at(0), sampleRateHz: 50, unit: 'mmHg' });
    feed(live, 200);
    live.pushEtco2({ at: at(150), value: 25, unit: 'mmHg', source: 'manual' });
    const all = live.breaths.length;
    const cut = live.snapshot(100);
    const later = live.breaths.filter((b) => b.tSec > 100).length;
    expect(later).toBeGreaterThan(5);
    expect(cut.breaths).toEqual(live.breaths.filter((b) => b.tSec <= 100));
    const whole = live.snapshot();
    expect(whole.breaths).toHaveLength(all);
    whole.breaths.length = 0; // the caller's copy: the analyzer keeps its own breaths
    expect(live.breaths).toHaveLength(all);
    expect(live.snapshot(100).findings).toEqual(cut.findings);
  });
});
