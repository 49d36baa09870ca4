import { createHash } from 'node:crypto';
import { arrayToMmHg } from '@upstroke/capno';
import type { Debrief, Waveform } from '@upstroke/contracts';
import { clinicalEntries } from './entries';
import type * as R4 from './r4';
import { cprProcedure, encounterOf, etco2Observations, waveformObservation } from './resources';

export type FhirBundle = R4.Bundle;

/** SNOMED CT 410429000 "Cardiac arrest (disorder)" (REFERENCE.md: SNOMED CT, checked). */
export const SNOMED_CARDIAC_ARREST = '410429000';
export const SNOMED = 'http://snomed.info/sct';

/**
 * A name-based UUID (RFC 4122 version 5 layout over SHA-1): the same record always gives
 * the same fullUrls, so a re-export replaces rather than duplicates in the receiving system.
 */
export function stableUuid(name: string): string {
  const h = createHash('sha1').update(`upstroke:${name}`).digest();
  h[6] = (h[6] & 0x0f) | 0x50;
  h[8] = (h[8] & 0x3f) | 0x80;
  const x = h.subarray(0, 16).toString('hex');
  return `${x.slice(0, 8)}-${x.slice(8, 12)}-${x.slice(12, 16)}-${x.slice(16, 20)}-${x.slice(20)}`;
}

export interface FhirOptions {
  publicUrl: string;
  /** The capnogram's runs, in time order. */
  waveform?: readonly Waveform[];
}

/**
 * The signed record as a FHIR R4 `collection` Bundle: Patient (by reference number),
 * Encounter, Condition (cardiac arrest), Procedure for CPR and per shock,
 * MedicationAdministration per drug (struck ones `entered-in-error`, each replacement with a
 * Provenance), Observations for EtCO2 (values and the capnogram).
 */
export function toFhirBundle(d: Debrief, opts: FhirOptions): FhirBundle {
  const id = d.record.id;
  const url = (key: string) => `urn:uuid:${stableUuid(`${id}/${key}`)}`;
  const ctx = {
    d,
    url,
    subject: { reference: url('patient') },
    encounter: { reference: url('encounter') },
  };
  const entries: { key: string; resource: R4.Resource }[] = [];
  const add = (key: string, resource: R4.Resource) => entries.push({ key, resource });
  const patient: R4.Patient = { resourceType: 'Patient' };
  if (d.record.patientRef)
    patient.identifier = [{ system: 'urn:upstroke:patient-ref', value: d.record.patientRef }];
  add('patient', patient);
  add('encounter', encounterOf(ctx));
  add('condition', {
    resourceType: 'Condition',
    clinicalStatus: {
      coding: [
        {
          system: 'http://terminology.hl7.org/CodeSystem/condition-clinical',
          code: d.measures.roscPeriods?.length ? 'resolved' : 'active',
        },
      ],
    },
    verificationStatus: {
      coding: [
        { system: 'http://terminology.hl7.org/CodeSystem/condition-ver-status', code: 'confirmed' },
      ],
    },
    code: {
      coding: [
        { system: SNOMED, code: SNOMED_CARDIAC_ARREST, display: 'Cardiac arrest (disorder)' },
      ],
      text: 'Cardiac arrest',
    },
    subject: ctx.subject,
    encounter: ctx.encounter,
    onsetDateTime: d.record.arrestAt,
  });
  const cpr = cprProcedure(ctx);
  if (cpr) add('cpr', cpr);
  for (const [key, resource] of clinicalEntries(ctx)) add(key, resource);
  for (const [key, obs] of etco2Observations(ctx)) add(key, obs);
  // One Observation per run of the capnogram: a data gap between runs is not sent as values.
  (opts.waveform ?? []).forEach((w, i) =>
    add(
      i === 0 ? 'waveform' : `waveform/${i}`,
      waveformObservation(ctx, w, arrayToMmHg(w.values, w.unit, w.barometricMmHg)),
    ),
  );
  return {
    resourceType: 'Bundle',
    id: stableUuid(`${id}/bundle`),
    identifier: { system: `${opts.publicUrl}/api/resuscitations`, value: id },
    type: 'collection',
    timestamp: d.record.signedAt ?? new Date().toISOString(),
    entry: entries.map((e) => ({ fullUrl: url(e.key), resource: e.resource })),
  };
}
