import { synthCapnogram, synthScenario } from '@upstroke/capno';
import type { SimulatorQuery } from '@upstroke/contracts';
import type { LinkSource } from './paced-link';

/** How long a simulated code runs before the link closes (a long training session). */
export const SIMULATOR_DURATION_SEC = 1800;

/**
 * The monitor simulator's capnogram: one of capno's seeded scenarios (compression
 * oscillations, ventilations at a set rate, an EtCO2 trend, ROSC rise or loss of the
 * waveform), stretched to 30 minutes with compressions throughout. Invented data.
 */
export function simulatorSource(q: Pick<SimulatorQuery, 'scenario' | 'seed'>): LinkSource {
  const options = synthScenario(q.scenario, q.seed);
  const capnogram = synthCapnogram({
    ...options,
    durationSec: SIMULATOR_DURATION_SEC,
    compressions: [[0, SIMULATOR_DURATION_SEC]],
  });
  return {
    sampleRateHz: capnogram.sampleRateHz,
    unit: capnogram.unit,
    values: capnogram.values,
    label: `simulator:${q.scenario}`,
  };
}
