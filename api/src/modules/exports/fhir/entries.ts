import { eventsInForce } from '@upstroke/capno';
import { type DebriefEvent, drugName } from '@upstroke/contracts';
import type * as R4 from './r4';
import type { Ctx } from './resources';

/** Our own code system for event kinds that have no checked standard code here. */
export const UPSTROKE_EVENT = 'urn:upstroke:event-kind';

interface CorrectionData {
  reason?: string;
  replacement?: { kind: string; data: Record<string, unknown>; at: string };
}

const correctionOf = (e: DebriefEvent | undefined) =>
  e?.kind === 'correction' ? (e.data as CorrectionData) : undefined;

function shockProcedure(ctx: Ctx, e: DebriefEvent): R4.Procedure {
  return {
    resourceType: 'Procedure',
    status: 'completed',
    // No standard code is asserted here (not checked); our own code plus plain text.
    code: {
      coding: [{ system: UPSTROKE_EVENT, code: 'shock', display: 'Defibrillation shock' }],
      text: 'Defibrillation shock',
    },
    subject: ctx.subject,
    encounter: ctx.encounter,
    performedDateTime: e.at,
    note: typeof e.data.energyJ === 'number' ? [{ text: `${e.data.energyJ} J` }] : undefined,
  };
}

function medicationOf(ctx: Ctx, e: DebriefEvent): R4.MedicationAdministration {
  const dose =
    typeof e.data.dose === 'number' && typeof e.data.unit === 'string'
      ? {
          value: e.data.dose,
          unit: e.data.unit,
          system: 'http://unitsofmeasure.org',
          code: e.data.unit,
        }
      : undefined;
  const route =
    typeof e.data.route === 'string'
      ? { text: e.data.route === 'io' ? 'Intraosseous' : 'Intravenous' }
      : undefined;
  return {
    resourceType: 'MedicationAdministration',
    status: 'completed',
    medicationCodeableConcept: {
      coding: [{ system: 'urn:upstroke:drug', code: String(e.data.drug) }],
      text: drugName(e.data),
    },
    subject: ctx.subject,
    context: ctx.encounter,
    effectiveDateTime: e.at,
    dosage: dose || route ? { dose, route } : undefined,
  };
}

type Entry = [key: string, resource: R4.Resource];

/** The bundle key of a drug's or a shock's resource, or null for other kinds. */
const keyOf = (kind: string, id: string) =>
  kind === 'shock' || kind === 'drug' ? `${kind}/${id}` : null;

/** The resource for a drug or a shock (keyed by event id), or none for other kinds. */
function resourceOf(ctx: Ctx, e: DebriefEvent): Entry | undefined {
  const key = keyOf(e.kind, e.id);
  if (!key) return undefined;
  return [key, e.kind === 'shock' ? shockProcedure(ctx, e) : medicationOf(ctx, e)];
}

const withNote = (entry: Entry, text: string): Entry => {
  const r = entry[1] as R4.Procedure | R4.MedicationAdministration;
  return [entry[0], { ...r, note: [...(r.note ?? []), { text }] }];
};

function who(c: DebriefEvent): string {
  return c.recordedByName ?? c.recordedBy ?? 'unknown';
}

/**
 * A replacement's Provenance (FHIR R4 Provenance): the replacement is its target, the struck
 * resource its entity with role `revision`, the correction's time, author and reason; the
 * activity is UPDATE (HL7 v3-DataOperation; REFERENCE.md: FHIR R4, from memory).
 */
function provenanceOf(ctx: Ctx, c: DebriefEvent, target: string, struck: string): Entry {
  const reason = correctionOf(c)?.reason;
  const resource: R4.Provenance = {
    resourceType: 'Provenance',
    target: [{ reference: ctx.url(target) }],
    recorded: c.at,
    activity: {
      coding: [
        { system: 'http://terminology.hl7.org/CodeSystem/v3-DataOperation', code: 'UPDATE' },
      ],
      text: c.amendment ? 'Amended after signing' : 'Corrected while recording',
    },
    reason: reason ? [{ text: reason }] : undefined,
    agent: [{ who: { display: who(c) } }],
    entity: [{ role: 'revision', what: { reference: ctx.url(struck) } }],
  };
  return [`provenance/${c.id}`, resource];
}

/**
 * The drugs and shocks of the record as FHIR resources. Those in force are `completed` (a
 * replacement keyed by its correction, with a note naming the correction); an entry struck by
 * a correction stays, with status `entered-in-error` (R4 MedicationAdministration and
 * Procedure status) and a note saying why; each replacement has a Provenance linking it to
 * the entry it replaced.
 */
export function clinicalEntries(ctx: Ctx): Entry[] {
  const events = ctx.d.events;
  const byId = new Map(events.map((e) => [e.id, e]));
  const out: Entry[] = [];
  for (const e of eventsInForce(events)) {
    const entry = resourceOf(ctx, e);
    const c = correctionOf(byId.get(e.id));
    if (!entry) continue;
    const why = c?.reason ? `: ${c.reason}` : '';
    out.push(c ? withNote(entry, `Replaces an entry entered in error${why}`) : entry);
  }
  for (const e of events) {
    const c = e.supersededBy ? byId.get(e.supersededBy) : undefined;
    const entry = c && e.kind !== 'correction' ? resourceOf(ctx, e) : undefined;
    if (!c || !entry) continue;
    const data = correctionOf(c);
    const why = `${data?.replacement ? 'Replaced' : 'Taken back'}${data?.reason ? `: ${data.reason}` : ''}`;
    const [key, r] = withNote(entry, why);
    out.push([key, { ...r, status: 'entered-in-error' } as R4.Resource]);
    const replaced = data?.replacement && keyOf(data.replacement.kind, c.id);
    if (replaced) out.push(provenanceOf(ctx, c, replaced, key));
  }
  return out;
}
