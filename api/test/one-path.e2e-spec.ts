import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { debriefEventsInForce } from '@upstroke/capno';
import {
  clockFromArrest,
  type Debrief,
  type DebriefEvent,
  eventDetails,
  eventKindLabels,
  findingKindLabels,
  type RecordingContext,
} from '@upstroke/contracts';
import { pdfSubstitutions } from '../src/modules/exports/pdf/fonts';
import { measureRows } from '../src/modules/exports/pdf/measures';
import { decodeSamples } from '../src/modules/resuscitations/stored-rows';
import { seedDemoRecords } from '../../db/seeds/demo-records';
import { onePathRecord } from './one-path-fixture';
import { demoSiteId, startTestApp, type TestApp } from './test-app';

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'upstroke-one-path-'));
const squash = (s: string) =>
  s.replace(/[→✓⚠≥]/g, (c) => pdfSubstitutions[c] ?? c).replace(/\s+/g, '');

function binary(
  res: { on: (e: string, cb: (c?: Buffer) => void) => void },
  cb: (e: Error | null, b: Buffer) => void,
) {
  const parts: Buffer[] = [];
  res.on('data', (c) => parts.push(c as Buffer));
  res.on('end', () => cb(null, Buffer.concat(parts)));
}

const inForceView = (d: Debrief) =>
  debriefEventsInForce(d).map((e) => ({ id: e.id, at: e.at, kind: e.kind, data: e.data }));

/** The tablet's `debriefFromLocal`, run as the browser would: as an ES module (tsx). */
function tabletDebrief(local: object): Debrief {
  const out = execFileSync('npx', ['tsx', path.join(__dirname, 'tablet-debrief.cjs')], {
    input: JSON.stringify(local),
    encoding: 'utf8',
    env: { ...process.env, NODE_OPTIONS: '--conditions=upstroke-source' },
    maxBuffer: 64 * 1024 * 1024,
  });
  return JSON.parse(out) as Debrief;
}

/** The tablet's own store for the record, as it holds it once everything has synced. */
async function tabletView(t: TestApp, id: string, profileId: string): Promise<Debrief> {
  const where = { resuscitationId: id };
  const [rec, events, etco2, chunks, profile, site] = await Promise.all([
    t.db('resuscitations').where({ id }).first(),
    t.db('resuscitationEvents').where(where).orderBy('at'),
    t.db('etco2Samples').where(where).orderBy('at'),
    // The tablet holds the chunks it streamed itself; the monitor file stays on the server.
    t
      .db('waveformChunks')
      .where({ ...where, source: 'stream' })
      .orderBy('startAt'),
    t.db('protocolProfiles').where({ id: profileId }).first(),
    t.db('sites').where({ id: demoSiteId }).first(),
  ]);
  const context: RecordingContext = {
    serverTime: new Date().toISOString(),
    sites: [
      {
        id: demoSiteId,
        name: site.name,
        etco2Unit: site.etco2Unit,
        units: [],
        profile: { id: profile.id, version: profile.version, thresholds: profile.thresholds },
      },
    ],
  };
  const iso = (d: Date) => d.toISOString();
  return tabletDebrief({
    record: {
      id,
      siteId: rec.siteId,
      arrestAt: iso(rec.arrestAt),
      roster: [],
      status: 'closed',
      local: 1,
      createdAt: rec.createdAt.getTime(),
    },
    events: events.map((e) => ({ ...e, at: iso(e.at), deviceId: 'tablet', synced: 1 as const })),
    etco2: etco2.map((v) => ({ ...v, at: iso(v.at), deviceId: 'tablet', synced: 1 as const })),
    waveformChunks: chunks.map((c) => ({
      id: c.id,
      resuscitationId: id,
      startAt: iso(c.startAt),
      sampleRateHz: c.sampleRateHz,
      unit: c.unit,
      seq: c.seq,
      values: Array.from(decodeSamples(c.samples, c.sampleCount)),
    })),
    context,
  });
}

describe('one path from a stored record to every output', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
    fs.rmSync(tmp, { recursive: true, force: true });
  });

  it('the debrief, the tablet, the PDF, FHIR and the committee row agree', async () => {
    const { url, id, profileId, token } = await onePathRecord(t);
    const set = ['Authorization', `Bearer ${token}`] as const;
    const debrief = (
      await t
        .http()
        .get(`${url}/debrief`)
        .set(...set)
        .expect(200)
    ).body as Debrief;

    // The record has everything the outputs must agree on.
    expect(debrief.profile.version).toBe(2);
    expect(debrief.profile.thresholds.lowEtco2MmHg).toBe(14);
    expect(debrief.amendments).toHaveLength(1);
    expect(debrief.etco2Series.some((p) => p.source === 'import')).toBe(true);
    expect(debrief.waveformTrace?.source).toBe('stream');
    const inForce = inForceView(debrief);
    // The undone correction leaves the first shock (150 J) in force, not the 200 J replacement.
    expect(inForce.filter((e) => e.kind === 'shock').map((e) => e.data.energyJ)).toEqual([150]);
    expect(inForce.some((e) => e.kind === 'rhythm' && e.data.rhythm === 'asystole')).toBe(false);
    expect(debrief.findings.length).toBeGreaterThan(0);

    // The tablet's offline debrief: same measures, findings and events in force.
    const tablet = await tabletView(t, id, profileId);
    expect(tablet.computedBy).toBe('device');
    expect(tablet.measures).toEqual(debrief.measures);
    expect(tablet.findings).toEqual(debrief.findings);
    expect(inForceView(tablet)).toEqual(inForce);
    expect(tablet.timeline.span).toEqual(debrief.timeline.span);
    expect(tablet.timeline.shaded).toEqual(debrief.timeline.shaded);

    // The committee's row.
    const row = await t.db('recordSummaries').where({ resuscitationId: id }).first();
    expect(Number(row.compressionFraction)).toBeCloseTo(
      debrief.measures.compressionFraction ?? 0,
      6,
    );
    expect(row.longestPauseSec).toBeCloseTo(debrief.measures.longestPauseSec ?? 0, 6);
    expect(row.medianEtco2).toBeCloseTo(debrief.measures.etco2.medianMmHg ?? 0, 6);
    expect(row.profileVersion).toBe(2);
    const counts: Record<string, number> = {};
    for (const f of debrief.findings) counts[f.kind] = (counts[f.kind] ?? 0) + 1;
    for (const [kind, n] of Object.entries(row.findingCounts as Record<string, number>))
      expect([kind, n]).toEqual([kind, counts[kind] ?? 0]);

    // The PDF's text: every measure, every finding, every event in force.
    const pdf = await t
      .http()
      .get(`${url}/report.pdf`)
      .set(...set)
      .buffer(true)
      .parse(binary);
    expect(pdf.status).toBe(200);
    const file = path.join(tmp, 'one-path.pdf');
    fs.writeFileSync(file, pdf.body as Buffer);
    const text = squash(execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }));
    for (const [label, value] of measureRows(debrief))
      expect([label, text.includes(squash(`${label}${value}`))]).toEqual([label, true]);
    expect(text).toContain(squash(`Findings (${debrief.findings.length})`));
    for (const f of debrief.findings) {
      const when = `+${clockFromArrest(f.startSec)} – +${clockFromArrest(f.endSec)}`;
      expect(text).toContain(squash(when));
      expect(text).toContain(squash(findingKindLabels[f.kind] ?? f.kind));
    }
    const listed = (e: Pick<DebriefEvent, 'kind' | 'data'>) =>
      squash(`${eventKindLabels[e.kind] ?? e.kind}${eventDetails(e.kind, e.data)}`);
    for (const e of debriefEventsInForce(debrief).filter((x) => x.kind !== 'correction')) {
      const stored = debrief.events.find((x) => x.id === e.id);
      // A replacement is listed on its correction's row; an original event on its own.
      expect(text).toContain(squash(`+${clockFromArrest(e.tSec)}`));
      if (stored?.kind === e.kind) expect(text).toContain(listed(e));
    }

    // FHIR: a Procedure per shock and a MedicationAdministration per drug in force, CPR period.
    const fhir = (
      await t
        .http()
        .get(`${url}/fhir`)
        .set(...set)
        .expect(200)
    ).body as {
      entry: { resource: Record<string, unknown> }[];
    };
    const resources = fhir.entry.map((e) => e.resource);
    const shocks = resources.filter(
      (r) => r.resourceType === 'Procedure' && JSON.stringify(r.code).includes('"shock"'),
    );
    expect(shocks.map((r) => r.performedDateTime)).toEqual(
      debriefEventsInForce(debrief)
        .filter((e) => e.kind === 'shock')
        .map((e) => e.at),
    );
    expect(shocks.map((r) => (r.note as { text: string }[])[0].text)).toEqual(['150 J']);
    const drugs = resources.filter((r) => r.resourceType === 'MedicationAdministration');
    expect(drugs.map((r) => r.effectiveDateTime)).toEqual(
      debriefEventsInForce(debrief)
        .filter((e) => e.kind === 'drug')
        .map((e) => e.at),
    );
    const cpr = debrief.measures.compressionIntervals ?? [];
    const at = (s: number) =>
      new Date(Date.parse(debrief.record.arrestAt) + s * 1000).toISOString();
    expect(JSON.stringify(resources)).toContain(
      JSON.stringify({ start: at(cpr[0].startSec), end: at(cpr[cpr.length - 1].endSec) }),
    );
  });

  it('for every signed demo record, the committee row and the debrief agree', async () => {
    await seedDemoRecords(t.db);
    const signed = await t
      .db('resuscitations as r')
      .join('recordSummaries as s', 's.resuscitationId', 'r.id')
      .where('r.status', 'signed')
      .where('r.deviceId', 'demo-generator')
      .select(
        'r.id',
        's.compressionFraction',
        's.longestPauseSec',
        's.medianEtco2',
        's.findingCounts',
      );
    expect(signed.length).toBeGreaterThanOrEqual(30);
    const set = ['Authorization', `Bearer ${await t.tokenFor('quality')}`] as const;
    for (const row of signed) {
      const res = await t
        .http()
        .get(`/api/resuscitations/${row.id}/debrief`)
        .set(...set);
      expect(res.status).toBe(200);
      const d = res.body as Debrief;
      const counts: Record<string, number> = {};
      for (const f of d.findings) counts[f.kind] = (counts[f.kind] ?? 0) + 1;
      const fromRow = Object.fromEntries(
        Object.entries(row.findingCounts as Record<string, number>).filter(([, n]) => n > 0),
      );
      expect({ id: row.id, counts: fromRow }).toEqual({ id: row.id, counts });
      const close = (a: number | null, b: number | null) =>
        a === null || b === null ? a === b : Math.abs(Number(a) - b) < 1e-9;
      expect([row.id, close(row.compressionFraction, d.measures.compressionFraction)]).toEqual([
        row.id,
        true,
      ]);
      expect([row.id, close(row.longestPauseSec, d.measures.longestPauseSec)]).toEqual([
        row.id,
        true,
      ]);
      expect([row.id, close(row.medianEtco2, d.measures.etco2.medianMmHg)]).toEqual([row.id, true]);
    }
  });
});
