import type { paediatricThresholdsShape } from './profile-schema.js';

/*
 * Paediatric settings of a protocol profile: weight-based doses and energies, their caps, and
 * the ventilation limits used for child and infant records. Notes with the status of every
 * value: docs/paediatric-values.md.
 *
 * What was checked, and how (December 2026, through published text found with a search):
 * - 20–30 breaths/min for infants and children receiving CPR with an advanced airway: the
 *   "top 10 take-home messages" of Topjian et al., Circulation 2020;142(suppl 2):S469 —
 *   checked against that page.
 * - Epinephrine 0.01 mg/kg IV/IO (max 1 mg), amiodarone 5 mg/kg (max single dose 300 mg),
 *   lidocaine 1 mg/kg bolus, calcium chloride 10 % 20 mg/kg = 0.2 mL/kg (max single dose 2 g),
 *   magnesium sulfate 25–50 mg/kg (max 2 g), sodium bicarbonate 1 mEq/kg: the AHA table
 *   "Medications for Pediatric Resuscitation" (Kleinman et al., Circulation 2010;122:S876,
 *   Table 1) — checked against a copy of that table; the 2020 guideline keeps these doses
 *   (from memory: the 2020 text was not read for each drug).
 * - Shocks 2 J/kg, then 4 J/kg, later up to 10 J/kg or the adult dose (AHA 2020): from memory.
 * - ERC 2021 (Van de Voorde et al., Resuscitation 2021;161:327): 4 J/kg for every shock, up to
 *   8 J/kg and 360 J from the sixth — through a secondary summary only.
 * The ranges (`paediatricThresholdsShape` in `profile-schema.ts`) are hard limits (a slip such
 * as 1 mg/kg of epinephrine is refused); values more than a factor of 2 away from the default
 * also need a confirmation and a local reason (see `profile-guard.ts`).
 */
export type PaediatricKey = keyof typeof paediatricThresholdsShape;

/** Guideline defaults for child and infant records (see the note above for their status). */
export const paediatricDefaults: Record<PaediatricKey, number> = {
  paediatricEpinephrineMgPerKg: 0.01,
  paediatricEpinephrineMaxMg: 1,
  paediatricAmiodaroneMgPerKg: 5,
  paediatricAmiodaroneMaxMg: 300,
  paediatricLidocaineMgPerKg: 1,
  paediatricBicarbonateMmolPerKg: 1,
  // The adult preset (50 mmol) caps the child's dose: common practice.
  paediatricBicarbonateMaxMmol: 50,
  paediatricCalciumChlorideMlPerKg: 0.2,
  paediatricCalciumChlorideMaxMl: 20,
  paediatricMagnesiumMgPerKg: 50,
  paediatricMagnesiumMaxMg: 2000,
  paediatricFirstShockJPerKg: 2,
  paediatricLaterShockJPerKg: 4,
  paediatricShockMaxJPerKg: 10,
  // "Or the adult dose": biphasic 120–200 J per device maker (AHA 2020 adult; from memory).
  paediatricShockMaxJ: 200,
  paediatricVentilationMaxPerMin: 30,
  infantVentilationMaxPerMin: 30,
};

const ahaPaedDrugs = 'AHA paediatric drug table (Kleinman 2010, Circulation 122:S876, Table 1)';
const aha2020 = 'AHA 2020 paediatric guideline (Topjian, Circulation 142 suppl 2:S469), Part 4';

/** The published source of each default, shown to users beside the value. */
export const paediatricSources: Record<PaediatricKey, string> = {
  paediatricEpinephrineMgPerKg: `${aha2020}, cardiac arrest algorithm; ${ahaPaedDrugs}`,
  paediatricEpinephrineMaxMg: `${ahaPaedDrugs}: max 1 mg IV/IO`,
  paediatricAmiodaroneMgPerKg: `${ahaPaedDrugs}; ${aha2020}`,
  paediatricAmiodaroneMaxMg: `${ahaPaedDrugs}: max single dose 300 mg`,
  paediatricLidocaineMgPerKg: `${ahaPaedDrugs}: bolus 1 mg/kg`,
  paediatricBicarbonateMmolPerKg: `${ahaPaedDrugs}: 1 mEq/kg`,
  paediatricBicarbonateMaxMmol: 'Common practice: the adult preset (50 mmol)',
  paediatricCalciumChlorideMlPerKg: `${ahaPaedDrugs}: calcium chloride 10 %, 20 mg/kg (0.2 mL/kg)`,
  paediatricCalciumChlorideMaxMl: `${ahaPaedDrugs}: max single dose 2 g (20 mL of 10 %)`,
  paediatricMagnesiumMgPerKg: `${ahaPaedDrugs}: magnesium sulfate 25–50 mg/kg`,
  paediatricMagnesiumMaxMg: `${ahaPaedDrugs}: max 2 g`,
  paediatricFirstShockJPerKg: `${aha2020}, defibrillation: 2 J/kg (ERC 2021 paediatric guideline, Van de Voorde, Resuscitation 161:327: 4 J/kg)`,
  paediatricLaterShockJPerKg: `${aha2020}, defibrillation: 4 J/kg`,
  paediatricShockMaxJPerKg: `${aha2020}, defibrillation: up to 10 J/kg or the adult dose`,
  paediatricShockMaxJ:
    'AHA 2020 adult guideline (Panchal, Circulation 142 suppl 2:S366), Part 3, defibrillation: biphasic 120–200 J per device maker',
  paediatricVentilationMaxPerMin: `${aha2020}, ventilation with an advanced airway: 20–30/min`,
  infantVentilationMaxPerMin: `${aha2020}, ventilation with an advanced airway: 20–30/min for infants and children`,
};

export type PaediatricFieldGroup =
  'paediatric-drugs' | 'paediatric-shocks' | 'paediatric-ventilation';

/** Labels, units and form steps of the paediatric settings. */
export const paediatricFields: Record<
  PaediatricKey,
  { label: string; unit: string; group: PaediatricFieldGroup; step: number }
> = {
  paediatricEpinephrineMgPerKg: f('Epinephrine dose', 'mg/kg', 'paediatric-drugs', 0.001),
  paediatricEpinephrineMaxMg: f('Epinephrine largest dose', 'mg', 'paediatric-drugs', 0.1),
  paediatricAmiodaroneMgPerKg: f('Amiodarone dose', 'mg/kg', 'paediatric-drugs', 0.5),
  paediatricAmiodaroneMaxMg: f('Amiodarone largest dose', 'mg', 'paediatric-drugs', 10),
  paediatricLidocaineMgPerKg: f('Lidocaine dose', 'mg/kg', 'paediatric-drugs', 0.25),
  paediatricBicarbonateMmolPerKg: f('Sodium bicarbonate dose', 'mmol/kg', 'paediatric-drugs', 0.25),
  paediatricBicarbonateMaxMmol: f('Sodium bicarbonate largest dose', 'mmol', 'paediatric-drugs', 5),
  paediatricCalciumChlorideMlPerKg: f(
    'Calcium chloride 10 % dose',
    'mL/kg',
    'paediatric-drugs',
    0.05,
  ),
  paediatricCalciumChlorideMaxMl: f(
    'Calcium chloride 10 % largest dose',
    'mL',
    'paediatric-drugs',
    1,
  ),
  paediatricMagnesiumMgPerKg: f('Magnesium sulfate dose', 'mg/kg', 'paediatric-drugs', 5),
  paediatricMagnesiumMaxMg: f('Magnesium sulfate largest dose', 'mg', 'paediatric-drugs', 100),
  paediatricFirstShockJPerKg: f('First shock', 'J/kg', 'paediatric-shocks', 0.5),
  paediatricLaterShockJPerKg: f('Later shocks', 'J/kg', 'paediatric-shocks', 0.5),
  paediatricShockMaxJPerKg: f('Largest shock per kg', 'J/kg', 'paediatric-shocks', 0.5),
  paediatricShockMaxJ: f('Largest shock (adult dose)', 'J', 'paediatric-shocks', 10),
  paediatricVentilationMaxPerMin: f(
    'Child ventilation rate limit (advanced airway)',
    '/min',
    'paediatric-ventilation',
    1,
  ),
  infantVentilationMaxPerMin: f(
    'Infant ventilation rate limit (advanced airway)',
    '/min',
    'paediatric-ventilation',
    1,
  ),
};

function f(label: string, unit: string, group: PaediatricFieldGroup, step: number) {
  return { label, unit, group, step };
}
