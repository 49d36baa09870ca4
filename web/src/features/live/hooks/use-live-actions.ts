import type { EventData, EventKind } from '@upstroke/contracts';
import { useCallback, useMemo } from 'react';
import { recordEtco2, recordEvent } from '../../../lib/offline';
import type { LiveState } from '../lib/live-state';

/**
 * Taps → IndexedDB. Undo writes a correction that supersedes the newest event in force.
 * Every handler keeps its identity until what it depends on changes, so the memoised parts
 * of the Live screen do not redraw on each tap.
 */
export function useLiveActions(id: string, state: LiveState, etco2Unit: 'mmHg' | 'kPa') {
  const record = useCallback(
    <K extends EventKind>(kind: K, data: EventData<K>) => void recordEvent(id, kind, data),
    [id],
  );
  const { compressing } = state;
  const undoable = state.undoable?.id ?? null;
  const toggleCompressions = useCallback(
    () => record(compressing ? 'compressions-stop' : 'compressions-start', {}),
    [record, compressing],
  );
  const undo = useCallback(() => {
    if (undoable) record('correction', { supersedes: undoable, reason: 'Undo on the Live screen' });
  }, [record, undoable]);
  const rosc = useCallback(() => record('rosc', {}), [record]);
  const rearrest = useCallback(() => record('rearrest', {}), [record]);
  const etco2 = useCallback(
    (value: number) => void recordEtco2(id, value, etco2Unit),
    [id, etco2Unit],
  );
  const note = useCallback((text: string) => record('note', { text }), [record]);
  /** Per-breath EtCO2 from the monitor link (already in mmHg, with its own time). */
  const etco2At = useCallback(
    (mmHg: number, at: string) => void recordEtco2(id, mmHg, 'mmHg', { at, source: 'stream' }),
    [id],
  );
  return useMemo(
    () => ({ record, toggleCompressions, undo, rosc, rearrest, etco2, etco2At, note }),
    [record, toggleCompressions, undo, rosc, rearrest, etco2, etco2At, note],
  );
}
