import { z } from 'zod';
import { type PaediatricFieldGroup, paediatricFields } from './paediatric-profile.js';
import { type Thresholds, thresholdsSchema } from './profile-schema.js';

export type ThresholdGroup =
  'etco2' | 'cpr' | 'rhythm' | 'drugs' | 'ventilation' | PaediatricFieldGroup;

export interface ThresholdField {
  label: string;
  /** Unit shown after the value; '' for a plain fraction. */
  unit: string;
  group: ThresholdGroup;
  step: number;
}

export const thresholdGroupLabels: Record<ThresholdGroup, string> = {
  etco2: 'EtCO2',
  cpr: 'Compressions and pauses',
  rhythm: 'Rhythm checks',
  drugs: 'Epinephrine',
  ventilation: 'Ventilation and waveform',
  'paediatric-drugs': 'Children and infants: weight-based drug doses',
  'paediatric-shocks': 'Children and infants: shock energies',
  'paediatric-ventilation': 'Children and infants: ventilation',
};

/** Friendly labels and units for each threshold: the profile form, the PDF and the debrief. */
export const thresholdFields: Record<keyof Thresholds, ThresholdField> = {
  lowEtco2MmHg: { label: 'Low EtCO2', unit: 'mmHg', group: 'etco2', step: 1 },
  lowEtco2MinSec: { label: 'Low EtCO2 lasting at least', unit: 's', group: 'etco2', step: 1 },
  targetEtco2MmHg: { label: 'EtCO2 target during CPR', unit: 'mmHg', group: 'etco2', step: 1 },
  riseMmHg: { label: 'EtCO2 rise size', unit: 'mmHg', group: 'etco2', step: 1 },
  riseBaselineSec: { label: 'EtCO2 rise baseline window', unit: 's', group: 'etco2', step: 1 },
  riseSustainSec: { label: 'EtCO2 rise sustained for', unit: 's', group: 'etco2', step: 1 },
  confounderWindowSec: {
    label: 'Confounder window (bicarbonate, ventilation)',
    unit: 's',
    group: 'etco2',
    step: 1,
  },
  prognosisAfterSec: {
    label: 'Prognosis caution after CPR time',
    unit: 's',
    group: 'etco2',
    step: 1,
  },
  prognosisEtco2MmHg: { label: 'Prognosis caution EtCO2', unit: 'mmHg', group: 'etco2', step: 1 },
  pauseMaxSec: { label: 'Longest acceptable pause', unit: 's', group: 'cpr', step: 1 },
  preshockPauseMaxSec: { label: 'Longest pre-shock pause', unit: 's', group: 'cpr', step: 1 },
  compressionFractionTarget: {
    label: 'Compression fraction target',
    unit: '',
    group: 'cpr',
    step: 0.01,
  },
  rhythmCheckIntervalSec: { label: 'Rhythm-check interval', unit: 's', group: 'rhythm', step: 1 },
  rhythmCheckToleranceSec: {
    label: 'Rhythm-check tolerance',
    unit: 's',
    group: 'rhythm',
    step: 1,
  },
  epinephrineMinSec: { label: 'Shortest epinephrine interval', unit: 's', group: 'drugs', step: 1 },
  epinephrineMaxSec: { label: 'Longest epinephrine interval', unit: 's', group: 'drugs', step: 1 },
  ventilationMaxPerMin: {
    label: 'Ventilation rate limit',
    unit: '/min',
    group: 'ventilation',
    step: 1,
  },
  ventilationTolerancePerMin: {
    label: 'Ventilation rate tolerance',
    unit: '/min',
    group: 'ventilation',
    step: 1,
  },
  waveformAbsentSec: {
    label: 'Waveform absent for',
    unit: 's',
    group: 'ventilation',
    step: 1,
  },
  rebreathingBaselineMmHg: {
    label: 'Rebreathing baseline',
    unit: 'mmHg',
    group: 'ventilation',
    step: 0.5,
  },
  ...paediatricFields,
};

export const thresholdKeys = Object.keys(thresholdFields) as (keyof Thresholds)[];

/** The allowed range of one threshold, read from the shared schema (one source of truth). */
export function thresholdRange(key: keyof Thresholds): { min: number; max: number } {
  const field = thresholdsSchema.shape[key];
  return { min: field.minValue ?? -Infinity, max: field.maxValue ?? Infinity };
}

function withUnit(value: number, unit: string): string {
  return unit ? `${value} ${unit}` : String(value);
}

function friendlyField(key: keyof Thresholds) {
  const { label, unit } = thresholdFields[key];
  const { min, max } = thresholdRange(key);
  const range = `${label} must be between ${withUnit(min, unit)} and ${withUnit(max, unit)}`;
  return z
    .number({ error: `${label}: enter a number` })
    .refine((v) => v >= min && v <= max, { error: range });
}

/**
 * The thresholds as the profile form and `POST /protocol-profiles` accept them: the same
 * ranges as `thresholdsSchema`, with messages that name the field, its range and its unit.
 */
export const thresholdsInputSchema = z
  .object(
    Object.fromEntries(thresholdKeys.map((k) => [k, friendlyField(k)])) as {
      [K in keyof Thresholds]: z.ZodNumber;
    },
  )
  .strict()
  .refine((t) => t.epinephrineMinSec <= t.epinephrineMaxSec, {
    path: ['epinephrineMaxSec'],
    error: 'The longest epinephrine interval must not be shorter than the shortest',
  });
