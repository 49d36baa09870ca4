import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import {
  etco2SourceSchema,
  findingKindSchema,
  pauseContextSchema,
  severitySchema,
} from './analysis.js';
import { ageGroupSchema, roleSchema } from './common.js';
import { eventDetails, eventLabel } from './event-labels.js';
import {
  airwayConfirmationSchema,
  airwayDeviceSchema,
  drugNameSchema,
  endReasonSchema,
  rhythmSchema,
} from './events.js';
import * as L from './labels.js';
import { simulatorScenarioSchema } from './monitor.js';
import { reviewStatusSchema } from './quality.js';
import { outcomeSchema, resuscitationStatusSchema } from './resuscitations.js';

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
];

describe('label table', () => {
  it.each(tables)('words every %s value, and none is the raw code', (_, schema, table) => {
    for (const value of schema.options as string[]) {
      const word = L.labelOf(table, value);
      expect(word.length).toBeGreaterThan(1);
      // "rosc" → "ROSC" is fine; a lower-case hyphenated code is not a word for people.
      if (value.includes('-')) expect(word).not.toBe(value);
    }
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
