/**
 * Tuning of the breath detector. Values are our own engineering choices (common practice,
 * not published constants), chosen so that chest-compression oscillations (1.5–2 Hz, a few
 * mmHg: each excursion lasts < 0.35 s) can never satisfy both the amplitude and the
 * duration test, while real exhalations at up to 40/min always do.
 */
export interface DetectorOptions {
  /** Minimum upstroke: a breath must rise at least this far above the inspired baseline. */
  minUpstrokeMmHg: number;
  /** Upper (start) threshold as a fraction of the recent breath amplitude. */
  highFraction: number;
  /** Lower (end) threshold as a fraction of the recent breath amplitude: the hysteresis. */
  lowFraction: number;
  /** Minimum exhalation: the signal must stay above the lower threshold this long. */
  minExhalationSec: number;
  /** Minimum inspiration: a dip shorter than this inside a plateau does not end the breath. */
  minInspirationSec: number;
  /** Slowest accepted upstroke (lower to upper threshold); slower rises move the baseline. */
  maxUpstrokeSec: number;
  /** Width of the moving average applied before thresholds (suppresses sample noise); at
   * least 3 samples, so that at low sample rates one noisy sample cannot cross a threshold. */
  smoothingSec: number;
  /** EtCO2 is the mean of this much plateau, ending `plateauGuardSec` before the downstroke. */
  plateauWindowSec: number;
  plateauGuardSec: number;
  /** Without a breath for this long, the adaptive amplitude starts to decay ... */
  amplitudeHoldSec: number;
  /** ... halving every this many seconds, so a sudden fall in EtCO2 is still followed. */
  amplitudeHalfLifeSec: number;
}

export const detectorDefaults: DetectorOptions = {
  minUpstrokeMmHg: 3,
  highFraction: 0.4,
  lowFraction: 0.2,
  minExhalationSec: 0.6,
  minInspirationSec: 0.2,
  maxUpstrokeSec: 1,
  smoothingSec: 0.1,
  plateauWindowSec: 0.5,
  plateauGuardSec: 0.25,
  amplitudeHoldSec: 4,
  amplitudeHalfLifeSec: 4,
};
