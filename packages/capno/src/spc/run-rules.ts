import type { ControlPoint, Signal } from './types.js';

/**
 * Run rules for a control chart. Rule set and source: Western Electric Statistical Quality
 * Control Handbook (1956) and Nelson 1984, J Qual Technol 16:237 (both from memory).
 * We use the two rules recommended for healthcare charts by Benneyan, Lloyd & Plsek 2003,
 * Qual Saf Health Care 12:458 (summary):
 *  - 'beyond-limits' (Nelson rule 1): a point above the upper or below the lower 3-sigma limit;
 *  - 'run-of-8' (Nelson rule 2): 8 consecutive points on the same side of the centre line.
 * A gap (no data) neither counts toward a run nor breaks it; a point exactly on the centre
 * line breaks a run (common practice).
 */
export const RUN_LENGTH = 8;

/**
 * Differences within a few parts in a billion are rounding (a mean of twelve equal 0.1s is
 * 0.09999999999999999), never a signal: a point that close to a limit or the centre is on it.
 */
function beyond(value: number, ref: number): number {
  const tolerance = 1e-9 * Math.max(1, Math.abs(ref));
  return Math.abs(value - ref) <= tolerance ? 0 : Math.sign(value - ref);
}

export function beyondLimits(points: ControlPoint[], periodName = 'points'): Signal[] {
  const one = periodName.replace(/s$/, '');
  const signals: Signal[] = [];
  for (const p of points) {
    if (p.value === null) continue;
    const above = p.upper !== null && beyond(p.value, p.upper) > 0;
    const below = p.lower !== null && beyond(p.value, p.lower) < 0;
    if (!above && !below) continue;
    signals.push({
      rule: 'beyond-limits',
      at: p.index,
      indices: [p.index],
      explanation:
        `This ${one} is ${above ? 'above the upper' : 'below the lower'} control limit: ` +
        'a change this large is unlikely to be chance alone.',
    });
  }
  return signals;
}

/** One signal per run of 8 or more, firing at the 8th point and listing the whole run. */
export function runOfEight(
  points: ControlPoint[],
  centre: number,
  periodName = 'points',
): Signal[] {
  const signals: Signal[] = [];
  let run: number[] = [];
  let side = 0;
  const close = () => {
    if (run.length >= RUN_LENGTH) signals.push(runSignal(run, side, periodName));
    run = [];
  };
  for (const p of points) {
    if (p.value === null) continue;
    const s = beyond(p.value, centre);
    if (s !== side || s === 0) close();
    side = s;
    if (s !== 0) run.push(p.index);
  }
  close();
  return signals;
}

function runSignal(run: number[], side: number, periodName: string): Signal {
  const where = side > 0 ? 'above' : 'below';
  return {
    rule: 'run-of-8',
    at: run[RUN_LENGTH - 1]!,
    indices: run,
    explanation:
      `${run.length} ${periodName} in a row ${where} the centre line: ` +
      'a sustained shift, not chance alone.',
  };
}

/** Both rules, ordered by the point they fire at. */
export function runRules(
  points: ControlPoint[],
  centre: number | null,
  periodName?: string,
): Signal[] {
  if (centre === null) return [];
  const all = [...beyondLimits(points, periodName), ...runOfEight(points, centre, periodName)];
  return all.sort((a, b) => a.at - b.at);
}
