import { describe, expect, it } from 'vitest';
import type { AnalysisInput } from '@upstroke/contracts';
import { analyze } from '../analyze.js';
import { LiveAnalyzer } from '../live/live-analyzer.js';
import { compressionEvents, ev, record } from '../testing/records.js';
import { normalizeEvents } from './normalize.js';
import { patientStates, patientStatesOf, stateAt, sustainedRosc } from './patient-state.js';

const states = (input: AnalysisInput, until: number) =>
  patientStates(normalizeEvents(input.arrestAt, input.events), until).map((s) => [
    s.state,
    s.startSec,
    s.endSec,
  ]);

describe('patient state: pulseless → ROSC → pulseless on re-arrest → ended', () => {
  it('follows ROSC, pulse present, re-arrest, implied re-arrest and the end', () => {
    const input = record([
      ev('arrest', 0, {}),
      ev('pulse', 100, { present: true }),
      ev('rhythm', 150, { rhythm: 'vf' }), // a rhythm without a pulse: re-arrest
      ev('rosc', 300, {}),
      ev('rearrest', 400, {}),
      ev('rosc', 500, {}),
      ev('compressions-start', 560, {}), // compressions again: pulseless
      ev('rosc', 700, {}),
      ev('end', 800, { reason: 'transferred' }),
      ev('rearrest', 850, {}), // after the end: the record is closed
    ]);
    expect(states(input, 900)).toEqual([
      ['pulseless', 0, 100],
      ['rosc', 100, 150],
      ['pulseless', 150, 300],
      ['rosc', 300, 400],
      ['pulseless', 400, 500],
      ['rosc', 500, 560],
      ['pulseless', 560, 700],
      ['rosc', 700, 800],
      ['ended', 800, 900],
    ]);
    const iv = patientStates(normalizeEvents(input.arrestAt, input.events), 900);
    expect([stateAt(iv, 0), stateAt(iv, 320), stateAt(iv, 450), stateAt(iv, 850)]).toEqual([
      'pulseless',
      'rosc',
      'pulseless',
      'ended',
    ]);
  });

  it('reads stored entries with corrections applied (an undone ROSC is not ROSC)', () => {
    const input = record([
      ev('rosc', 120, {}, 'r1'),
      ev('correction', 130, { supersedes: 'r1', reason: 'tapped by mistake' }),
      ev('rosc', 200, {}),
    ]);
    const iv = patientStatesOf(input.arrestAt, input.events, 300);
    expect(iv.map((s) => [s.state, s.startSec])).toEqual([
      ['pulseless', 0],
      ['rosc', 200],
    ]);
  });

  it('sustained ROSC by the Utstein definition, never from the End choice', () => {
    // Nolan 2019 in-hospital Utstein: sustained ROSC = ROSC maintained ≥ 20 min (checked)
    const rosc = (endAfterRosc: number, reason: 'rosc-sustained' | 'terminated') =>
      analyze(
        record([
          ...compressionEvents(0, 100),
          ev('rosc', 100, {}),
          ev('end', 100 + endAfterRosc, { reason }),
        ]),
      ).measures.sustainedRosc;
    expect(rosc(20 * 60, 'terminated')).toBe(true);
    expect(rosc(20 * 60 - 1, 'rosc-sustained')).toBeNull(); // the record cannot tell
    const rearrest = record([
      ...compressionEvents(0, 100),
      ev('rosc', 100, {}),
      ev('rearrest', 700, {}),
      ev('end', 2000, { reason: 'rosc-sustained' }),
    ]);
    expect(analyze(rearrest).measures.sustainedRosc).toBe(false);
    expect(sustainedRosc([])).toBe(false);
  });
});

describe('CPR measures over pulseless time only (Meaney 2013 CPR-quality consensus)', () => {
  // ROSC at 300 s, re-arrest at 600 s, compressions again from 610 s, end at 900 s.
  const input = record([
    ev('arrest', 0, {}),
    ...compressionEvents(10, 290, [[120, 128]]),
    ev('rhythm', 122, { rhythm: 'vf' }),
    ev('drug', 200, { drug: 'epinephrine' }),
    ev('rosc', 300, {}),
    ev('rearrest', 600, {}),
    ...compressionEvents(610, 900, [[720, 730]]),
    ev('drug', 650, { drug: 'epinephrine' }),
    ev('end', 900, { reason: 'terminated' }),
  ]);
  const out = analyze(input);

  it('counts the compression fraction over both pulseless segments', () => {
    // Meaney 2013: CCF = share of pulseless time with compressions (checked).
    // Pulseless: 0–300 and 600–900 = 600 s. Compressions: 10–120, 128–290 (272 s) and
    // 610–720, 730–900 (280 s).
    expect(out.measures.timeWithoutCirculationSec).toBe(600);
    expect(out.measures.compressionSec).toBe(552);
    expect(out.measures.compressionFraction).toBeCloseTo(552 / 600, 10);
    expect(out.measures.roscPeriods).toEqual([{ startSec: 300, endSec: 600 }]);
  });

  it('finds no pause during ROSC, and the pauses of both segments', () => {
    expect(out.measures.pauses.map((p) => [p.startSec, p.endSec])).toEqual([
      [120, 128],
      [720, 730],
    ]);
    expect(out.findings.filter((f) => f.kind === 'pause-long')).toEqual([]);
  });

  it('judges rhythm checks and epinephrine within each pulseless segment, never across ROSC', () => {
    const late = out.findings.filter((f) => f.kind === 'rhythm-check-late');
    // After the re-arrest no rhythm check was recorded from 610 s to 900 s with
    // compressions running: due every 2 min (AHA 2020; RCUK 2021 — summary), late from 730 s.
    // Before ROSC: the check at 122 s, ROSC found at 300 s (178 s > 120 + 15 s): late.
    expect(late.map((f) => [f.startSec, f.endSec])).toEqual([
      [242, 300],
      [730, 900],
    ]);
    // 200 s → 650 s spans ROSC: not an interval between doses during CPR.
    expect(out.findings.filter((f) => f.kind === 'epinephrine-interval')).toEqual([]);
  });

  it('gives Live no arrest prompt during ROSC, and prompts again after a re-arrest', () => {
    const live = new LiveAnalyzer({ arrestAt: input.arrestAt, sampleRateHz: 50, unit: 'mmHg' });
    const early = input.events.filter((e) => Date.parse(e.at) < Date.parse(input.arrestAt) + 6e5);
    early.forEach((e) => live.pushEvent(e));
    // 6 min after ROSC: no hands-off, rhythm-check or epinephrine prompt.
    expect(live.activeFindings(660).map((f) => f.kind)).toEqual([]);
    live.pushEvent(ev('rearrest', 660, {}));
    live.pushEvent(ev('compressions-start', 670, {}));
    live.pushEvent(ev('compressions-stop', 680, {}));
    // Compressions stopped 15 s into the new pulseless segment: a pause in progress again.
    expect(live.activeFindings(695).map((f) => f.kind)).toContain('pause-long');
  });
});
