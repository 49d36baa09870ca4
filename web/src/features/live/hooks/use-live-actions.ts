import type { EventData, EventKind, PatchResuscitation } from '@upstroke/contracts';
import { useCallback, useMemo, useRef } from 'react';
import { recordEtco2, recordEvent, updateResuscitation } from '../../../lib/offline';
import { closingCandidate } from '../lib/end-summary';
import type { LiveState } from '../lib/live-state';
import type { UndoTarget } from '../lib/undo-target';

type EndReason = NonNullable<PatchResuscitation['endReason']>;

/**
 * Taps → IndexedDB. Undo writes a correction that supersedes the newest entry in force
 * (event or typed EtCO2 value) and says what it took back. Every handler keeps its identity
 * until what it depends on changes, so the memoised parts of the Live screen do not redraw
 * on each tap.
 */
export function useLiveActions(
  id: string,
  arrestAt: string,
  state: LiveState,
  target: UndoTarget | null,
  etco2Unit: 'mmHg' | 'kPa',
) {
  const record = useCallback(
    <K extends EventKind>(kind: K, data: EventData<K>) => void recordEvent(id, kind, data),
    [id],
  );
  const { compressing } = state;
  const toggleCompressions = useCallback(
    () => record(compressing ? 'compressions-stop' : 'compressions-start', {}),
    [record, compressing],
  );
  const undo = useCallback((): string | null => {
    if (!target) return null;
    // The reason names the entry, so the debrief and the PDF say what was taken back.
    record('correction', {
      supersedes: target.id,
      reason: `Undo on the Live screen: ${target.label}`,
    });
    return target.label;
  }, [record, target]);
  const rosc = useCallback(() => record('rosc', {}), [record]);
  const rearrest = useCallback(() => record('rearrest', {}), [record]);
  // Read at the End tap only: the handler need not change with every event.
  const now = useRef(state);
  now.current = state;
  const end = useCallback(
    (reason: EndReason) => {
      const at = new Date();
      void recordEvent(id, 'end', { reason }, { at: at.toISOString() });
      void updateResuscitation(id, closingCandidate(reason, now.current, arrestAt, at.getTime()));
    },
    [id, arrestAt],
  );
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
    () => ({ record, toggleCompressions, undo, rosc, rearrest, end, etco2, etco2At, note }),
    [record, toggleCompressions, undo, rosc, rearrest, end, etco2, etco2At, note],
  );
}
