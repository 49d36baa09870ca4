/**
 * The one table of plain words for every internal value a user can meet: screens, the PDF,
 * CSV headers and e-mail all read it, so "rosc-not-sustained" or "critical" never reaches a
 * reader. The API keeps its values (CONTRACT.md); only what people see is worded here.
 * Each table is typed by its enum, so a new value fails the type check until it is worded.
 */
import type { Etco2Source, FindingKind, PauseContext, Severity } from './analysis.js';
import type { Role } from './common.js';
import type { DrugName, Rhythm } from './events.js';
import type { SimulatorScenario } from './monitor.js';
import type { ReviewStatus } from './quality.js';
import type { SpcMeasure } from './spc.js';

type Words<K extends string> = Readonly<Record<K, string>>;

export const resuscitationStatusLabels: Words<'open' | 'closed' | 'signed'> = {
  open: 'In progress',
  closed: 'Ended, not signed',
  signed: 'Signed',
};

export const outcomeLabels: Words<
  'rosc-sustained' | 'rosc-not-sustained' | 'died' | 'transferred'
> = {
  'rosc-sustained': 'ROSC, sustained',
  'rosc-not-sustained': 'ROSC, not sustained',
  died: 'Died',
  transferred: 'Transferred',
};

/**
 * The End choices as the recorder sees them. `rosc-sustained` keeps its contract name but
 * reads "ROSC at end of record": a tap cannot know that ROSC lasted the 20 min that Utstein
 * calls sustained (Nolan 2019); the analysis decides that from the times.
 */
export const endReasonLabels: Words<'rosc-sustained' | 'terminated' | 'transferred'> = {
  'rosc-sustained': 'ROSC at end of record',
  terminated: 'Terminated',
  transferred: 'Transferred',
};

export const rhythmLabels: Words<Rhythm> = {
  vf: 'VF',
  pvt: 'Pulseless VT',
  pea: 'PEA',
  asystole: 'Asystole',
  organised: 'Organised rhythm',
};

/** The committee's grouping of first rhythms (Utstein: shockable / non-shockable). */
export const rhythmGroupLabels: Words<'shockable' | 'non-shockable'> = {
  shockable: 'Shockable',
  'non-shockable': 'Non-shockable',
};

export const drugLabels: Words<DrugName> = {
  epinephrine: 'Epinephrine',
  amiodarone: 'Amiodarone',
  lidocaine: 'Lidocaine',
  'sodium-bicarbonate': 'Sodium bicarbonate',
  calcium: 'Calcium',
  magnesium: 'Magnesium',
  other: 'Other drug',
};

export const routeLabels: Words<'iv' | 'io'> = { iv: 'IV', io: 'IO' };

export const airwayDeviceLabels: Words<'bag-mask' | 'supraglottic' | 'tracheal-tube'> = {
  'bag-mask': 'Bag-mask',
  supraglottic: 'Supraglottic airway',
  'tracheal-tube': 'Tracheal tube',
};

export const airwayConfirmationLabels: Words<
  'waveform-capnography' | 'colorimetric' | 'auscultation' | 'none'
> = {
  'waveform-capnography': 'waveform capnography',
  colorimetric: 'colorimetric CO2 detector',
  auscultation: 'auscultation',
  none: 'not confirmed',
};

export const findingKindLabels: Words<FindingKind> = {
  'etco2-low': 'Low EtCO2',
  'etco2-rise': 'EtCO2 rise',
  'etco2-prognosis-caution': 'EtCO2 after 20 min',
  'pause-long': 'Long pause',
  'preshock-pause-long': 'Long pre-shock pause',
  'rhythm-check-late': 'Late rhythm check',
  'epinephrine-interval': 'Epinephrine interval',
  'ventilation-fast': 'Fast ventilation',
  'waveform-absent': 'No waveform',
  'airway-unconfirmed': 'Airway unconfirmed',
  rebreathing: 'Rebreathing',
};

/** Findings are for review after the code, so their levels are named for review, not alarms. */
export const severityLabels: Words<Severity> = {
  info: 'Note',
  warning: 'Review',
  critical: 'Priority review',
};

export const confounderLabels: Words<'sodium-bicarbonate' | 'ventilation'> = {
  'sodium-bicarbonate': 'after sodium bicarbonate',
  ventilation: 'after a ventilation change',
};

export const pauseContextLabels: Words<PauseContext> = {
  'pre-shock': 'Around a shock',
  'post-shock': 'After a shock',
  'rhythm-check': 'Rhythm check',
  airway: 'Airway',
  unexplained: 'No reason recorded',
};

export const simulatorScenarioLabels: Words<SimulatorScenario> = {
  'poor-cpr': 'Poor CPR',
  'improving-cpr': 'Improving CPR',
  rosc: 'ROSC',
  'dislodged-tube': 'Dislodged tube',
};

export const reviewStatusLabels: Words<ReviewStatus | 'awaiting'> = {
  awaiting: 'Awaiting review',
  pending: 'Awaiting review',
  reviewed: 'Reviewed',
  'needs-follow-up': 'Needs follow-up',
};

export const roleLabels: Words<Role> = {
  recorder: 'Recorder',
  lead: 'Lead',
  quality: 'Quality committee',
  admin: 'Administrator',
};

export const ageGroupLabels: Words<'adult' | 'child' | 'infant'> = {
  adult: 'Adult',
  child: 'Child',
  infant: 'Infant',
};

export const etco2SourceLabels: Words<Etco2Source> = {
  manual: 'Entered',
  stream: 'Monitor link',
  import: 'Monitor file',
  waveform: 'Capnogram',
};

/** Each control-chart measure as the committee reads it (Trends, its printout). */
export const spcMeasureLabels: Words<SpcMeasure> = {
  anyRosc: 'Any ROSC (share of records)',
  compressionFractionMet: 'Compression fraction at or above target (share of records)',
  etco2Documented: 'EtCO2 documented (share of records)',
  compressionFraction: 'Median compression fraction',
  timeToFirstShockSec: 'Median time to first shock, shockable (s)',
  timeToFirstEpinephrineSec: 'Median time to first epinephrine, non-shockable (s)',
};

export const mailStatusLabels: Words<'queued' | 'sent' | 'failed'> = {
  queued: 'Waiting to send',
  sent: 'Sent',
  failed: 'Not sent',
};

/** What an audit entry records; an action not worded here reads with its hyphens as spaces. */
export const auditActionLabels: Readonly<Record<string, string>> = {
  'sign-in': 'Signed in',
  'sign-in.failed': 'Failed sign-in',
  'sign-in.throttled': 'Sign-ins held back (too many attempts)',
  'sign-out': 'Signed out',
  create: 'Record started',
  update: 'Record changed',
  append: 'Entries added',
  'discard-refused': 'Refused entries discarded',
  import: 'Monitor file imported',
  sign: 'Record signed',
  amend: 'Record amended',
  review: 'Record reviewed',
  email: 'Debrief e-mailed',
  'export.pdf': 'PDF exported',
  'export.fhir': 'FHIR exported',
  'export.csv': 'CSV exported',
  'profile.create': 'Protocol profile saved',
  'site.create': 'Site created',
  'site.update': 'Site changed',
  'unit.create': 'Unit added',
  'unit.rename': 'Unit renamed',
  'user.invite': 'User invited',
  'user.update': 'User changed',
  'user.reset-password': 'Password reset sent',
  'user.set-password': 'Password set',
};

export const auditEntityLabels: Readonly<Record<string, string>> = {
  resuscitation: 'Record',
  user: 'User',
  site: 'Site',
  'protocol-profile': 'Protocol profile',
  import: 'Monitor file',
  syncItems: 'Tablet entries',
  records: 'Records list',
  utstein: 'Utstein summary',
  'audit-log': 'Audit log',
};

/**
 * The word for a value from one of the tables above; "—" when there is no value. A value the
 * table does not know (an older record, a newer server) is shown with its hyphens as spaces
 * rather than dropped, so nothing recorded disappears from view.
 */
export function labelOf<K extends string>(
  table: Readonly<Record<K, string>>,
  value: string | null | undefined,
): string {
  if (value === null || value === undefined || value === '') return '—';
  return (table as Readonly<Record<string, string>>)[value] ?? value.replace(/-/g, ' ');
}

/** Yes / No / — for the Utstein yes-no elements (witnessed, monitored). */
export function yesNo(value: boolean | null | undefined): string {
  return value === null || value === undefined ? '—' : value ? 'Yes' : 'No';
}
