import { Box, Stack } from '@mui/material';
import type { Thresholds } from '@upstroke/contracts';
import { memo, useCallback, useDeferredValue, useEffect, useMemo, useState } from 'react';
import { useParams } from 'react-router-dom';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { ErrorState, Loading } from '../../../components/ui/states';
import {
  type LocalEtco2,
  type LocalEvent,
  type LocalResuscitation,
  tapWriter,
} from '../../../lib/offline';
import { RosterDialog } from '../../board/components/roster-dialog';
// Monitor link (issue 5): its panel renders here, beside the EtCO2 trend.
import { MonitorPanel } from '../../monitor/components/monitor-panel';
import { useMarkLiveOpen } from '../hooks/use-live-open';
import { useLiveActions } from '../hooks/use-live-actions';
import { useLiveRecord, useSiteSettings } from '../hooks/use-live-record';
import { useNow } from '../hooks/use-now';
import { usePrompts } from '../hooks/use-prompts';
import { liveState } from '../lib/live-state';
import { ActionGrid } from './action-grid';
import { CausesChecklist, tickedCauses } from './causes-checklist';
import { CompressionsToggle } from './compressions-toggle';
import { DetailsDialog } from './details-dialog';
import { Etco2Trend } from './etco2-trend';
import { EventLog } from './event-log';
import { LiveDialogs, type DialogName } from './live-dialogs';
import { LiveHeader } from './live-header';
import { Metronome } from './metronome';
import { PromptBanner } from './prompt-banner';
import { TimersBar } from './timers-bar';

export function LivePage() {
  const { id = '' } = useParams();
  useMarkLiveOpen();
  // Taps are committed by a worker; start it before the first one.
  useEffect(() => tapWriter.warm(), []);
  const { record, events, etco2, acks, loadError } = useLiveRecord(id);
  if (record === null) return <Loading />;
  if (!record)
    return loadError ? <ErrorState error={loadError} /> : <Loading label="Opening the record…" />;
  return <LiveScreen record={record} events={events} etco2={etco2} acks={acks} />;
}

function LiveScreen({
  record,
  events,
  etco2,
  acks,
}: { record: LocalResuscitation } & Pick<
  ReturnType<typeof useLiveRecord>,
  'events' | 'etco2' | 'acks'
>) {
  const { thresholds, etco2Unit } = useSiteSettings(record.siteId);
  const state = useMemo(() => liveState(events), [events]);
  const actions = useLiveActions(record.id, state, etco2Unit);
  // The log and the analysis redraw at low priority; the clocks tick inside the parts that
  // show them; everything else is memoised, so a tap redraws only what it changed.
  const laterEvents = useDeferredValue(events);
  const laterEtco2 = useDeferredValue(etco2);
  const ticked = useMemo(() => tickedCauses(events), [events]);
  const [dialog, setDialog] = useState<DialogName | 'details' | 'team' | null>(null);
  const close = useCallback(() => setDialog(null), []);
  const openDetails = useCallback(() => setDialog('details'), []);
  const openTeam = useCallback(() => setDialog('team'), []);
  const childWeight = record.ageGroup !== 'adult' ? record.weightKg : undefined;
  return (
    <Stack spacing={1.5}>
      <LiveHeader
        title="Live"
        ended={state.ended}
        recordId={record.id}
        onDetails={openDetails}
        onTeam={openTeam}
      />
      <ClinicalCaution dense />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '3fr 2fr' }, gap: 2 }}>
        <Stack spacing={1.5}>
          <TimersBar arrestAt={record.arrestAt} state={state} thresholds={thresholds} />
          <CompressionsToggle
            compressing={state.compressing}
            changedAt={state.compressionsChangedAt}
            pauseMaxSec={thresholds.pauseMaxSec}
            onToggle={actions.toggleCompressions}
          />
          <LivePrompts
            arrestAt={record.arrestAt}
            events={laterEvents}
            etco2={laterEtco2}
            thresholds={thresholds}
          />
          <ActionGrid
            onOpen={setDialog}
            onRosc={actions.rosc}
            onRearrest={actions.rearrest}
            onUndo={actions.undo}
            canUndo={state.undoable !== null}
          />
        </Stack>
        <Stack spacing={1.5}>
          <Etco2Trend
            arrestAt={record.arrestAt}
            values={etco2}
            lowMmHg={thresholds.lowEtco2MmHg}
            unit={etco2Unit}
          />
          <MonitorPanel
            resuscitationId={record.id}
            arrestAt={record.arrestAt}
            onEtco2={actions.etco2At}
          />
          <Metronome />
          <EventLog
            arrestAt={record.arrestAt}
            events={laterEvents}
            etco2={laterEtco2}
            acks={acks}
          />
          <CausesChecklist ticked={ticked} onNote={actions.note} />
        </Stack>
      </Box>
      <LiveDialogs
        open={dialog === 'details' || dialog === 'team' ? null : dialog}
        onClose={close}
        record={actions.record}
        onEtco2={actions.etco2}
        thresholds={thresholds}
        etco2Unit={etco2Unit}
        weightKg={childWeight}
        shocksGiven={state.shocks}
      />
      {dialog === 'details' && <DetailsDialog open record={record} onClose={close} />}
      <RosterDialog
        open={dialog === 'team'}
        recordId={record.id}
        roster={record.roster}
        onClose={close}
      />
    </Stack>
  );
}

/** The prompt banner, recomputed once a second from the recorded data. */
const LivePrompts = memo(function LivePrompts(props: {
  arrestAt: string;
  events: LocalEvent[];
  etco2: LocalEtco2[];
  thresholds: Thresholds;
}) {
  const now = useNow(1000);
  const state = useMemo(() => liveState(props.events), [props.events]);
  const prompts = usePrompts({ ...props, state, now });
  return <PromptBanner prompts={prompts} />;
});
