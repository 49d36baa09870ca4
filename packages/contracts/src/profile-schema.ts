/**
 * The schemas of a protocol profile: every threshold with its allowed range. The defaults and
 * their sources are in `profile.ts` and `paediatric-profile.ts`, which need no zod, so a
 * screen that only reads thresholds (Live) loads them without it.
 */
import { z } from 'zod';
import { isoDateTimeSchema, uuidSchema } from './common.js';
import { thresholdDefaults } from './profile.js';

/** The paediatric settings' ranges (their values and sources: `paediatric-profile.ts`). */
export const paediatricThresholdsShape = {
  paediatricEpinephrineMgPerKg: z.number().min(0.001).max(0.1),
  paediatricEpinephrineMaxMg: z.number().min(0.1).max(1),
  paediatricAmiodaroneMgPerKg: z.number().min(1).max(15),
  paediatricAmiodaroneMaxMg: z.number().min(50).max(300),
  paediatricLidocaineMgPerKg: z.number().min(0.25).max(3),
  paediatricBicarbonateMmolPerKg: z.number().min(0.25).max(2),
  paediatricBicarbonateMaxMmol: z.number().min(10).max(100),
  paediatricCalciumChlorideMlPerKg: z.number().min(0.05).max(0.5),
  paediatricCalciumChlorideMaxMl: z.number().min(5).max(20),
  paediatricMagnesiumMgPerKg: z.number().min(10).max(100),
  paediatricMagnesiumMaxMg: z.number().min(500).max(2000),
  paediatricFirstShockJPerKg: z.number().min(1).max(5),
  paediatricLaterShockJPerKg: z.number().min(2).max(10),
  paediatricShockMaxJPerKg: z.number().min(4).max(10),
  paediatricShockMaxJ: z.number().min(100).max(360),
  paediatricVentilationMaxPerMin: z.number().min(10).max(40),
  infantVentilationMaxPerMin: z.number().min(10).max(40),
};

/**
 * Every threshold the analysis uses. Defaults are published guideline values (shared
 * REFERENCE.md); each one is a site setting because local protocols differ.
 */
export const thresholdsSchema = z
  .object({
    lowEtco2MmHg: z.number().min(1).max(40),
    lowEtco2MinSec: z.number().min(5).max(300),
    targetEtco2MmHg: z.number().min(5).max(60),
    riseMmHg: z.number().min(2).max(60),
    riseBaselineSec: z.number().min(10).max(600),
    riseSustainSec: z.number().min(5).max(600),
    confounderWindowSec: z.number().min(0).max(1800),
    prognosisAfterSec: z.number().min(60).max(7200),
    prognosisEtco2MmHg: z.number().min(1).max(40),
    pauseMaxSec: z.number().min(2).max(120),
    preshockPauseMaxSec: z.number().min(2).max(120),
    rhythmCheckIntervalSec: z.number().min(30).max(600),
    rhythmCheckToleranceSec: z.number().min(0).max(300),
    epinephrineMinSec: z.number().min(30).max(1200),
    epinephrineMaxSec: z.number().min(30).max(1800),
    ventilationMaxPerMin: z.number().min(4).max(40),
    ventilationTolerancePerMin: z.number().min(0).max(20),
    waveformAbsentSec: z.number().min(5).max(600),
    rebreathingBaselineMmHg: z.number().min(0.5).max(20),
    compressionFractionTarget: z.number().min(0).max(1),
    ...paediatricThresholdsShape,
  })
  .refine((t) => t.epinephrineMinSec <= t.epinephrineMaxSec, {
    path: ['epinephrineMaxSec'],
    error: 'The longest epinephrine interval must not be shorter than the shortest',
  });
export type Thresholds = z.infer<typeof thresholdsSchema>;

/** A partial profile as the analysis input accepts it; missing values take the defaults. */
export const profileInputSchema = z
  .object(
    Object.fromEntries(
      Object.keys(thresholdDefaults).map((k) => [k, z.number().finite().optional()]),
    ) as { [K in keyof Thresholds]: z.ZodOptional<z.ZodNumber> },
  )
  .strict();
export type ProfileInput = z.infer<typeof profileInputSchema>;

export const protocolProfileSchema = z.object({
  id: uuidSchema,
  siteId: uuidSchema,
  version: z.number().int().positive(),
  name: z.string().min(1).max(120),
  thresholds: thresholdsSchema,
  /** Local source or reason for each value saved far from its guideline default. */
  localSources: z.record(z.string(), z.string()).optional(),
  createdAt: isoDateTimeSchema,
  createdBy: z.string().nullable(),
});
export type ProtocolProfile = z.infer<typeof protocolProfileSchema>;
