import { randomUUID } from 'node:crypto';
import { createKnex, type Db } from '../src/db/knex';
import { ClinicalDataRepository } from '../src/modules/resuscitations/clinical-data.repository';
import { ClinicalRecordsService } from '../src/modules/resuscitations/clinical-records.service';
import { EntriesRepository } from '../src/modules/resuscitations/entries.repository';
import { ResuscitationsRepository } from '../src/modules/resuscitations/resuscitations.repository';
import { SummariesRepository } from '../src/modules/summaries/summaries.repository';
import { SummariesService } from '../src/modules/summaries/summaries.service';
import { aResuscitation, anEtco2, anEvent } from './factories';
import { demoUsers, resetDatabase } from './test-app';

interface TestDb {
  db: Db;
}

/** Writes a record straight into the store with its events and EtCO2 values. */
async function storeRecord(t: TestDb, overrides: Record<string, unknown> = {}) {
  const rec = aResuscitation(overrides);
  // Clinical data goes in before signing: the lock refuses plain inserts afterwards.
  await t.db('resuscitations').insert({ ...rec, status: 'closed' });
  const events = [
    anEvent('arrest', 0, { witnessed: true, monitored: false }),
    anEvent('compressions-start', 10),
    anEvent('rhythm', 20, { rhythm: 'vf' }),
    anEvent('compressions-stop', 100),
    anEvent('shock', 115, { energyJ: 200 }),
    anEvent('compressions-start', 118),
    anEvent('drug', 300, { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' }),
    anEvent('compressions-stop', 580),
    anEvent('rosc', 590),
    anEvent('end', 600, { reason: 'transferred' }),
  ].map((e) => ({ ...e, resuscitationId: rec.id }));
  await t
    .db('resuscitationEvents')
    .insert(events.map((e) => ({ ...e, data: JSON.stringify(e.data) })));
  const etco2 = [anEtco2(60, 8), anEtco2(180, 15), anEtco2(400, 25)].map((s) => ({
    ...s,
    resuscitationId: rec.id,
    valueMmhg: s.value,
  }));
  await t.db('etco2Samples').insert(etco2);
  await t
    .db('resuscitations')
    .where({ id: rec.id })
    .update({ status: 'signed', signedAt: new Date() });
  return rec;
}

describe('per-record summary rows', () => {
  // The service alone on the test database: no HTTP routes of its own to go through.
  const t: TestDb = { db: createKnex(process.env.DATABASE_URL as string) };
  const service = new SummariesService(
    new ClinicalRecordsService(
      new ResuscitationsRepository(t.db),
      new ClinicalDataRepository(t.db),
      new EntriesRepository(t.db),
    ),
    new SummariesRepository(t.db),
  );
  beforeAll(() => resetDatabase(t.db));
  afterAll(() => t.db.destroy());

  it('writes one row from the record, its events, EtCO2 and profile', async () => {
    const rec = await storeRecord(t);
    await service.write(rec.id);
    const row = await t.db('recordSummaries').where({ resuscitationId: rec.id }).first();
    expect(row).toMatchObject({
      siteId: rec.siteId,
      unitId: rec.unitId,
      firstRhythm: 'vf',
      shockable: true, // VF is a shockable rhythm (AHA/ERC ALS algorithms)
      witnessed: true,
      monitored: false,
      anyRosc: true,
      etco2Documented: true,
      timeToFirstCompressionSec: 10,
      timeToFirstShockSec: 115,
      timeToFirstEpinephrineSec: 300,
      preshockLongCount: 1, // 15 s before the shock > the 10 s default (Cheskes 2011)
      profileVersion: 1, // no profile on the record: the site's latest (v1)
    });
    // Compression time (10–100 s and 118–580 s) over time without circulation (0–590 s).
    expect(row.compressionFraction).toBeCloseTo((90 + 462) / 590, 6);
    expect(row.findingCounts['preshock-pause-long']).toBe(1);
  });

  it('rewrites the same row on amendment instead of adding one', async () => {
    const rec = await storeRecord(t);
    await service.write(rec.id);
    // An amendment: its row and the changed closing details in one transaction.
    await t.db.transaction(async (trx) => {
      await trx('amendments').insert({
        id: randomUUID(),
        resuscitationId: rec.id,
        reason: 'First rhythm corrected from the monitor strip',
        createdBy: demoUsers.find((u) => u.role === 'lead')?.id,
      });
      await trx('resuscitations').where({ id: rec.id }).update({ firstRhythm: 'pea' });
      await service.write(rec.id, trx);
    });
    const rows = await t.db('recordSummaries').where({ resuscitationId: rec.id });
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ firstRhythm: 'pea', shockable: false });
  });

  it('writes inside the caller transaction and rolls back with it', async () => {
    const rec = await storeRecord(t);
    await expect(
      t.db.transaction(async (trx) => {
        await service.write(rec.id, trx);
        expect(await trx('recordSummaries').where({ resuscitationId: rec.id })).toHaveLength(1);
        throw new Error('abort');
      }),
    ).rejects.toThrow('abort');
    expect(await t.db('recordSummaries').where({ resuscitationId: rec.id })).toHaveLength(0);
  });

  it('reports an unknown record as not found', async () => {
    await expect(service.write('00000000-0000-4000-8000-000000000000')).rejects.toMatchObject({
      status: 404,
    });
  });
});
