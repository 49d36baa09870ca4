import { z } from 'zod';
import { co2UnitSchema, isoDateTimeSchema } from './common.js';
import { analysisEventSchema } from './events.js';
import { profileInputSchema } from './profile.js';

export const etco2SourceSchema = z.enum(['manual', 'stream', 'import', 'waveform']);
export type Etco2Source = z.infer<typeof etco2SourceSchema>;

/** One EtCO2 value as the analysis reads it. */
export const analysisEtco2Schema = z.object({
  at: isoDateTimeSchema,
  value: z.number().finite().min(0),
  unit: co2UnitSchema,
  source: etco2SourceSchema.default('manual'),
  barometricMmHg: z.number().min(300).max(900).optional(),
});
export type AnalysisEtco2 = z.infer<typeof analysisEtco2Schema>;

export const waveformSchema = z.object({
  startAt: isoDateTimeSchema,
  sampleRateHz: z.number().min(10).max(200),
  unit: co2UnitSchema,
  barometricMmHg: z.number().min(300).max(900).optional(),
  values: z.array(z.number().finite()),
});
export type Waveform = z.infer<typeof waveformSchema>;

/** Input of `npm run analyze` (CONTRACT.md "Analysis on files"). */
export const analysisInputSchema = z.object({
  arrestAt: isoDateTimeSchema,
  profile: profileInputSchema.optional(),
  events: z.array(analysisEventSchema),
  etco2: z.array(analysisEtco2Schema).optional(),
  waveform: waveformSchema.optional(),
});
export type AnalysisInput = z.infer<typeof analysisInputSchema>;

export const pauseContextSchema = z.enum([
  'pre-shock',
  'post-shock',
  'rhythm-check',
  'airway',
  'unexplained',
]);
export type PauseContext = z.infer<typeof pauseContextSchema>;

export const pauseSchema = z.object({
  startSec: z.number(),
  endSec: z.number(),
  durationSec: z.number(),
  context: pauseContextSchema,
});
export type Pause = z.infer<typeof pauseSchema>;

export const findingKindSchema = z.enum([
  'etco2-low',
  'etco2-rise',
  'etco2-prognosis-caution',
  'pause-long',
  'preshock-pause-long',
  'rhythm-check-late',
  'epinephrine-interval',
  'ventilation-fast',
  'waveform-absent',
  'airway-unconfirmed',
  'rebreathing',
]);
export type FindingKind = z.infer<typeof findingKindSchema>;
export const severitySchema = z.enum(['info', 'warning', 'critical']);
export type Severity = z.infer<typeof severitySchema>;

export const findingSchema = z.object({
  kind: findingKindSchema,
  startSec: z.number(),
  endSec: z.number(),
  severity: severitySchema,
  message: z.string(),
  caution: z.string(),
  confounder: z.enum(['sodium-bicarbonate', 'ventilation']).nullable(),
});
export type Finding = z.infer<typeof findingSchema>;

export const breathSchema = z.object({
  tSec: z.number(),
  etco2MmHg: z.number(),
  baselineMmHg: z.number(),
  durationSec: z.number().optional(),
});
export type Breath = z.infer<typeof breathSchema>;

export const measuresSchema = z.object({
  durationSec: z.number(),
  compressionFraction: z.number().nullable(),
  pauses: z.array(pauseSchema),
  longestPauseSec: z.number().nullable(),
  timeToFirstCompressionSec: z.number().nullable(),
  timeToFirstShockSec: z.number().nullable(),
  timeToFirstEpinephrineSec: z.number().nullable(),
  epinephrineIntervalsSec: z.array(z.number()),
  ventilationRatePerMin: z.number().nullable(),
  etco2: z.object({
    medianMmHg: z.number().nullable(),
    fractionAtOrAbove10: z.number().nullable(),
    fractionAtOrAbove20: z.number().nullable(),
  }),
});
export type Measures = z.infer<typeof measuresSchema>;

/** Output of `npm run analyze` and `GET /api/resuscitations/:id/debrief` (extended there). */
export const analysisOutputSchema = z.object({
  measures: measuresSchema,
  findings: z.array(findingSchema),
  breaths: z.array(breathSchema),
});
export type AnalysisOutput = z.infer<typeof analysisOutputSchema>;
