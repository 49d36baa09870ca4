import type { SimulatorQuery } from '@upstroke/contracts';

/** How long a simulated monitor is remembered after it first connected (ms). */
const KEEP_MS = 2 * 3600 * 1000;
/** At most this many simulated monitors are remembered (the oldest is forgotten first). */
const MAX_MONITORS = 200;

export interface DropPlan {
  /** When the simulated monitor's stream began (wall clock, ms). */
  anchorMs: number;
  /** The silent stretch, in stream time (ms, as stamped in the frames' `t0`). */
  silence: { fromMs: number; toMs: number };
}

/**
 * Simulated monitors whose link drops, by link address: a tablet that reconnects after the
 * link fell silent reaches the same monitor, still running, rather than a fresh stream (so
 * the drop happens once, as a pulled cable would, and the samples of the drop never arrive).
 */
export class SimulatedDrops {
  private readonly monitors = new Map<string, number>();

  /** The drop of the monitor at `address`, or null when its query asks for none. */
  plan(address: string, q: Pick<SimulatorQuery, 'dropAfter' | 'dropFor'>, nowMs: number) {
    if (q.dropAfter === undefined) return null;
    this.forgetOld(nowMs);
    const anchorMs = this.monitors.get(address) ?? nowMs;
    this.monitors.set(address, anchorMs);
    const fromMs = anchorMs + q.dropAfter * 1000;
    return { anchorMs, silence: { fromMs, toMs: fromMs + q.dropFor * 1000 } } satisfies DropPlan;
  }

  private forgetOld(nowMs: number): void {
    for (const [address, anchorMs] of this.monitors)
      if (nowMs - anchorMs > KEEP_MS || this.monitors.size >= MAX_MONITORS)
        this.monitors.delete(address);
  }
}

/** The stream time (ms) a monitor that began at `anchorMs` has reached at `nowMs`. */
export function streamTimeMs(plan: DropPlan, speed: number, nowMs: number): number {
  return plan.anchorMs + (nowMs - plan.anchorMs) * speed;
}

/** True while the link is down: a connection then is refused, as an unplugged cable. */
export function isDown(plan: DropPlan, speed: number, nowMs: number): boolean {
  const t = streamTimeMs(plan, speed, nowMs);
  return t >= plan.silence.fromMs && t < plan.silence.toMs;
}
