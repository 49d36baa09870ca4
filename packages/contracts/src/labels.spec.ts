import { describe, expect, it } from 'vitest';
import { z } from 'zod';

const zodEnum = z.ZodEnum;
import {
  etco2SourceSchema,
  findingKindSchema,
  pauseContextSchema,
  severitySchema,
} from './analysis.js';
import { ageGroupSchema, roleSchema } from './common.js';
import { mailStatusSchema } from './debrief.js';
import {
  eventDetails,
  eventKindLabels,
  eventLabel,
  eventMarkerCodes,
  rosterRoleLabels,
} from './event-labels.js';
import {
  accessRouteSchema,
  airwayConfirmationSchema,
  airwayDeviceSchema,
  drugNameSchema,
  endReasonSchema,
  eventKindSchema,
  rhythmSchema,
} from './events.js';
import * as contracts from './index.js';
import * as L from './labels.js';
import { simulatorScenarioSchema } from './monitor.js';
import { reviewStatusSchema } from './quality.js';
import { outcomeSchema, resuscitationStatusSchema } from './resuscitations.js';
import { rosterRoleSchema } from './site-context.js';
import { spcMeasureSchema } from './spc.js';

const tables: [string, z.ZodEnum, Readonly<Record<string, string>>][] = [
  ['status', resuscitationStatusSchema, L.resuscitationStatusLabels],
  ['outcome', outcomeSchema, L.outcomeLabels],
  ['end reason', endReasonSchema, L.endReasonLabels],
  ['rhythm', rhythmSchema, L.rhythmLabels],
  ['drug', drugNameSchema, L.drugLabels],
  ['airway', airwayDeviceSchema, L.airwayDeviceLabels],
  ['confirmation', airwayConfirmationSchema, L.airwayConfirmationLabels],
  ['finding', findingKindSchema, L.findingKindLabels],
  ['severity', severitySchema, L.severityLabels],
  ['pause', pauseContextSchema, L.pauseContextLabels],
  ['scenario', simulatorScenarioSchema, L.simulatorScenarioLabels],
  ['review', reviewStatusSchema, L.reviewStatusLabels],
  ['role', roleSchema, L.roleLabels],
  ['age group', ageGroupSchema, L.ageGroupLabels],
  ['source', etco2SourceSchema, L.etco2SourceLabels],
  ['route', accessRouteSchema, L.routeLabels],
  ['mail status', mailStatusSchema, L.mailStatusLabels],
  ['event kind', eventKindSchema, eventKindLabels],
  ['team role', rosterRoleSchema, rosterRoleLabels],
  ['control-chart measure', spcMeasureSchema, L.spcMeasureLabels],
];

/**
 * Exported enums whose values are never shown as such, with the reason. Any other exported
 * enum must have a table above: a new enum, or a new value, without words fails here.
 */
const notShown: Record<string, string> = {
  paperSizeSchema: 'A4 and Letter are already the words people use',
  co2UnitSchema: 'units (mmHg, kPa, %) are the trade’s own symbols',
  etco2DisplayUnitSchema: 'units (mmHg, kPa) are the trade’s own symbols',
  clockSchema: 'the site form words each choice (24-hour, 12-hour) beside an example',
  patientStateSchema: 'steers Live’s buttons and prompts; never printed',
  offsetMethodSchema: 'the import dialog words the offset in sentences',
  trendMeasureSchema: 'a query parameter; each chart has its own title',
  spcProportionSchema: 'a subset of the control-chart measures (worded there)',
  spcContinuousSchema: 'a subset of the control-chart measures (worded there)',
  spcRuleSchema: 'the API sends each rule in words with its source',
  timelineShadeKindSchema: 'drawn as shaded bands with a legend in words',
};

describe('label table', () => {
  it.each(tables)('words every %s value, and none is the raw code', (_, schema, table) => {
    for (const value of schema.options as string[]) {
      expect(Object.keys(table), `no words for "${value}"`).toContain(value);
      const word = L.labelOf(table, value);
      expect(word.length).toBeGreaterThan(1);
      // "rosc" → "ROSC" is fine; a lower-case hyphenated code is not a word for people.
      if (value.includes('-')) expect(word).not.toBe(value);
    }
  });

  it('has a table for every exported enum, or a reason it is never shown', () => {
    const worded = new Set(tables.map(([, schema]) => schema));
    const enums = Object.entries(contracts).filter(
      ([name, v]) => name.endsWith('Schema') && v instanceof zodEnum,
    );
    expect(enums.length).toBeGreaterThan(20);
    const missing = enums
      .filter(([name, v]) => !worded.has(v as z.ZodEnum) && !(name in notShown))
      .map(([name]) => name);
    expect(missing).toEqual([]);
  });

  it('has a timeline marker for every event kind but the compression periods', () => {
    const drawnAsPeriods = ['compressions-start', 'compressions-stop', 'correction'];
    for (const kind of eventKindSchema.options)
      if (!drawnAsPeriods.includes(kind)) expect(eventMarkerCodes[kind], kind).toBeTruthy();
  });

  it('names severities for review, not alarms', () => {
    expect(severitySchema.options.map((s) => L.severityLabels[s])).toEqual([
      'Note',
      'Review',
      'Priority review',
    ]);
    expect(Object.values(L.severityLabels).join(' ')).not.toMatch(/critical|warning|alarm/i);
  });

  it('shows a dash for no value and spaces for a value it does not know', () => {
    expect(L.labelOf(L.outcomeLabels, null)).toBe('—');
    expect(L.labelOf(L.outcomeLabels, 'left-against-advice')).toBe('left against advice');
    expect(L.yesNo(true)).toBe('Yes');
    expect(L.yesNo(null)).toBe('—');
  });

  it('writes routes, confirmations and end reasons in words in event details', () => {
    expect(eventLabel('drug', { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'io' })).toBe(
      'Epinephrine 1 mg IO',
    );
    expect(eventDetails('airway', { device: 'tracheal-tube', confirmation: 'none' })).toBe(
      'Tracheal tube, not confirmed',
    );
    expect(eventDetails('end', { reason: 'rosc-sustained' })).toBe('ROSC at end of record');
    expect(eventDetails('rhythm', { rhythm: 'pvt' })).toBe('Pulseless VT');
  });
});
