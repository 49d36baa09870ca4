import type { Thresholds } from './profile-schema.js';
import { paediatricDefaults, paediatricSources } from './paediatric-profile.js';

/** Guideline defaults, each with its source (see shared REFERENCE.md for status). */
export const thresholdDefaults: Thresholds = {
  lowEtco2MmHg: 10, // AHA 2020 adult ALS; Sandroni 2018
  lowEtco2MinSec: 20, // product rule (PRODUCT.md): common practice
  targetEtco2MmHg: 20, // Meaney 2013 consensus
  riseMmHg: 10, // Lui 2016, Resuscitation 104:53
  riseBaselineSec: 60, // PRODUCT.md rule: common practice
  riseSustainSec: 30, // PRODUCT.md rule: common practice
  confounderWindowSec: 120, // Roh 2024 (bicarbonate rise lasts minutes)
  prognosisAfterSec: 1200, // Paiva 2018 (20 min)
  prognosisEtco2MmHg: 10, // Paiva 2018
  pauseMaxSec: 10, // AHA BLS: interruptions < 10 s
  preshockPauseMaxSec: 10, // Cheskes 2011
  rhythmCheckIntervalSec: 120, // AHA 2020; RCUK 2021
  rhythmCheckToleranceSec: 15, // common practice
  epinephrineMinSec: 180, // AHA 2020: every 3–5 min
  epinephrineMaxSec: 300, // AHA 2020
  ventilationMaxPerMin: 10, // AHA 2020: 1 breath every 6 s with an advanced airway
  ventilationTolerancePerMin: 2, // common practice
  waveformAbsentSec: 30, // PRODUCT.md rule: common practice
  rebreathingBaselineMmHg: 2, // common practice: no published cut-off (docs/profile-sources.md)
  compressionFractionTarget: 0.8, // Meaney 2013 goal (> 80 %)
  ...paediatricDefaults,
};

const ahaAdult = 'AHA 2020 adult guideline (Panchal, Circulation 142 suppl 2:S366), Part 3';
const meaney = 'Meaney 2013 CPR quality consensus, Circulation 128:417';

/**
 * Where each default comes from, shown beside the field on the Admin screen: guideline or
 * paper, year and section (status of each in docs/profile-sources.md). A value with no
 * publication behind it says "Common practice".
 */
export const thresholdSources: Record<keyof Thresholds, string> = {
  lowEtco2MmHg: `${ahaAdult}, physiologic monitoring during CPR; Sandroni 2018, Resuscitation 132:73`,
  lowEtco2MinSec: 'Common practice (no published duration)',
  targetEtco2MmHg: `${meaney}, physiologic targets`,
  riseMmHg: 'Lui 2016, Resuscitation 104:53 (abrupt rise of 10 mmHg or more)',
  riseBaselineSec: 'Common practice',
  riseSustainSec: 'Common practice',
  confounderWindowSec: 'Roh 2024, Am J Emerg Med 76:211 (rise after bicarbonate lasts minutes)',
  prognosisAfterSec: 'Paiva 2018 systematic review, Resuscitation 123:1 (20 min of CPR)',
  prognosisEtco2MmHg: 'Paiva 2018 systematic review, Resuscitation 123:1 (advanced airway)',
  pauseMaxSec: `${ahaAdult}, CPR quality: interruptions under 10 s`,
  preshockPauseMaxSec: 'Cheskes 2011, Circulation 124:58 (peri-shock pauses)',
  rhythmCheckIntervalSec: `${ahaAdult}, cardiac arrest algorithm (every 2 min); RCUK 2021 ALS`,
  rhythmCheckToleranceSec: 'Common practice',
  epinephrineMinSec: `${ahaAdult}, vasopressors: every 3–5 min`,
  epinephrineMaxSec: `${ahaAdult}, vasopressors: every 3–5 min`,
  ventilationMaxPerMin: `${ahaAdult}, ventilation with an advanced airway: 1 breath every 6 s`,
  ventilationTolerancePerMin: 'Common practice',
  waveformAbsentSec: 'Common practice',
  rebreathingBaselineMmHg: 'Common practice (no published cut-off)',
  compressionFractionTarget: `${meaney}: goal above 80 %`,
  ...paediatricSources,
};
