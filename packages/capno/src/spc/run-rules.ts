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

export function beyondLimits(points: ControlPoint[], periodName = 'points'): Signal[] {
  const one = periodName.replace(/s$/, '');
  const signals: Signal[] = [];
  for (const p of points) {
    if (p.value === null) continue;
    const above = p.upper !== null && p.value > p.upper;
    const below = p.lower !== null && p.value < p.lower;
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
    const s = Math.sign(p.value - centre);
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
