import { describe, expect, it } from 'vitest';
import type { LocalResuscitation } from '../../../lib/offline';
import { recordRows } from './records-panel';

const server = (id: string, status: 'open' | 'closed' | 'signed') =>
  ({
    id,
    arrestAt: '2026-03-04T10:00:00Z',
    status,
    unitName: 'ICU North',
    location: 'Bed 4',
  }) as never;
const local = (id: string, status: string) =>
  ({ id, arrestAt: '2026-03-04T11:00:00Z', status, location: 'Bay 1' }) as LocalResuscitation;

describe('recordRows', () => {
  it('opens ended or signed records in Debrief and only running ones in Live', () => {
    const rows = recordRows(
      [],
      [server('a', 'open'), server('b', 'closed'), server('c', 'signed')],
      true,
      true,
    );
    expect(rows.map((r) => r.to)).toEqual(['/live/a', '/debrief/b', '/debrief/c']);
    expect(rows[0].detail).toBe('ICU North · Bed 4');
  });

  it('sends readers who do not record to Debrief, and a code ended here to Debrief', () => {
    expect(recordRows([], [server('a', 'open')], false, true)[0].to).toBe('/debrief/a');
    const rows = recordRows([local('a', 'closed')], [server('a', 'open')], true, true);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ to: '/debrief/a', status: 'closed' });
  });

  it("lists this device's unsynced ended codes only on the first unfiltered page", () => {
    expect(recordRows([local('x', 'closed')], [], true, true).map((r) => r.id)).toEqual(['x']);
    expect(recordRows([local('x', 'closed')], [], true, false)).toEqual([]);
  });
});
