import { randomUUID } from 'node:crypto';
import type { Db } from '../src/db/knex';
import { demoSiteId, demoUnits } from './test-app';

/** A small fixed set of summary rows (invented values) for checking the trend figures. */
export interface FixtureRow {
  id: string;
  siteId: string;
  unitId: string | null;
  arrestAt: string;
  shockable: boolean | null;
  witnessed: boolean | null;
  outcome: string | null;
  anyRosc: boolean;
  sustainedRosc: boolean;
  compressionFraction: number | null;
  fractionGe10: number | null;
  timeToFirstShockSec: number | null;
  timeToFirstEpinephrineSec: number | null;
  preshockLongCount: number;
  etco2Documented: boolean;
}

const [ed, icu, ward] = demoUnits.map((u) => u.id);
type Spec = [
  string,
  string,
  boolean | null,
  number | null,
  number | null,
  number | null,
  number | null,
  number,
  boolean,
  string | null,
];
// unit, arrestAt, shockable, CF, ≥10 fraction, shock s, epi s, long pre-shock, EtCO2 doc, outcome
const specs: Spec[] = [
  [ed, '2026-01-03T10:00:00Z', true, 0.82, 0.9, 95, null, 1, true, 'rosc-sustained'],
  [ed, '2026-01-12T22:30:00Z', false, 0.71, 0.4, null, 240, 0, true, 'died'],
  [icu, '2026-01-20T04:15:00Z', false, 0.9, null, null, 130, 0, false, 'rosc-not-sustained'],
  [ward, '2026-01-31T23:59:00Z', true, 0.65, 0.2, 180, 600, 2, true, 'died'],
  [ed, '2026-02-02T08:00:00Z', null, null, null, null, null, 0, false, null],
  [icu, '2026-03-05T12:00:00Z', false, 0.88, 1, null, 90, 0, true, 'rosc-sustained'],
  [icu, '2026-03-06T12:00:00Z', false, 0.77, 0.75, null, 400, 0, true, 'transferred'],
  [ed, '2026-03-18T01:00:00Z', true, 0.93, 0.95, 60, 300, 0, true, 'rosc-sustained'],
  [ward, '2026-03-28T16:45:00Z', true, 0.6, 0.1, 240, null, 3, true, 'died'],
  [ward, '2026-03-30T09:00:00Z', false, 0.7, 0.5, null, 210, 0, false, 'died'],
];

export function fixtureRows(): FixtureRow[] {
  return specs.map(([unitId, arrestAt, shockable, cf, ge10, shock, epi, pre, doc, outcome], i) => ({
    id: randomUUID(),
    siteId: demoSiteId,
    unitId,
    arrestAt,
    shockable,
    witnessed: i % 3 === 0 ? null : i % 2 === 0,
    outcome,
    anyRosc: outcome === 'rosc-sustained' || outcome === 'rosc-not-sustained',
    sustainedRosc: outcome === 'rosc-sustained',
    compressionFraction: cf,
    fractionGe10: ge10,
    timeToFirstShockSec: shock,
    timeToFirstEpinephrineSec: epi,
    preshockLongCount: pre,
    etco2Documented: doc,
  }));
}

/** Stores signed records and their summary rows exactly as given. */
export async function insertFixture(db: Db, rows: FixtureRow[]): Promise<void> {
  for (const r of rows) {
    await db('resuscitations').insert({
      id: r.id,
      siteId: r.siteId,
      unitId: r.unitId,
      arrestAt: r.arrestAt,
      status: 'signed',
      signedAt: new Date(),
      outcome: r.outcome,
    });
    const { id, ...rest } = r;
    await db('recordSummaries').insert({
      ...rest,
      resuscitationId: id,
      firstRhythm: r.shockable === null ? null : r.shockable ? 'vf' : 'pea',
      monitored: null,
      endReason: null,
      longestPauseSec: null,
      timeToFirstCompressionSec: 10,
      medianEtco2: r.etco2Documented ? 20 : null,
      fractionGe20: null,
      findingCounts: JSON.stringify({ 'pause-long': 1 }),
      durationSec: 600,
      profileVersion: 1,
    });
  }
}
