import { Box, Stack } from '@mui/material';
import type { Etco2DisplayUnit } from '@upstroke/contracts';
import {
  type ComponentType,
  Suspense,
  useCallback,
  useDeferredValue,
  useEffect,
  useMemo,
  useState,
} from 'react';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import type { LocalResuscitation } from '../../../lib/offline';
import { useArrestTime } from '../hooks/use-arrest-time';
import { useLiveActions } from '../hooks/use-live-actions';
import { type useLiveRecord, useSiteSettings } from '../hooks/use-live-record';
import { useSaveAgeGroup } from '../hooks/use-save-age-group';
import { useSaveWeight } from '../hooks/use-save-weight';
import { startArrest } from '../lib/arrest-time';
import type { LiveState } from '../lib/live-state';
import { undoneIds, undoTarget } from '../lib/undo-target';
import { ActionGrid } from './action-grid';
import { CausesChecklist, tickedCauses } from './causes-checklist';
import { CompressionsToggle } from './compressions-toggle';
import { Etco2Trend } from './etco2-trend';
import { EventLog } from './event-log';
import {
  ArrestTimeDialog,
  DetailsDialog,
  LiveDialogs,
  LivePrompts,
  Metronome,
  preloadDialogs,
  RosterDialog,
} from './lazy-dialogs';
import type { DialogName } from './live-dialogs';
import { LiveHeader } from './live-header';
import { TimersBar } from './timers-bar';
import { UndoNotice } from './undo-notice';

export type LiveData = Pick<ReturnType<typeof useLiveRecord>, 'events' | 'etco2' | 'acks'>;

/**
 * The monitor link's panel, drawn beside the EtCO2 trend. Another feature owns it, so the app
 * shell passes it in (features never import one another).
 */
export type MonitorSlot = ComponentType<{
  resuscitationId: string;
  arrestAt: string;
  /** The site's unit: readings and messages are written in it. */
  unit: Etco2DisplayUnit;
  onEtco2: (mmHg: number, at: string) => void;
}>;

/** The recording screen while the code runs: everything on it follows the patient's state. */
export function LiveScreen({
  record,
  state,
  events,
  etco2,
  acks,
  monitor: Monitor,
}: { record: LocalResuscitation; state: LiveState; monitor: MonitorSlot } & LiveData) {
  const { thresholds, etco2Unit } = useSiteSettings(record.siteId);
  // Typed values taken back by Undo stay in the log (struck through) and leave the rest.
  const kept = useMemo(() => {
    const undone = undoneIds(events);
    return undone.size ? etco2.filter((v) => !undone.has(v.id)) : etco2;
  }, [events, etco2]);
  const target = useMemo(
    () => undoTarget(state.inForce, events, etco2, etco2Unit),
    [state, events, etco2, etco2Unit],
  );
  const actions = useLiveActions(record.id, record.arrestAt, state, target, etco2Unit);
  // The log and the analysis redraw at low priority; the clocks tick inside the parts that
  // show them; everything else is memoised, so a tap redraws only what it changed.
  const laterEvents = useDeferredValue(events);
  const laterEtco2 = useDeferredValue(etco2);
  const laterKept = useDeferredValue(kept);
  const ticked = useMemo(() => tickedCauses(events), [events]);
  const [dialog, setDialog] = useState<DialogName | 'details' | 'team' | 'arrest' | null>(null);
  const [undid, setUndid] = useState<string | null>(null);
  const close = useCallback(() => setDialog(null), []);
  const openDetails = useCallback(() => setDialog('details'), []);
  const openTeam = useCallback(() => setDialog('team'), []);
  const openArrest = useCallback(() => setDialog('arrest'), []);
  const setArrest = useArrestTime(record.id, record.arrestAt, events);
  const { undo: undoEntry } = actions;
  const undo = useCallback(() => setUndid(undoEntry()), [undoEntry]);
  const patient = useMemo(
    () => ({ ageGroup: record.ageGroup, weightKg: record.weightKg }),
    [record.ageGroup, record.weightKg],
  );
  const onWeight = useSaveWeight(record.id, actions.record);
  const onAgeGroup = useSaveAgeGroup(record.id, record.ageGroup, actions.record);
  useEffect(() => void preloadDialogs(), []);
  return (
    <Stack spacing={1.5}>
      <LiveHeader
        title="Live"
        ended={false}
        recordId={record.id}
        onDetails={openDetails}
        onTeam={openTeam}
        onArrestTime={openArrest}
      />
      <ClinicalCaution dense />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '3fr 2fr' }, gap: 2 }}>
        <Stack spacing={1.5}>
          <TimersBar arrestAt={record.arrestAt} state={state} thresholds={thresholds} />
          <CompressionsToggle
            compressing={state.compressing}
            changedAt={state.compressionsChangedAt}
            pulselessSince={state.phaseSince}
            counting={state.phase === 'pulseless'}
            pauseMaxSec={thresholds.pauseMaxSec}
            onToggle={actions.toggleCompressions}
          />
          <Suspense fallback={null}>
            <LivePrompts
              arrestAt={record.arrestAt}
              state={state}
              events={laterEvents}
              etco2={laterKept}
              thresholds={thresholds}
              unit={etco2Unit}
            />
          </Suspense>
          <ActionGrid
            phase={state.phase}
            onOpen={setDialog}
            onRosc={actions.rosc}
            onRearrest={actions.rearrest}
            onUndo={undo}
            canUndo={target !== null}
          />
          <UndoNotice text={undid} />
        </Stack>
        <Stack spacing={1.5}>
          <Etco2Trend
            arrestAt={record.arrestAt}
            values={kept}
            lowMmHg={thresholds.lowEtco2MmHg}
            unit={etco2Unit}
          />
          <Monitor
            resuscitationId={record.id}
            arrestAt={record.arrestAt}
            unit={etco2Unit}
            onEtco2={actions.etco2At}
          />
          <Suspense fallback={null}>
            <Metronome paused={state.phase !== 'pulseless'} />
          </Suspense>
          <EventLog
            arrestAt={record.arrestAt}
            events={laterEvents}
            etco2={laterEtco2}
            acks={acks}
            unit={etco2Unit}
          />
          <CausesChecklist ticked={ticked} onNote={actions.note} />
        </Stack>
      </Box>
      <Suspense fallback={null}>
        <LiveDialogs
          open={dialog === 'details' || dialog === 'team' || dialog === 'arrest' ? null : dialog}
          onClose={close}
          record={actions.record}
          onEtco2={actions.etco2}
          onEnd={actions.end}
          thresholds={thresholds}
          etco2Unit={etco2Unit}
          patient={patient}
          onWeight={onWeight}
          onAgeGroup={onAgeGroup}
          shocksGiven={state.shocks}
        />
        {dialog === 'details' && <DetailsDialog open record={record} onClose={close} />}
        {dialog === 'arrest' && (
          <ArrestTimeDialog
            open
            startAt={startArrest(events)?.at ?? record.arrestAt}
            onSave={(minutes, reason) => {
              void setArrest(minutes, reason);
              close();
            }}
            onClose={close}
          />
        )}
        <RosterDialog
          open={dialog === 'team'}
          recordId={record.id}
          roster={record.roster}
          onClose={close}
        />
      </Suspense>
    </Stack>
  );
}
