import { synthCapnogram } from '@upstroke/capno';

export interface FileOptions {
  /** The monitor clock's time of the first row. */
  startIso: string;
  durationSec: number;
  sampleRateHz: number;
  /** Seconds on the monitor clock from the first row with a `shock` marker. */
  shocksSec?: number[];
  seed?: number;
}

/**
 * A monitor CSV in the CONTRACT.md import format, from capno's synthetic capnogram
 * (invented data): ISO times with offset, `# unit=mmHg`, an `event` column.
 */
export function monitorCsv(o: FileOptions): string {
  const cap = synthCapnogram({
    seed: o.seed ?? 7,
    durationSec: o.durationSec,
    sampleRateHz: o.sampleRateHz,
    levels: [[0, 22]],
    noiseMmHg: 0.2,
  });
  const t0 = Date.parse(o.startIso);
  const shockRows = new Set((o.shocksSec ?? []).map((s) => Math.round(s * o.sampleRateHz)));
  const lines = ['# unit=mmHg', 'time,co2,event'];
  for (let i = 0; i < cap.values.length; i++) {
    const at = new Date(t0 + (i * 1000) / o.sampleRateHz).toISOString();
    lines.push(`${at},${cap.values[i].toFixed(2)},${shockRows.has(i) ? 'shock' : ''}`);
  }
  return lines.join('\n') + '\n';
}
