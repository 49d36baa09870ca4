/**
 * FHIR R4 resource shapes used by the export, from @types/fhir's R4 module (hl7.org/fhir/R4).
 * `Resource` narrows the bundle to the resources this export writes.
 */
import type {
  Condition,
  Encounter,
  Location,
  MedicationAdministration,
  Observation,
  Organization,
  Patient,
  Procedure,
  Provenance,
} from 'fhir/r4';

export type {
  Bundle,
  CodeableConcept,
  Coding,
  Condition,
  Encounter,
  Identifier,
  Location,
  MedicationAdministration,
  Observation,
  Organization,
  Patient,
  Period,
  Procedure,
  Provenance,
  Quantity,
  Reference,
  SampledData,
} from 'fhir/r4';

export type Resource =
  | Patient
  | Encounter
  | Location
  | Organization
  | Observation
  | Procedure
  | MedicationAdministration
  | Provenance
  | Condition;
