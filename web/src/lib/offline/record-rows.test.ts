import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createOfflineDb, type OfflineDb } from './db';
import { mergeRemoteEntries } from './pull';
import { recordEtco2, recordEvent, startResuscitation } from './record';
import { appendOnlyReader } from './record-rows';

const siteId = '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a01';
const at = (sec: number) => new Date(Date.UTC(2026, 0, 1, 0, 0, sec)).toISOString();

let db: OfflineDb;
beforeEach(() => {
  db = createOfflineDb(`rows-${crypto.randomUUID()}`);
});
afterEach(async () => {
  await db.delete();
});

/** Everything the store holds for the record, read the plain way (the reference). */
const fullRead = (id: string) =>
  db.events.where('[resuscitationId+at]').between([id, ''], [id, '\uffff']).toArray();

describe('reading only what a commit added', () => {
  it('keeps the rows it holds and reads the new ones after a later tap and an undo', async () => {
    const rec = await startResuscitation({ siteId }, db);
    await recordEvent(rec.id, 'compressions-start', {}, { db, at: at(10) });
    await recordEvent(rec.id, 'shock', { energyJ: 200 }, { db, at: at(20) });
    const read = appendOnlyReader(db.events, rec.id);
    const first = await read();
    expect(first.map((e) => e.kind)).toEqual(['compressions-start', 'shock']);

    const rosc = await recordEvent(rec.id, 'rosc', {}, { db, at: at(30) });
    await recordEvent(rec.id, 'correction', { supersedes: rosc.id }, { db, at: at(31) });
    const second = await read();
    expect(second).toEqual(await fullRead(rec.id));
    expect(second.map((e) => e.kind)).toEqual([
      'compressions-start',
      'shock',
      'rosc',
      'correction',
    ]);
    // Rows before the latest time held are not read again: the very same objects (a read
    // makes new ones); the row at that time is read again with the new ones.
    expect(second[0]).toBe(first[0]);
    expect(second[1]).not.toBe(first[1]);
    // Nothing new: the same array, so the screen does not draw again.
    expect(await read()).toBe(second);
  });

  it("brings in another tablet's entry pushed late with an earlier time, in time order", async () => {
    const rec = await startResuscitation({ siteId }, db);
    await recordEvent(rec.id, 'compressions-start', {}, { db, at: at(10) });
    await recordEvent(rec.id, 'shock', { energyJ: 200 }, { db, at: at(40) });
    const read = appendOnlyReader(db.events, rec.id);
    await read();
    const theirs = {
      id: crypto.randomUUID(),
      at: at(25),
      kind: 'drug' as const,
      data: { drug: 'epinephrine' as const, dose: 1, unit: 'mg' as const },
      deviceId: 'tablet-b',
    };
    expect(await mergeRemoteEntries(db, rec.id, { events: [theirs], etco2: [] })).toBe(1);
    const rows = await read();
    expect(rows.map((e) => e.id)).toContain(theirs.id);
    expect(rows).toEqual(await fullRead(rec.id));
    expect(rows.map((e) => e.at)).toEqual([at(10), at(25), at(40)]);
  });

  it('reads an entry stamped at the same time as the latest one held', async () => {
    const rec = await startResuscitation({ siteId }, db);
    await recordEvent(rec.id, 'shock', { energyJ: 150 }, { db, at: at(20) });
    const read = appendOnlyReader(db.events, rec.id);
    await read();
    await recordEvent(rec.id, 'note', { text: 'same second' }, { db, at: at(20) });
    const rows = await read();
    expect(rows).toEqual(await fullRead(rec.id));
    expect(rows).toHaveLength(2);
  });

  it('reads typed EtCO2 values the same way, a value typed for an earlier moment included', async () => {
    const rec = await startResuscitation({ siteId }, db);
    await recordEtco2(rec.id, 18, 'mmHg', { db, at: at(60) });
    const read = appendOnlyReader(db.etco2, rec.id);
    expect(await read()).toHaveLength(1);
    await recordEtco2(rec.id, 12, 'mmHg', { db, at: at(30) });
    await recordEtco2(rec.id, 22, 'mmHg', { db, at: at(90) });
    expect((await read()).map((v) => v.value)).toEqual([12, 18, 22]);
  });

  it('keeps each record apart', async () => {
    const a = await startResuscitation({ siteId }, db);
    const b = await startResuscitation({ siteId }, db);
    await recordEvent(a.id, 'rosc', {}, { db, at: at(5) });
    const read = appendOnlyReader(db.events, a.id);
    await read();
    await recordEvent(b.id, 'shock', { energyJ: 200 }, { db, at: at(50) });
    expect((await read()).map((e) => e.resuscitationId)).toEqual([a.id]);
  });
});
