import type { Rhythm } from '@upstroke/contracts';
import type { Rand } from './random';

/** One event of the script, in seconds from the arrest. */
export interface ScriptEvent {
  tSec: number;
  kind: string;
  data: Record<string, unknown>;
}

export type Outcome = 'rosc-sustained' | 'rosc-not-sustained' | 'died' | 'transferred';

/** How one invented code goes: the plan drawn first, then played out cycle by cycle. */
export interface CprScript {
  quality: 'good' | 'poor';
  firstRhythm: Rhythm;
  witnessed: boolean;
  monitored: boolean;
  outcome: Outcome;
  events: ScriptEvent[];
  /** Compressions on, as [start, end] seconds: EtCO2 is typed from the monitor during these. */
  compressions: [number, number][];
  roscSec: number | null;
  bicarbonateSec: number | null;
  endSec: number;
}

const shockableRhythms: Rhythm[] = ['vf', 'pvt'];

/** ROSC more often with a shockable rhythm and good CPR (direction only; invented rates). */
function drawOutcome(r: Rand, shockable: boolean, good: boolean): Outcome {
  const pRosc = (shockable ? 0.6 : 0.35) + (good ? 0.1 : -0.1);
  if (!r.chance(pRosc)) return r.chance(0.06) ? 'transferred' : 'died';
  return r.chance(0.65) ? 'rosc-sustained' : 'rosc-not-sustained';
}

class Builder {
  events: ScriptEvent[] = [];
  compressions: [number, number][] = [];
  onSince: number | null = null;

  add(tSec: number, kind: string, data: Record<string, unknown> = {}): void {
    this.events.push({ tSec, kind, data });
  }

  start(t: number): void {
    this.add(t, 'compressions-start');
    this.onSince = t;
  }

  stop(t: number): void {
    if (this.onSince === null) return;
    this.add(t, 'compressions-stop');
    this.compressions.push([this.onSince, t]);
    this.onSince = null;
  }
}

export interface ScriptOptions {
  /** Give this record a sodium bicarbonate dose (an EtCO2 rise that is not ROSC). */
  bicarbonate?: boolean;
  /** Fixes the quality instead of the draw (the draw is still made, so later draws match). */
  quality?: 'good' | 'poor';
}

/** Plays out one resuscitation: 2-minute cycles, checks, shocks, drugs, airway, outcome. */
export function cprScript(r: Rand, options: ScriptOptions = {}): CprScript {
  const drawn = r.chance(0.55);
  const good = options.quality ? options.quality === 'good' : drawn;
  const shockable = r.chance(0.25); // in-hospital: most first rhythms are non-shockable
  const firstRhythm = shockable ? r.pick(shockableRhythms) : r.chance(0.55) ? 'pea' : 'asystole';
  const s = {
    quality: good ? 'good' : 'poor',
    firstRhythm,
    witnessed: r.chance(0.7),
    monitored: r.chance(0.45),
    outcome: drawOutcome(r, shockable, good),
  } as const;
  const b = new Builder();
  b.add(0, 'arrest', { witnessed: s.witnessed, monitored: s.monitored });
  const tCpr = good ? r.int(5, 30) : r.int(30, 120);
  b.add(Math.max(1, tCpr - 2), 'airway', { device: 'bag-mask' });
  b.start(tCpr);
  b.add(r.int(60, 240), 'access', { route: r.chance(0.8) ? 'iv' : 'io' });
  const played = playCycles(r, b, { good, firstRhythm, tCpr, outcome: s.outcome, ...options });
  b.events.sort((x, y) => x.tSec - y.tSec);
  return { ...s, ...played, events: b.events, compressions: b.compressions };
}

interface CycleState {
  good: boolean;
  firstRhythm: Rhythm;
  tCpr: number;
  outcome: Outcome;
  bicarbonate?: boolean;
}

/** The cycle loop: returns when ROSC, termination or transfer ends the record. */
function playCycles(r: Rand, b: Builder, c: CycleState) {
  const shockable = shockableRhythms.includes(c.firstRhythm);
  const rosc = c.outcome === 'rosc-sustained' || c.outcome === 'rosc-not-sustained';
  const cycles = r.int(3, 12);
  const roscCycle = rosc ? r.int(2, cycles - 1) : -1;
  const airwayCycle = r.int(1, 3);
  const bicarbCycle = c.bicarbonate ? Math.min(2, cycles - 1) : -1;
  let nextEpi = shockable ? Infinity : c.good ? r.int(60, 240) : r.int(300, 700);
  let shocks = 0;
  let t = c.tCpr + r.int(20, 60); // pads on, first look at the rhythm
  let rhythm: Rhythm = c.firstRhythm;
  let bicarbonateSec: number | null = null;
  for (let cycle = 0; cycle < cycles; cycle++) {
    for (; nextEpi < t - 5; nextEpi += c.good ? r.int(180, 300) : r.int(150, 480)) {
      b.add(nextEpi, 'drug', { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' });
    }
    if (cycle === airwayCycle) advancedAirway(r, b, c.good, t - r.int(40, 70));
    if (cycle === bicarbCycle) {
      bicarbonateSec = t - 80;
      b.add(bicarbonateSec, 'drug', { drug: 'sodium-bicarbonate', dose: 50, unit: 'mmol' });
    }
    const since = b.onSince ?? t;
    if (!c.good && cycle !== airwayCycle && r.chance(0.6) && t - since > 80) {
      unexplainedPause(r, b, t - 60);
    }
    b.stop(t);
    if (cycle > 0 && rhythm !== 'organised') rhythm = evolve(r, rhythm);
    if (cycle === roscCycle) return { ...roscAndAfter(r, b, c, t), bicarbonateSec };
    b.add(t + 2, 'rhythm', { rhythm });
    let resume = t + (c.good ? r.int(5, 9) : r.int(12, 30));
    if (shockableRhythms.includes(rhythm)) {
      const shockAt = t + (c.good ? r.int(3, 8) : r.int(11, 25));
      b.add(shockAt, 'shock', { energyJ: shocks === 0 ? 150 : 200 });
      shocks++;
      if (shocks === 3) {
        nextEpi = Math.min(nextEpi, shockAt + (c.good ? r.int(20, 90) : r.int(200, 400)));
        b.add(shockAt + r.int(30, 60), 'drug', { drug: 'amiodarone', dose: 300, unit: 'mg' });
      }
      resume = shockAt + r.int(1, 4);
    }
    b.start(resume);
    t = resume + 120 + (c.good ? r.int(-5, 10) : r.int(0, 60));
  }
  b.stop(t);
  b.add(t + 5, 'end', { reason: c.outcome === 'transferred' ? 'transferred' : 'terminated' });
  return { roscSec: null, bicarbonateSec, endSec: t + 5 };
}

function evolve(r: Rand, rhythm: Rhythm): Rhythm {
  if (shockableRhythms.includes(rhythm)) return r.chance(0.75) ? rhythm : 'asystole';
  return r.chance(0.8) ? rhythm : rhythm === 'pea' ? 'asystole' : 'pea';
}

function advancedAirway(r: Rand, b: Builder, good: boolean, at: number): void {
  const device = r.chance(0.6) ? 'tracheal-tube' : 'supraglottic';
  const confirmation = good || r.chance(0.5) ? 'waveform-capnography' : 'none';
  if (!good) {
    // Poor practice: compressions held while the tube goes in.
    b.stop(at - 2);
    b.add(at, 'airway', { device, confirmation });
    b.start(at + r.int(15, 30));
  } else {
    b.add(at, 'airway', { device, confirmation });
  }
  if (!good && r.chance(0.5)) b.add(at + 60, 'ventilation', { ratePerMin: r.int(18, 28) });
}

function unexplainedPause(r: Rand, b: Builder, at: number): void {
  b.stop(at);
  b.start(at + r.int(12, 30));
}

/**
 * ROSC at a rhythm check; sustained codes are recorded until ROSC has lasted the Utstein
 * 20 min (Nolan 2019), others re-arrest and are stopped.
 */
function roscAndAfter(r: Rand, b: Builder, c: CycleState, t: number) {
  b.add(t + 2, 'rhythm', { rhythm: 'organised' });
  b.add(t + 8, 'pulse', { present: true });
  const roscSec = t + 10;
  b.add(roscSec, 'rosc');
  if (c.outcome === 'rosc-sustained') {
    const end = roscSec + r.int(20, 30) * 60;
    b.add(end, 'end', { reason: 'rosc-sustained' });
    return { roscSec, endSec: end };
  }
  const rearrest = roscSec + r.int(2, 8) * 60;
  b.add(rearrest, 'rearrest');
  b.start(rearrest + r.int(5, 20));
  const stop = rearrest + r.int(4, 10) * 60;
  b.stop(stop);
  b.add(stop + 5, 'end', { reason: 'terminated' });
  return { roscSec, endSec: stop + 5 };
}
