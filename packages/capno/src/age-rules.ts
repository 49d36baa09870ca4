import type { AgeGroup, Thresholds } from '@upstroke/contracts';

/**
 * The thresholds that apply to a record of this age group. Child and infant records take the
 * profile's paediatric ventilation limit in place of the adult one: with an advanced airway,
 * 20–30 breaths/min for infants and children (AHA 2020 paediatric guideline, Topjian et al.,
 * Circulation 2020;142 suppl 2:S469 — checked), against 10/min for adults (AHA 2020 adult).
 * The tolerance stays the profile's one. Adult records are returned unchanged.
 */
export function thresholdsForAgeGroup(t: Thresholds, ageGroup: AgeGroup = 'adult'): Thresholds {
  if (ageGroup === 'adult') return t;
  const limit =
    ageGroup === 'infant' ? t.infantVentilationMaxPerMin : t.paediatricVentilationMaxPerMin;
  return { ...t, ventilationMaxPerMin: limit };
}

/**
 * Whether rules whose evidence is adult-only apply. The 20-minute low-EtCO2 prognosis caution
 * rests on adult studies (Paiva 2018); there is no validated EtCO2 cut-off for children (AHA
 * 2020 paediatric guideline — summary), so child and infant records never raise it.
 */
export function adultEvidenceApplies(ageGroup: AgeGroup = 'adult'): boolean {
  return ageGroup === 'adult';
}

/** What the debrief's help says about a child or infant record (null for adults). */
export function ageGroupRulesNote(ageGroup: AgeGroup | null | undefined): string | null {
  if (!ageGroup || ageGroup === 'adult') return null;
  const who = ageGroup === 'infant' ? 'Infant' : 'Child';
  return (
    `${who} record: ventilation is compared with the site's paediatric limit (20–30/min with an ` +
    'advanced airway, AHA 2020 paediatric guideline). The adult 20-minute low-EtCO2 prognosis ' +
    'caution is not raised: its evidence comes from adults, and no EtCO2 cut-off is validated ' +
    'for children.'
  );
}
