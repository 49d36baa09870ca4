import { randomUUID } from 'node:crypto';
import { demoSiteId, demoUnits } from './test-app';

/** Test data builders with overrides (invented values, not clinical proof). */
export function aResuscitation(overrides: Record<string, unknown> = {}) {
  return {
    id: randomUUID(),
    siteId: demoSiteId,
    unitId: demoUnits[0].id,
    arrestAt: '2026-03-04T10:00:00Z',
    ...overrides,
  };
}

export function anEvent(
  kind: string,
  secondsAfterArrest: number,
  data: Record<string, unknown> = {},
) {
  const at = new Date(Date.parse('2026-03-04T10:00:00Z') + secondsAfterArrest * 1000).toISOString();
  return { id: randomUUID(), at, kind, data };
}

export function anEtco2(secondsAfterArrest: number, value: number, unit = 'mmHg') {
  const at = new Date(Date.parse('2026-03-04T10:00:00Z') + secondsAfterArrest * 1000).toISOString();
  return { id: randomUUID(), at, value, unit, source: 'manual' };
}
