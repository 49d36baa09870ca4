import type { Debrief, Waveform } from '@upstroke/contracts';
import type * as R4 from './r4';

/** LOINC 19891-1 "Carbon dioxide [Partial pressure] in Exhaled gas --at end expiration" (REFERENCE.md, LOINC, checked). */
export const LOINC_ETCO2 = '19891-1';
/** UCUM code for millimetres of mercury (REFERENCE.md, UCUM, checked). */
export const UCUM_MMHG = 'mm[Hg]';
export interface Ctx {
  d: Debrief;
  url: (key: string) => string;
  subject: R4.Reference;
  encounter: R4.Reference;
}

const UCUM = 'http://unitsofmeasure.org';
const etco2Code: R4.CodeableConcept = {
  coding: [
    {
      system: 'http://loinc.org',
      code: LOINC_ETCO2,
      display: 'Carbon dioxide [Partial pressure] in Exhaled gas --at end expiration',
    },
  ],
  text: 'EtCO2',
};
const iso = (arrestAt: string, sec: number) =>
  new Date(Date.parse(arrestAt) + sec * 1000).toISOString();

export function encounterOf(ctx: Ctx): R4.Encounter {
  const r = ctx.d.record;
  return {
    resourceType: 'Encounter',
    identifier: [{ system: 'urn:upstroke:resuscitation', value: r.id }],
    status: 'finished',
    // v3 ActCode IMP "inpatient encounter": in-hospital arrests (HL7 v3 ActCode; from memory).
    class: {
      system: 'http://terminology.hl7.org/CodeSystem/v3-ActCode',
      code: 'IMP',
      display: 'inpatient encounter',
    },
    subject: ctx.subject,
    period: { start: r.arrestAt, end: iso(r.arrestAt, ctx.d.measures.durationSec) },
    serviceProvider: { display: r.siteName },
    location:
      r.unitName || r.location
        ? [{ location: { display: [r.unitName, r.location].filter(Boolean).join(', ') } }]
        : undefined,
  };
}

/** One Procedure for CPR (SNOMED CT 89666000), from the first to the last compression. */
export function cprProcedure(ctx: Ctx): R4.Procedure | undefined {
  const intervals = ctx.d.measures.compressionIntervals ?? [];
  if (intervals.length === 0) return undefined;
  const a = ctx.d.record.arrestAt;
  return {
    resourceType: 'Procedure',
    status: 'completed',
    // SNOMED CT 89666000 "Cardiopulmonary resuscitation (procedure)" (REFERENCE.md: checked / memory).
    code: {
      coding: [
        {
          system: 'http://snomed.info/sct',
          code: '89666000',
          display: 'Cardiopulmonary resuscitation (procedure)',
        },
      ],
      text: 'CPR',
    },
    subject: ctx.subject,
    encounter: ctx.encounter,
    performedPeriod: {
      start: iso(a, intervals[0].startSec),
      end: iso(a, intervals[intervals.length - 1].endSec),
    },
  };
}

/** Every stored EtCO2 value (entered, streamed, imported); per-breath values travel in the waveform. */
export function etco2Observations(ctx: Ctx): [string, R4.Observation][] {
  const a = ctx.d.record.arrestAt;
  return ctx.d.etco2Series
    .filter((p) => p.source !== 'waveform')
    .map((p, i) => [
      `etco2/${i}`,
      {
        resourceType: 'Observation',
        status: 'final',
        code: etco2Code,
        subject: ctx.subject,
        encounter: ctx.encounter,
        effectiveDateTime: iso(a, p.tSec),
        valueQuantity: {
          value: Math.round(p.mmHg * 10) / 10,
          unit: 'mmHg',
          system: UCUM,
          code: UCUM_MMHG,
        },
        method: { text: `source: ${p.source}` },
      },
    ]);
}

/** The capnogram as SampledData in mmHg; `period` is milliseconds between samples (R4). */
export function waveformObservation(ctx: Ctx, w: Waveform, mmHg: Float64Array): R4.Observation {
  const data = Array.from(mmHg, (v) => (Math.round(v * 10) / 10).toString()).join(' ');
  return {
    resourceType: 'Observation',
    status: 'final',
    code: { ...etco2Code, text: 'CO2 waveform (capnogram)' },
    subject: ctx.subject,
    encounter: ctx.encounter,
    effectivePeriod: {
      start: w.startAt,
      end: new Date(Date.parse(w.startAt) + (mmHg.length / w.sampleRateHz) * 1000).toISOString(),
    },
    valueSampledData: {
      origin: { value: 0, unit: 'mmHg', system: UCUM, code: UCUM_MMHG },
      period: 1000 / w.sampleRateHz,
      dimensions: 1,
      data,
    },
  };
}
