/**
 * Plain words for events, findings and closing details, shared by the Debrief screen, the
 * PDF and the FHIR export so that the record reads the same everywhere.
 */
import {
  airwayConfirmationLabels,
  airwayDeviceLabels,
  drugLabels,
  endReasonLabels,
  labelOf,
  rhythmLabels,
  routeLabels,
} from './labels.js';
import type { RosterRole } from './site-context.js';

export const eventKindLabels: Record<string, string> = {
  arrest: 'Arrest',
  'compressions-start': 'Compressions on',
  'compressions-stop': 'Compressions off',
  shock: 'Shock',
  drug: 'Drug',
  airway: 'Airway',
  ventilation: 'Ventilation change',
  rhythm: 'Rhythm',
  pulse: 'Pulse check',
  rosc: 'ROSC',
  rearrest: 'Re-arrest',
  access: 'Access',
  note: 'Note',
  end: 'End',
  correction: 'Correction',
};

export function rhythmName(r: string | null | undefined): string {
  return labelOf(rhythmLabels, r);
}

export function drugName(data: Record<string, unknown>): string {
  const d = String(data.drug ?? 'other');
  // A named preparation ("Calcium chloride 10 %") is shown by its name.
  return typeof data.name === 'string' && data.name ? data.name : labelOf(drugLabels, d);
}

function str(v: unknown): string {
  return typeof v === 'string' || typeof v === 'number' ? String(v) : '';
}

/** The details column of an event: what was given, found or decided. */
export function eventDetails(kind: string, data: Record<string, unknown>): string {
  switch (kind) {
    case 'arrest': {
      const parts = [];
      if (typeof data.witnessed === 'boolean')
        parts.push(data.witnessed ? 'witnessed' : 'unwitnessed');
      if (typeof data.monitored === 'boolean')
        parts.push(data.monitored ? 'monitored' : 'not monitored');
      return parts.join(', ');
    }
    case 'shock':
      return `${str(data.energyJ)} J`;
    case 'drug': {
      const dose = data.dose !== undefined ? `${str(data.dose)} ${str(data.unit)}`.trim() : '';
      const route = data.route ? labelOf(routeLabels, str(data.route)) : '';
      return [drugName(data), dose, route].filter(Boolean).join(' ');
    }
    case 'airway': {
      const how = str(data.confirmation);
      const conf = !how
        ? ''
        : how === 'none'
          ? ', not confirmed'
          : `, confirmed by ${labelOf(airwayConfirmationLabels, how)}`;
      return `${labelOf(airwayDeviceLabels, str(data.device))}${conf}`;
    }
    case 'ventilation':
      return data.ratePerMin !== undefined ? `${str(data.ratePerMin)} /min` : '';
    case 'rhythm':
      return rhythmName(str(data.rhythm));
    case 'pulse':
      return data.present ? 'pulse present' : 'no pulse';
    case 'access':
      return labelOf(routeLabels, str(data.route));
    case 'note':
      return str(data.text);
    case 'end':
      return data.reason ? labelOf(endReasonLabels, str(data.reason)) : '';
    case 'correction':
      return correctionDetails(data);
    default:
      return '';
  }
}

/** A correction in words: what replaced the entry (if anything) and why. */
function correctionDetails(data: Record<string, unknown>): string {
  const reason = typeof data.reason === 'string' ? data.reason : '';
  const r = data.replacement as { kind?: unknown; data?: unknown } | undefined;
  if (!r || typeof r.kind !== 'string' || !r.data || typeof r.data !== 'object') return reason;
  const now = `Replaced by ${eventLabel(r.kind, r.data as Record<string, unknown>)}`;
  return reason ? `${now}. Reason: ${reason}` : now;
}

/** One line for an event: "Shock 200 J", "Drug Epinephrine 1 mg IV". */
export function eventLabel(kind: string, data: Record<string, unknown>): string {
  if (kind === 'drug') return eventDetails(kind, data);
  const details = eventDetails(kind, data);
  const name = eventKindLabels[kind] ?? kind;
  return details && kind !== 'note' ? `${name}: ${details}` : name;
}

/** "12:05" from seconds after the arrest ("-0:10" before it). */
export function clockFromArrest(sec: number): string {
  const sign = sec < 0 ? '-' : '';
  const s = Math.round(Math.abs(sec));
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const r = String(s % 60).padStart(2, '0');
  return h > 0 ? `${sign}${h}:${String(m).padStart(2, '0')}:${r}` : `${sign}${m}:${r}`;
}

/** What each measure on the Debrief screen and in the PDF means (help text). */
export const measureDefinitions = {
  duration: 'From the arrest (time zero) to the end of the record.',
  compressionFraction:
    'Time with compressions on ÷ time without circulation (arrest to first ROSC or end, leaving out intervals with a pulse). Goal > 80 % (Meaney 2013).',
  longestPause: 'The longest interval with compressions off while there was no circulation.',
  preShockPauses:
    'Pauses around a shock: compressions off to the shock (pre-shock) and the whole pause. Interruptions should stay < 10 s (AHA).',
  firstShock: 'Time from the arrest to the first shock.',
  firstEpinephrine: 'Time from the arrest to the first epinephrine dose.',
  epinephrineIntervals:
    'Time between successive epinephrine doses; guidelines give every 3–5 min (AHA 2020).',
  ventilationRate: 'Median breaths per minute from the capnogram (breath to breath).',
  etco2Median: 'Median EtCO2 during compressions, from every source (entered, streamed, imported).',
  etco2Above10:
    'Share of compression time with EtCO2 at or above 10 mmHg = 1.3 kPa (AHA 2020 adult ALS: below it suggests poor CPR).',
  etco2AboveTarget:
    "Share of compression time with EtCO2 at or above the site's target (protocol profile; default 20 mmHg = 2.7 kPa, Meaney 2013 CPR quality consensus).",
} as const;

/**
 * Our own short marker for each event kind on a timeline (screen and PDF; each shows the
 * legend below). Compressions on/off have none: both draw them as shaded periods. Plain letters, so that every font can draw them, and chosen so that none
 * reads as a drug or another abbreviation of the trade: not "A" (adrenaline), "CA"
 * (calcium), "IV" (access is IV or IO), "E"/"M" (single letters read as drug initials).
 */
export const eventMarkerCodes: Record<string, string> = {
  arrest: 'T0',
  shock: 'Shk',
  drug: 'Med',
  airway: 'Aw',
  ventilation: 'Vnt',
  rhythm: 'Rhy',
  pulse: 'Pls',
  rosc: 'ROSC',
  rearrest: 'ReA',
  access: 'Acc',
  note: 'Nte',
  end: 'End',
};

/** The marker for epinephrine, the drug whose timing the debrief follows. */
export const epinephrineMarkerCode = 'Epi';

/** What each marker code means, in drawing order: the legend on the screen and the PDF. */
export const eventMarkerLegend: readonly { code: string; meaning: string }[] = [
  { code: eventMarkerCodes.arrest, meaning: 'Arrest (time zero)' },
  { code: eventMarkerCodes.shock, meaning: 'Shock' },
  { code: epinephrineMarkerCode, meaning: 'Epinephrine (adrenaline)' },
  { code: eventMarkerCodes.drug, meaning: 'Other drug' },
  { code: eventMarkerCodes.airway, meaning: 'Airway' },
  { code: eventMarkerCodes.ventilation, meaning: 'Ventilation change' },
  { code: eventMarkerCodes.rhythm, meaning: 'Rhythm' },
  { code: eventMarkerCodes.pulse, meaning: 'Pulse check' },
  { code: eventMarkerCodes.rosc, meaning: 'ROSC' },
  { code: eventMarkerCodes.rearrest, meaning: 'Re-arrest' },
  { code: eventMarkerCodes.access, meaning: 'Vascular access (IV or IO)' },
  { code: eventMarkerCodes.note, meaning: 'Note' },
  { code: eventMarkerCodes.end, meaning: 'End of the code' },
];

/** Team roles in plain words (roster dialog, debrief e-mail). */
export const rosterRoleLabels: Record<RosterRole, string> = {
  lead: 'Lead',
  compressor: 'Compressions',
  airway: 'Airway',
  drugs: 'Drugs',
  recorder: 'Recorder',
};

export function rosterRoleLabel(role: RosterRole): string {
  return rosterRoleLabels[role];
}
