import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { recordWithFindings } from './debrief-fixtures';
import { anEtco2, anEvent } from './factories';
import { horizontalStrokes, isStruck, type PlacedWord, placedWords } from './pdf-geometry';
import { startTestApp, type TestApp } from './test-app';

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'upstroke-pdf-corr-'));

/** The words of the printed row that holds `marker`, left to right. */
function rowOf(words: PlacedWord[], marker: (w: PlacedWord) => boolean): PlacedWord[] {
  const anchor = words.find(marker);
  if (!anchor) throw new Error('row not found');
  return words
    .filter((w) => w.page === anchor.page && Math.abs(w.yMin - anchor.yMin) < 2)
    .sort((a, b) => a.xMin - b.xMin);
}

describe('PDF report: corrected and undone entries', () => {
  let t: TestApp;
  let file: string;
  beforeAll(async () => {
    t = await startTestApp();
    const lead = await t.tokenFor('lead');
    const set = ['Authorization', `Bearer ${lead}`] as const;
    const { url } = await recordWithFindings(t, lead, true);
    // A typed 81 mmHg taken back by Live's Undo; a 150 J shock corrected to 360 J; a note
    // undone. Invented values.
    const wrong = anEtco2(90, 81);
    const kept = anEtco2(95, 17);
    const shock = anEvent('shock', 300, { energyJ: 150 });
    const note = anEvent('note', 310, { text: 'Family arrived at the bedside' });
    const events = [
      shock,
      note,
      anEvent('correction', 91, { supersedes: wrong.id, reason: 'Undo on the Live screen' }),
      anEvent('correction', 320, {
        supersedes: shock.id,
        reason: 'Energy read from the defibrillator log',
        replacement: { kind: 'shock', data: { energyJ: 360 }, at: shock.at },
      }),
      anEvent('correction', 330, { supersedes: note.id, reason: 'Undo on the Live screen' }),
    ];
    await t
      .http()
      .post(`${url}/etco2/batch`)
      .set(...set)
      .send({ samples: [wrong, kept] })
      .expect(201);
    await t
      .http()
      .post(`${url}/events/batch`)
      .set(...set)
      .send({ events })
      .expect(201);
    const res = await t
      .http()
      .get(`${url}/report.pdf`)
      .set(...set)
      .buffer(true)
      .parse((r, cb) => {
        const parts: Buffer[] = [];
        r.on('data', (c: Buffer) => parts.push(c));
        r.on('end', () => cb(null, Buffer.concat(parts)));
      });
    expect(res.status).toBe(200);
    file = path.join(tmp, 'record.pdf');
    fs.writeFileSync(file, res.body as Buffer);
  });
  afterAll(async () => {
    await t.close();
    fs.rmSync(tmp, { recursive: true, force: true });
  });

  it('lists the undone EtCO2 value and the replaced shock, struck through with their status', () => {
    const words = placedWords(file);
    const strokes = horizontalStrokes(file);
    const undone = rowOf(words, (w) => w.text === '81');
    const text = undone.map((w) => w.text).join(' ');
    expect(text).toMatch(/^\+1:30 \S+ EtCO2 81 mmHg \(typed\) undone$/);
    // Every cell but the status is struck; the status stays legible to say why.
    for (const w of undone.slice(0, -1))
      expect([w.text, isStruck(w, strokes)]).toEqual([w.text, true]);
    expect(isStruck(undone[undone.length - 1], strokes)).toBe(false);

    const kept = rowOf(words, (w) => w.text === '17');
    expect(kept.map((w) => w.text).join(' ')).toMatch(/EtCO2 17 mmHg \(typed\)$/);
    expect(kept.some((w) => isStruck(w, strokes))).toBe(false);

    const old = rowOf(words, (w) => w.text === '150');
    expect(old.map((w) => w.text).join(' ')).toMatch(/Shock 150 J corrected later$/);
    expect(isStruck(old.find((w) => w.text === '150') as PlacedWord, strokes)).toBe(true);
    const note = rowOf(words, (w) => w.text === 'Family');
    expect(note.map((w) => w.text).join(' ')).toMatch(/Note Family arrived at the bedside undone$/);
    expect(isStruck(note.find((w) => w.text === 'Family') as PlacedWord, strokes)).toBe(true);
  });

  // The fixture's ten typed values and the two above.
  it('says what each correction did, and counts the typed values beside the events', () => {
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('Undoes EtCO2 81 mmHg — Undo on the Live screen');
    expect(text).toContain('Replaces Shock: 150 J with Shock: 360 J at');
    expect(text).toMatch(/Entries in time order \(16 events, 12 typed EtCO2 values\)/);
    expect(text).toContain('Undoes Note: Family arrived at the bedside — Undo on the Live screen');
  });

  it('names the ROSC band and the data-gap band in the chart legend', () => {
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('ROSC (patient state)');
    expect(text).toContain('Data gap: no capnogram stored (never a finding)');
    expect(text).toContain('Compressions on');
  });
});
