import { describe, expect, it } from 'vitest';
import type { LocalEtco2, LocalEvent, LocalResuscitation, Tracked } from '../../../lib/offline';
import { debriefFromLocal } from '../api/offline-debrief';
import { breakAtGaps, roundTicks, screenLegend, timelineModel, viewAround } from './timeline-model';

const arrestAt = '2026-03-04T10:00:00.000Z';
const at = (s: number) => new Date(Date.parse(arrestAt) + s * 1000).toISOString();
const record: LocalResuscitation = {
  id: 'r1',
  siteId: 's1',
  arrestAt,
  roster: [],
  status: 'closed',
  local: 1,
  createdAt: 0,
};
const ev = (id: string, s: number, kind: string, data: Record<string, unknown> = {}) =>
  ({
    id,
    resuscitationId: 'r1',
    at: at(s),
    kind,
    data,
    deviceId: 'd',
    synced: 0,
  }) as Tracked<LocalEvent>;
const events = [
  ev('a', 0, 'arrest'),
  ev('b', 10, 'compressions-start'),
  ev('c', 100, 'drug', { drug: 'epinephrine' }),
  ev('x', 150, 'shock', { energyJ: 150 }),
  ev('y', 151, 'correction', {
    supersedes: 'x',
    replacement: { kind: 'shock', data: { energyJ: 200 }, at: at(150) },
  }),
  ev('d', 200, 'compressions-stop'),
  ev('e', 220, 'end', { reason: 'terminated' }),
];
// 5 mmHg during compressions: under the 10 mmHg default (AHA 2020; Sandroni 2018).
const etco2 = [20, 40, 60, 80, 100, 120].map(
  (s, i) =>
    ({
      id: `v${i}`,
      resuscitationId: 'r1',
      at: at(s),
      value: 5,
      unit: 'mmHg',
      source: 'manual',
      deviceId: 'd',
      synced: 0,
    }) as Tracked<LocalEtco2>,
);

describe('offline debrief and timeline model', () => {
  it('runs capno on the tablet store and marks every live event, low interval and compression band', () => {
    const d = debriefFromLocal({ record, events, etco2, context: null });
    expect(d.computedBy).toBe('device');
    expect(d.profile.thresholds.lowEtco2MmHg).toBe(10);
    expect(d.findings.some((f) => f.kind === 'etco2-low')).toBe(true);
    const m = timelineModel(d);
    // The superseded shock and the correction itself are replaced by one marker for the replacement.
    expect(m.markers.map((x) => x.code)).toEqual(['T0', '▶', 'Epi', 'Shk', '■', 'End']);
    expect(m.markers.find((x) => x.code === 'Shk')?.label).toContain('200 J');
    expect(m.compressions).toEqual([{ startSec: 10, endSec: 200 }]);
    expect(m.low.length).toBeGreaterThan(0);
    expect(m.manual).toHaveLength(6);
  });

  it('puts ticks on round times whatever the view, and explains every code it draws', () => {
    expect(roundTicks(119, 311)).toEqual([120, 150, 180, 210, 240, 270, 300]);
    expect(roundTicks(0, 1500)).toEqual([0, 300, 600, 900, 1200, 1500]);
    expect(roundTicks(71, 160)).toEqual([80, 90, 100, 110, 120, 130, 140, 150, 160]);
    const d = debriefFromLocal({ record, events, etco2, context: null });
    const legend = new Set(screenLegend.map((l) => l.code));
    for (const mk of timelineModel(d).markers) expect(legend.has(mk.code)).toBe(true);
  });

  it('frames a finding with a margin, clipped to the record', () => {
    expect(viewAround(100, 130, 220)).toEqual({ startSec: 70, endSec: 160 });
    expect(viewAround(5, 10, 220)).toEqual({ startSec: 0, endSec: 40 });
  });

  it('bands ROSC periods and never draws a line across a data gap', () => {
    const withRosc = [
      ...events.slice(0, 5),
      ev('r', 160, 'rosc'),
      ev('e', 220, 'end', { reason: 'transferred' }),
    ];
    const d = debriefFromLocal({ record, events: withRosc, etco2, context: null });
    expect(timelineModel(d).rosc).toEqual([{ startSec: 160, endSec: 220 }]);
    const pts = [10, 20, 60, 70].map((x) => ({ x, y: 30 }));
    expect(breakAtGaps(pts, [{ startSec: 25, endSec: 55 }]).map((p) => p.y)).toEqual([
      30,
      30,
      null,
      30,
      30,
    ]);
  });
});
