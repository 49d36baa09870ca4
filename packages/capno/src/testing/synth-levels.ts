/**
 * Physiological events layered on the EtCO2 level schedule:
 * - `rosc`: abrupt rise by `riseMmHg` over ~10 s, then held (Pokorná 2010: sudden rise);
 * - `bicarbonate`: EtCO2 roughly doubles, onset ~17 s, peak ~35 s, back over ~420 s
 *   (Roh 2024, Am J Emerg Med 76:211 — shape between those points is our own);
 * - `dislodged`: the tube leaves the trachea; the sensor reads flat zero from then on.
 */
export type SynthModifier =
  | { kind: 'rosc'; atSec: number; riseMmHg: number }
  | { kind: 'bicarbonate'; atSec: number }
  | { kind: 'dislodged'; atSec: number };

function interpolate(levels: [number, number][], t: number): number {
  if (levels.length === 0) return 0;
  if (t <= levels[0][0]) return levels[0][1];
  for (let i = 1; i < levels.length; i++) {
    const [t1, v1] = levels[i];
    if (t < t1) {
      const [t0, v0] = levels[i - 1];
      return v0 + ((v1 - v0) * (t - t0)) / (t1 - t0);
    }
  }
  return levels[levels.length - 1][1];
}

/** Multiplier of the bicarbonate effect `dt` seconds after the dose (1 = no effect). */
export function bicarbonateFactor(dt: number): number {
  if (dt < 17) return 1;
  if (dt < 35) return 1 + (dt - 17) / 18;
  if (dt < 420) return 2 - (dt - 35) / 385;
  return 1;
}

/** The true EtCO2 (mmHg) at gas time `t`. */
export function etco2LevelAt(
  levels: [number, number][],
  modifiers: readonly SynthModifier[],
  t: number,
): number {
  let v = interpolate(levels, t);
  for (const m of modifiers) {
    const dt = t - m.atSec;
    if (m.kind === 'rosc' && dt > 0) v += m.riseMmHg * Math.min(1, dt / 10);
    if (m.kind === 'bicarbonate' && dt > 0) v *= bicarbonateFactor(dt);
  }
  return v;
}
