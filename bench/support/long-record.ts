import { randomUUID } from 'node:crypto';
import {
  type DebriefHeader,
  type StoredEvent,
  type StoredRecord,
  type StoredWaveformChunk,
  synthCapnogram,
} from '@upstroke/capno';
import { type Debrief, defaultDisplayFormat } from '@upstroke/contracts';

const ARREST = Date.parse('2026-03-04T10:00:00.000Z');
const at = (sec: number) => new Date(ARREST + sec * 1000);

/** An invented 60-minute code with `count` events, EtCO2 every 30 s and a 50 Hz capnogram. */
export function longRecordParts(
  minutes = 60,
  count = 400,
): { stored: StoredRecord; header: DebriefHeader } {
  const rid = randomUUID();
  const events: StoredEvent[] = [];
  const push = (sec: number, kind: string, data: Record<string, unknown> = {}) =>
    events.push({ id: randomUUID(), at: at(sec).toISOString(), kind, data, recordedBy: null });
  push(0, 'arrest', { witnessed: true, monitored: true });
  push(8, 'compressions-start');
  const cycles = Math.floor((minutes * 60) / 120);
  for (let c = 0; c < cycles; c++) {
    const t = 8 + c * 120;
    push(t + 110, 'compressions-stop');
    push(t + 112, 'rhythm', { rhythm: c % 3 === 2 ? 'pea' : 'vf' });
    push(t + 114, 'pulse', { present: false });
    if (c % 3 !== 2) push(t + 118, 'shock', { energyJ: 200 });
    push(t + 121, 'compressions-start');
    if (c % 2 === 1)
      push(t + 60, 'drug', { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' });
  }
  for (let i = 0; events.length < count - 1; i++)
    push(30 + ((i * 37) % (minutes * 60 - 60)), 'note', {
      text: `Team note ${i + 1}: compressor changed, depth checked`,
    });
  events.sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  push(minutes * 60, 'end', { reason: 'terminated' });
  const etco2 = Array.from({ length: minutes * 2 }, (_, i) => ({
    at: at(15 + i * 30).toISOString(),
    value: 8 + ((i * 7) % 15),
    unit: 'mmHg' as const,
    source: 'manual',
  }));
  const rate = 50;
  const s = synthCapnogram({
    seed: 11,
    durationSec: minutes * 60,
    sampleRateHz: rate,
    levels: [
      [0, 9],
      [minutes * 60, 22],
    ],
    compressions: [[0, minutes * 60]],
  });
  const chunks: StoredWaveformChunk[] = [];
  for (let k = 0; k < s.values.length; k += rate * 10) {
    chunks.push({
      startAt: at(k / rate).toISOString(),
      sampleRateHz: rate,
      unit: 'mmHg',
      values: Float32Array.from(s.values.slice(k, k + rate * 10)),
      source: 'stream',
    });
  }
  const record: Debrief['record'] = {
    id: rid,
    siteId: randomUUID(),
    unitId: null,
    arrestAt: at(0).toISOString(),
    location: 'ICU North, bed 7',
    patientRef: 'MRN-BENCH-0001',
    ageGroup: 'adult',
    weightKg: 80,
    status: 'signed',
    display: defaultDisplayFormat,
    witnessed: true,
    monitored: true,
    firstRhythm: 'vf',
    outcome: 'died',
    endReason: 'terminated',
    notesWentWell: 'Clear roles; early defibrillation; compressor swaps every two minutes.',
    notesToChange: 'Charge the defibrillator during compressions to shorten pre-shock pauses.',
    createdBy: null,
    createdAt: at(0).toISOString(),
    signedAt: at(minutes * 60 + 900).toISOString(),
    signedBy: null,
    siteName: 'Kestrel Bay Regional Hospital',
    unitName: 'ICU North',
    paperSize: 'A4',
    etco2Unit: 'mmHg',
    createdByName: 'Recorder (bench)',
    signedByName: 'Lead (bench)',
  };
  const amendments = [
    {
      id: randomUUID(),
      resuscitationId: rid,
      reason: 'Second shock energy corrected after reading the defibrillator log',
      fields: { outcome: 'died' },
      eventIds: [],
      createdBy: 'bench',
      createdByName: 'Lead (bench)',
      createdAt: at(minutes * 60 + 3600).toISOString(),
    },
  ];
  const stored: StoredRecord = {
    id: rid,
    siteId: record.siteId,
    unitId: null,
    arrestAt: record.arrestAt,
    events,
    etco2,
    waveform: chunks,
  };
  return { stored, header: { record, amendments, computedBy: 'server' } };
}
