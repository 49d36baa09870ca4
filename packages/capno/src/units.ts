import { type Co2Unit, MMHG_PER_KPA } from '@upstroke/contracts';

/** 1 kPa in mmHg, defined once in contracts (`etco2-units.ts`) for the engine and every output. */
export { MMHG_PER_KPA };

/** Sea-level barometric pressure used when a % reading comes without one. */
export const DEFAULT_BAROMETRIC_MMHG = 760;

/**
 * Converts one CO2 reading to mmHg. kPa × 7.50062; % is a fraction of the barometric
 * pressure (PCO2 = FCO2 × PB, dry gas: no water-vapour correction, as monitors display it).
 */
export function toMmHg(
  value: number,
  unit: Co2Unit,
  barometricMmHg: number = DEFAULT_BAROMETRIC_MMHG,
): number {
  switch (unit) {
    case 'mmHg':
      return value;
    case 'kPa':
      return value * MMHG_PER_KPA;
    case '%':
      return (value / 100) * barometricMmHg;
  }
}

/** The factor that turns a reading in `unit` into mmHg (all conversions are linear). */
export function mmHgFactor(unit: Co2Unit, barometricMmHg: number = DEFAULT_BAROMETRIC_MMHG) {
  return toMmHg(1, unit, barometricMmHg);
}

/** Converts a whole array into a new Float64Array in mmHg (one pass). */
export function arrayToMmHg(
  values: ArrayLike<number>,
  unit: Co2Unit,
  barometricMmHg: number = DEFAULT_BAROMETRIC_MMHG,
): Float64Array {
  const out = new Float64Array(values.length);
  const k = mmHgFactor(unit, barometricMmHg);
  for (let i = 0; i < values.length; i++) out[i] = values[i] * k;
  return out;
}
