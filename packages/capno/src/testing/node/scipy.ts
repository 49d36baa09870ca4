import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';

export const SCIPY_SCRIPT = resolve(__dirname, '../../../scripts/scipy_breaths.py');

/** The first python with SciPy: `python3` on PATH, then Debian's /usr/bin/python3. */
export function findScipyPython(): string | null {
  for (const py of ['python3', '/usr/bin/python3']) {
    const r = spawnSync(py, ['-c', 'import scipy.signal'], { encoding: 'utf8' });
    if (r.status === 0) return py;
  }
  return null;
}

export interface ScipyResult {
  breaths: { tSec: number; etco2MmHg: number }[];
  computeSec: number;
  /** Median CPU time of the process per run (what a run costs, whatever the machine's load). */
  cpuSec: number;
  /** Every run's wall and CPU seconds, in order. */
  runsSec: number[];
  cpuRunsSec: number[];
}

/** Runs scripts/scipy_breaths.py on a signal (mmHg) and returns its breaths. */
export function scipyBreaths(
  python: string,
  values: ArrayLike<number>,
  sampleRateHz: number,
  repeat = 1,
): ScipyResult {
  const input = JSON.stringify({ values: Array.from(values), sampleRateHz, repeat });
  const r = spawnSync(python, [SCIPY_SCRIPT], { input, encoding: 'utf8', maxBuffer: 1 << 28 });
  if (r.status !== 0) throw new Error(`scipy_breaths.py failed: ${r.stderr}`);
  return JSON.parse(r.stdout) as ScipyResult;
}
