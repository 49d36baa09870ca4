import { type DebriefRecord, defaultDisplayFormat, thresholdDefaults } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { analyze } from '../analyze.js';
import { composeDebrief, debriefEventsInForce } from './compose.js';
import type { StoredRecord } from './stored-record.js';
import { buildSummaryRow } from './summary-row.js';
import { MAX_SPAN_SEC, ticksFor } from './timeline-model.js';

const arrestAt = '2026-03-04T10:00:00.000Z';
const at = (sec: number) => new Date(Date.parse(arrestAt) + sec * 1000).toISOString();
const ev = (id: string, sec: number, kind: string, data: object = {}, amendment = false) => ({
  id,
  at: at(sec),
  kind,
  data,
  amendment,
});

const header: DebriefRecord = {
  id: 'r1',
  siteId: 's1',
  unitId: null,
  arrestAt,
  location: null,
  patientRef: null,
  ageGroup: 'adult',
  weightKg: null,
  status: 'signed',
  display: defaultDisplayFormat,
  witnessed: null,
  monitored: null,
  firstRhythm: null,
  outcome: null,
  endReason: null,
  notesWentWell: null,
  notesToChange: null,
  createdBy: null,
  createdAt: arrestAt,
  signedAt: null,
  signedBy: null,
  siteName: 'Site',
  unitName: null,
  paperSize: 'A4',
  etco2Unit: 'mmHg',
  createdByName: null,
  signedByName: null,
};

function stored(over: Partial<StoredRecord> = {}): StoredRecord {
  return {
    id: 'r1',
    siteId: 's1',
    unitId: null,
    arrestAt,
    events: [
      ev('a', 0, 'arrest'),
      ev('cs', 10, 'compressions-start'),
      ev('s', 150, 'shock', { energyJ: 150 }),
      ev('c1', 160, 'correction', {
        supersedes: 's',
        replacement: { kind: 'shock', data: { energyJ: 200 }, at: at(150) },
      }),
      // Undoes c1: the 150 J shock stands again.
      ev('c2', 170, 'correction', { supersedes: 'c1' }),
      ev('ce', 600, 'compressions-stop'),
      ev('e', 620, 'end', { reason: 'terminated' }),
      // An amendment note written three days later.
      ev('n', 3 * 86400, 'note', { text: 'late note' }, true),
    ],
    // 5 mmHg during compressions: under the 10 mmHg default (AHA 2020; Sandroni 2018).
    etco2: [60, 120, 180, 240, 300].map((s) => ({
      at: at(s),
      value: 5,
      unit: 'mmHg' as const,
      source: 'manual',
    })),
    profile: { id: 'p2', version: 2, name: 'Ward profile', thresholds: { lowEtco2MmHg: 12 } },
    ...over,
  };
}

describe('composeDebrief (one path from a stored record to every output)', () => {
  it('lists every event with the correction in force that superseded it (undone ones supersede nothing)', () => {
    const { debrief } = composeDebrief(stored(), { record: header, computedBy: 'server' });
    const by = Object.fromEntries(debrief.events.map((e) => [e.id, e.supersededBy]));
    expect(by).toMatchObject({ s: null, c1: 'c2', c2: null });
    const inForce = debriefEventsInForce(debrief);
    expect(inForce.find((e) => e.kind === 'shock')?.data).toEqual({ energyJ: 150 });
    expect(debrief.timeline.markers.map((m) => m.code)).toEqual(['T0', '', 'Shk', '', 'End']);
  });

  it('uses the profile version in force, and falls back to the defaults when it fails the checks', () => {
    const ok = composeDebrief(stored(), { record: header, computedBy: 'server' }).debrief;
    expect(ok.profile).toMatchObject({ id: 'p2', version: 2, name: 'Ward profile' });
    expect(ok.profile.thresholds.lowEtco2MmHg).toBe(12);
    // 500 mmHg is outside the profile's allowed range (thresholdsSchema): defaults apply.
    const bad = stored({ profile: { version: 3, thresholds: { lowEtco2MmHg: 500 } } });
    const d = composeDebrief(bad, { record: header, computedBy: 'server' }).debrief;
    expect(d.profile.version).toBe(3);
    expect(d.profile.thresholds).toEqual(thresholdDefaults);
  });

  it('gives the same measures and findings as capno on the same checked input', () => {
    const { debrief } = composeDebrief(stored(), { record: header, computedBy: 'server' });
    const direct = analyze({
      arrestAt,
      profile: { ...thresholdDefaults, lowEtco2MmHg: 12 },
      events: stored()
        .events.filter((e) => e.id !== 'n')
        .map(({ id, at: t, kind, data }) => ({ id, at: t, kind, data }) as never),
      etco2: stored().etco2.map((v) => ({ ...v, source: 'manual' as const })),
    });
    expect(debrief.measures.compressionFraction).toBe(direct.measures.compressionFraction);
    expect(debrief.findings.map((f) => f.kind)).toEqual(direct.findings.map((f) => f.kind));
  });

  it('builds the committee row from the same analysis', () => {
    const s = stored();
    const { debrief } = composeDebrief(s, { record: header, computedBy: 'server' });
    const row = buildSummaryRow(s);
    expect(row.compressionFraction).toBe(debrief.measures.compressionFraction);
    expect(row.longestPauseSec).toBe(debrief.measures.longestPauseSec);
    expect(row.medianEtco2).toBe(debrief.measures.etco2.medianMmHg);
    expect(row.profileVersion).toBe(2);
    const low = debrief.findings.filter((f) => f.kind === 'etco2-low').length;
    expect(low).toBeGreaterThan(0);
    expect(row.findingCounts['etco2-low']).toBe(low);
  });
});

describe('timeline model', () => {
  it('spans the clinical code only: an amendment written days later does not stretch it', () => {
    const { debrief } = composeDebrief(stored(), { record: header, computedBy: 'server' });
    expect(debrief.timeline.span).toEqual({ startSec: 0, endSec: 620 });
    expect(debrief.timeline.markers.some((m) => m.id === 'n')).toBe(false);
    // 620 s = 10.3 min: one tick a minute, at round minutes.
    expect(debrief.timeline.ticks.map((t) => t.label)).toEqual([
      '0',
      '1',
      '2',
      '3',
      '4',
      '5',
      '6',
      '7',
      '8',
      '9',
      '10',
    ]);
    expect(debrief.timeline.shaded).toContainEqual({
      kind: 'compressions',
      startSec: 10,
      endSec: 600,
    });
    expect(debrief.timeline.shaded.some((x) => x.kind === 'etco2-low')).toBe(true);
  });

  it('without an end event, amendments still do not stretch it; an absurd time is bounded', () => {
    const noEnd = stored().events.filter((e) => e.kind !== 'end');
    const a = composeDebrief(stored({ events: noEnd }), { record: header, computedBy: 'server' });
    expect(a.debrief.timeline.span.endSec).toBe(600);
    const year3000 = [...noEnd, ev('x', 3e10, 'note', { text: 'typo' })];
    const b = composeDebrief(stored({ events: year3000 }), {
      record: header,
      computedBy: 'server',
    });
    expect(b.debrief.timeline.span.endSec).toBe(MAX_SPAN_SEC);
    expect(b.debrief.timeline.ticks.length).toBeLessThanOrEqual(13);
  });

  it('keeps ticks at round minutes, about a dozen whatever the span', () => {
    for (const end of [60, 599, 3600, 7 * 3600, MAX_SPAN_SEC]) {
      const ticks = ticksFor(end);
      expect(ticks.length).toBeLessThanOrEqual(13);
      expect(ticks.every((t) => t.tSec % 60 === 0 && t.tSec <= end)).toBe(true);
    }
  });

  it('marks a stretch between stored capnogram chunks as a data gap', () => {
    const chunk = (sec: number) => ({
      startAt: at(sec),
      sampleRateHz: 10,
      unit: 'mmHg' as const,
      source: 'stream',
      values: new Array(100).fill(0),
    });
    const s = stored({ waveform: [chunk(100), chunk(110), chunk(200)] });
    const { debrief } = composeDebrief(s, { record: header, computedBy: 'server' });
    // No samples between 120 and 200 s, nor from the last one (210 s) to the end (620 s).
    expect(debrief.timeline.gaps).toEqual([
      { startSec: 120, endSec: 200 },
      { startSec: 210, endSec: 620 },
    ]);
    expect(debrief.measures.dataGaps).toEqual(debrief.timeline.gaps);
    expect(debrief.measures.monitoringCoverage).toBeCloseTo(30 / 520, 10);
  });

  it('shades the ROSC periods of the patient state', () => {
    const s = stored();
    s.events = [...s.events, ev('r', 300, 'rosc'), ev('ra', 400, 'rearrest')];
    const { debrief } = composeDebrief(s, { record: header, computedBy: 'server' });
    expect(debrief.timeline.shaded.filter((x) => x.kind === 'rosc')).toEqual([
      { kind: 'rosc', startSec: 300, endSec: 400 },
    ]);
  });

  it('leaves a typed EtCO2 value taken back by a correction out of the analysis, keeping the correction listed', () => {
    const base = stored();
    const wrong = {
      id: 'v-wrong',
      at: at(200),
      value: 80,
      unit: 'mmHg' as const,
      source: 'manual',
    };
    const undo = ev('u', 205, 'correction', { supersedes: 'v-wrong', reason: 'Undo' });
    const s = stored({ events: [...base.events, undo], etco2: [...base.etco2, wrong] });
    const { debrief } = composeDebrief(s, { record: header, computedBy: 'server' });
    expect(debrief.etco2Series.map((p) => p.mmHg)).toEqual([5, 5, 5, 5, 5]);
    expect(debrief.events.find((e) => e.id === 'u')?.kind).toBe('correction');
    const kept = composeDebrief(stored({ etco2: [...base.etco2, wrong] }), {
      record: header,
      computedBy: 'server',
    }).debrief;
    expect(kept.etco2Series.map((p) => p.mmHg)).toContain(80);
  });

  it('lists every typed value and every undone value with the correction that took it back', () => {
    const base = stored();
    const typed = (id: string, sec: number, value: number, source = 'manual') => ({
      id,
      at: at(sec),
      value,
      unit: 'kPa' as const,
      source,
    });
    // A stream value taken back is listed too (never silently absent); others are not.
    const etco2 = [
      typed('v2', 200, 10.7),
      typed('v1', 90, 2.4),
      typed('w1', 95, 3.1, 'stream'),
      typed('w2', 96, 3.2, 'stream'),
    ];
    const events = [
      ...base.events,
      ev('u1', 205, 'correction', { supersedes: 'v2', reason: 'Undo' }),
      ev('u2', 206, 'correction', { supersedes: 'w2', reason: 'Undo' }),
    ];
    const { debrief } = composeDebrief(stored({ events, etco2 }), {
      record: header,
      computedBy: 'server',
    });
    expect(debrief.etco2Entries).toEqual([
      {
        id: 'v1',
        at: at(90),
        tSec: 90,
        value: 2.4,
        unit: 'kPa',
        source: 'manual',
        supersededBy: null,
      },
      {
        id: 'w2',
        at: at(96),
        tSec: 96,
        value: 3.2,
        unit: 'kPa',
        source: 'stream',
        supersededBy: 'u2',
      },
      {
        id: 'v2',
        at: at(200),
        tSec: 200,
        value: 10.7,
        unit: 'kPa',
        source: 'manual',
        supersededBy: 'u1',
      },
    ]);
    // Undoing the undo: the value stands again, no longer marked.
    const redo = [...events, ev('u3', 300, 'correction', { supersedes: 'u1' })];
    const again = composeDebrief(stored({ events: redo, etco2 }), {
      record: header,
      computedBy: 'server',
    }).debrief;
    expect(again.etco2Entries.find((v) => v.id === 'v2')?.supersededBy).toBeNull();
  });
});
