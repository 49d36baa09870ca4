import { bicarbonateFactor } from '@upstroke/capno';
import type { CprScript } from './cpr-script';
import type { Rand } from './random';

/** One EtCO2 value as typed from the monitor, in seconds from the arrest. */
export interface ScriptEtco2 {
  tSec: number;
  mmHg: number;
}

/**
 * EtCO2 typed every 1–2 minutes during compressions. Levels (invented, shaped after
 * REFERENCE.md): good CPR ~20–30 mmHg, poor CPR < 10 mmHg (AHA 2020; Meaney 2013); an
 * abrupt rise of 10+ mmHg before ROSC and 35–45 mmHg after (Pokorná 2010; common
 * practice); sodium bicarbonate roughly doubles it for minutes (Roh 2024).
 */
export function etco2Script(r: Rand, s: CprScript): ScriptEtco2[] {
  // Some poor codes have no EtCO2 written down at all (a process measure the audit counts).
  if (r.chance(s.quality === 'poor' ? 0.2 : 0.03)) return [];
  const level =
    s.quality === 'good' ? clamp(r.normal(25, 3.5), 18, 34) : clamp(r.normal(8, 2.5), 3, 13);
  const out: ScriptEtco2[] = [];
  for (const [start, end] of s.compressions) {
    for (let t = start + r.int(20, 60); t < end; t += r.int(60, 120)) {
      out.push({ tSec: t, mmHg: valueAt(r, s, level, t) });
    }
  }
  if (s.bicarbonateSec !== null) {
    for (const dt of [40, 90]) {
      const t = s.bicarbonateSec + dt;
      if (inCompressions(s, t)) out.push({ tSec: t, mmHg: valueAt(r, s, level, t) });
    }
  }
  if (s.roscSec !== null) {
    // The rise that prompted the pulse check, then values with a circulation.
    out.push({ tSec: s.roscSec - 25, mmHg: round(level + r.normal(16, 2)) });
    for (let t = s.roscSec + 60; t < s.roscSec + 600 && t < s.endSec; t += r.int(60, 120)) {
      if (!inCompressions(s, t)) out.push({ tSec: t, mmHg: round(r.normal(40, 3)) });
    }
  }
  return out.sort((a, b) => a.tSec - b.tSec);
}

function valueAt(r: Rand, s: CprScript, level: number, t: number): number {
  const factor = s.bicarbonateSec === null ? 1 : bicarbonateFactor(t - s.bicarbonateSec);
  return round(Math.max(1, (level + r.normal(0, 2.5)) * factor));
}

function inCompressions(s: CprScript, t: number): boolean {
  return s.compressions.some(([a, b]) => t >= a && t < b);
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));
const round = (v: number) => Math.max(0, Math.round(v));
