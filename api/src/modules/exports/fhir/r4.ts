/// <reference types="fhir" />
/**
 * FHIR R4 resource shapes used by the export. The installed @types/fhir (3.0.2) describes
 * STU3, whose datatypes (Coding, CodeableConcept, Quantity, SampledData, Reference, Period,
 * Identifier) are unchanged in R4 and are used from it; the resources below differ in R4
 * (e.g. Observation.encounter instead of .context; Condition.clinicalStatus is a
 * CodeableConcept), so they are declared here after the R4 specification (hl7.org/fhir/R4).
 */
export type Coding = fhir.Coding;
export type CodeableConcept = fhir.CodeableConcept;
export type Quantity = fhir.Quantity;
export type Reference = fhir.Reference;
export type Period = fhir.Period;
export type Identifier = fhir.Identifier;
export type SampledData = fhir.SampledData;

interface Base<T extends string> {
  resourceType: T;
  id?: string;
  identifier?: Identifier[];
}

export interface Patient extends Base<'Patient'> {
  active?: boolean;
}

export interface Encounter extends Base<'Encounter'> {
  status:
    | 'planned'
    | 'arrived'
    | 'triaged'
    | 'in-progress'
    | 'onleave'
    | 'finished'
    | 'cancelled'
    | 'entered-in-error'
    | 'unknown';
  class: Coding;
  subject?: Reference;
  period?: Period;
  location?: { location: Reference }[];
  serviceProvider?: Reference;
}

export interface Location extends Base<'Location'> {
  name?: string;
  description?: string;
  managingOrganization?: Reference;
}

export interface Organization extends Base<'Organization'> {
  name?: string;
}

export interface Observation extends Base<'Observation'> {
  status:
    | 'registered'
    | 'preliminary'
    | 'final'
    | 'amended'
    | 'corrected'
    | 'cancelled'
    | 'entered-in-error'
    | 'unknown';
  code: CodeableConcept;
  subject?: Reference;
  encounter?: Reference;
  effectiveDateTime?: string;
  effectivePeriod?: Period;
  valueQuantity?: Quantity;
  valueSampledData?: SampledData;
  method?: CodeableConcept;
  note?: { text: string }[];
}

export interface Procedure extends Base<'Procedure'> {
  status:
    | 'preparation'
    | 'in-progress'
    | 'not-done'
    | 'on-hold'
    | 'stopped'
    | 'completed'
    | 'entered-in-error'
    | 'unknown';
  code?: CodeableConcept;
  subject: Reference;
  encounter?: Reference;
  performedDateTime?: string;
  performedPeriod?: Period;
  note?: { text: string }[];
}

export interface MedicationAdministration extends Base<'MedicationAdministration'> {
  status:
    | 'in-progress'
    | 'not-done'
    | 'on-hold'
    | 'completed'
    | 'entered-in-error'
    | 'stopped'
    | 'unknown';
  medicationCodeableConcept: CodeableConcept;
  subject: Reference;
  context?: Reference;
  effectiveDateTime: string;
  dosage?: { route?: CodeableConcept; dose?: Quantity; text?: string };
}

export interface Condition extends Base<'Condition'> {
  clinicalStatus?: CodeableConcept;
  verificationStatus?: CodeableConcept;
  code?: CodeableConcept;
  subject: Reference;
  encounter?: Reference;
  onsetDateTime?: string;
  abatementDateTime?: string;
}

export type Resource =
  | Patient
  | Encounter
  | Location
  | Organization
  | Observation
  | Procedure
  | MedicationAdministration
  | Condition;

export interface Bundle {
  resourceType: 'Bundle';
  id?: string;
  identifier?: Identifier;
  type: 'collection';
  timestamp?: string;
  entry: { fullUrl: string; resource: Resource }[];
}
