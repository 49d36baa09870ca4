import { z } from 'zod';
import { etco2DisplayUnitSchema } from './display-settings.js';
import { ageGroupSchema, co2UnitSchema, isoDateTimeSchema } from './common.js';
import { analysisEventSchema, endReasonSchema, rhythmSchema } from './events.js';
import { profileInputSchema } from './profile-schema.js';

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
  /**
   * One capnogram, or (ours) a list of runs of one in time order with no data between them —
   * a link drop or a monitor switched off is a gap, never zero CO2.
   */
  waveform: z.union([waveformSchema, z.array(waveformSchema)]).optional(),
  /** Default adult; child and infant records are analysed with the profile's paediatric rules. */
  ageGroup: ageGroupSchema.optional(),
  weightKg: z.number().positive().max(400).optional(),
  /** The unit finding messages write EtCO2 in (the site's; default mmHg). Values stay mmHg. */
  displayUnit: etco2DisplayUnitSchema.optional(),
});
export type AnalysisInput = z.infer<typeof analysisInputSchema>;

/** A time interval in seconds from the arrest. */
export const intervalSchema = z.object({ startSec: z.number(), endSec: z.number() });
export type Interval = z.infer<typeof intervalSchema>;

/** The patient's state (PRODUCT.md "Patient state"): CPR measures count pulseless time only. */
export const patientStateSchema = z.enum(['pulseless', 'rosc', 'ended']);
export type PatientState = z.infer<typeof patientStateSchema>;

/** One stretch of a patient state, in seconds from the arrest. */
export const patientStateIntervalSchema = intervalSchema.extend({ state: patientStateSchema });
export type PatientStateInterval = z.infer<typeof patientStateIntervalSchema>;

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
  /** Pre-shock part of the pause: from compressions stopping to the shock (pre-shock pauses only). */
  preShockSec: z.number().optional(),
  /** Post-shock part of the pause: from the shock to compressions resuming (pre-shock pauses only). */
  postShockSec: z.number().optional(),
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
    /** The profile's EtCO2 target during CPR (mmHg) and the share of CPR time at or above it. */
    targetMmHg: z.number().optional(),
    fractionAtOrAboveTarget: z.number().nullable().optional(),
  }),
  /** Total compression time (s) inside the time without circulation. */
  compressionSec: z.number().optional(),
  /** Denominator of the compression fraction (s): all pulseless time (arrest and re-arrests). */
  timeWithoutCirculationSec: z.number().optional(),
  compressionIntervals: z.array(intervalSchema).optional(),
  rhythmCheckIntervalsSec: z.array(z.number()).optional(),
  /** Documented circulation (ROSC or pulse present) to re-arrest or end of record. */
  roscPeriods: z.array(intervalSchema).optional(),
  /** The patient's state over the record, from the events in force. */
  patientStates: z.array(patientStateIntervalSchema).optional(),
  /**
   * Sustained ROSC by the Utstein definition (Nolan 2019): a ROSC period of ≥ 20 min. Null
   * when the record ends in ROSC before 20 min have passed (the record cannot tell).
   */
  sustainedRosc: z.boolean().nullable().optional(),
  /**
   * Where the capnogram has no data once monitoring began (a link drop, a gap between
   * files, or no signal after the last sample to the end): data gaps, never findings.
   */
  dataGaps: z.array(intervalSchema).optional(),
  /** Time from the first capnogram sample to the end of the record (s); null without one. */
  monitoredSec: z.number().nullable().optional(),
  /** Share of `monitoredSec` with capnogram data (0–1); null without a capnogram. */
  monitoringCoverage: z.number().nullable().optional(),
});
export type Measures = z.infer<typeof measuresSchema>;

/** Output of `npm run analyze` and `GET /api/resuscitations/:id/debrief` (extended there). */
export const analysisOutputSchema = z.object({
  measures: measuresSchema,
  findings: z.array(findingSchema),
  breaths: z.array(breathSchema),
});
export type AnalysisOutput = z.infer<typeof analysisOutputSchema>;

/** One EtCO2 value on the merged series, in mmHg, with where it came from. */
export const etco2PointSchema = z.object({
  tSec: z.number(),
  mmHg: z.number(),
  source: etco2SourceSchema,
});
export type Etco2Point = z.infer<typeof etco2PointSchema>;

/** One window of the EtCO2 trend: the median of the values that fall inside it. */
export const etco2TrendPointSchema = z.object({
  startSec: z.number(),
  endSec: z.number(),
  medianMmHg: z.number(),
  count: z.number().int().positive(),
  sources: z.array(etco2SourceSchema),
});
export type Etco2TrendPoint = z.infer<typeof etco2TrendPointSchema>;

/** What the team records when closing a record and the events cannot tell. */
export const summaryClosingDetailsSchema = z.object({
  witnessed: z.boolean().nullable().optional(),
  monitored: z.boolean().nullable().optional(),
  firstRhythm: rhythmSchema.nullable().optional(),
  /** The lead attests ROSC lasted >= 20 min without compressions (e.g. after handover). */
  sustainedRosc: z.boolean().optional(),
});
export type SummaryClosingDetails = z.infer<typeof summaryClosingDetailsSchema>;

/**
 * Per-record audit row (Utstein-style core elements plus EtCO2 process measures), written
 * by the API when a record is signed so that trends never re-scan raw samples.
 */
export const recordSummarySchema = z.object({
  witnessed: z.boolean().nullable(),
  monitored: z.boolean().nullable(),
  firstRhythm: rhythmSchema.nullable(),
  shockableFirstRhythm: z.boolean().nullable(),
  timeToCprSec: z.number().nullable(),
  timeToFirstShockSec: z.number().nullable(),
  timeToFirstEpinephrineSec: z.number().nullable(),
  anyRosc: z.boolean(),
  sustainedRosc: z.boolean(),
  compressionFraction: z.number().nullable(),
  longestPauseSec: z.number().nullable(),
  preshockPausesOverThreshold: z.number().int().nonnegative(),
  etco2Documented: z.boolean(),
  medianEtco2MmHg: z.number().nullable(),
  fractionEtco2AtOrAbove10: z.number().nullable(),
  fractionEtco2AtOrAbove20: z.number().nullable(),
  findingCounts: z.record(findingKindSchema, z.number().int().nonnegative()),
  durationSec: z.number(),
  endReason: endReasonSchema.nullable(),
});
export type RecordSummary = z.infer<typeof recordSummarySchema>;
