import type { EventData, EventKind } from '@upstroke/contracts';
import { useCallback } from 'react';
import { recordEtco2, recordEvent } from '../../../lib/offline';
import type { LiveState } from '../lib/live-state';

/** Taps → IndexedDB. Undo writes a correction that supersedes the newest event in force. */
export function useLiveActions(id: string, state: LiveState, etco2Unit: 'mmHg' | 'kPa') {
  const record = useCallback(
    <K extends EventKind>(kind: K, data: EventData<K>) => void recordEvent(id, kind, data),
    [id],
  );
  const toggleCompressions = () =>
    record(state.compressing ? 'compressions-stop' : 'compressions-start', {});
  const undo = () => {
    if (state.undoable)
      record('correction', { supersedes: state.undoable.id, reason: 'Undo on the Live screen' });
  };
  const etco2 = (value: number) => void recordEtco2(id, value, etco2Unit);
  const note = useCallback((text: string) => record('note', { text }), [record]);
  /** Per-breath EtCO2 from the monitor link (already in mmHg, with its own time). */
  const etco2At = (mmHg: number, at: string) =>
    recordEtco2(id, mmHg, 'mmHg', { at, source: 'stream' });
  return { record, toggleCompressions, undo, etco2, etco2At, note };
}
