import { Box, Stack } from '@mui/material';
import { useDeferredValue, useMemo, useState } from 'react';
import { useParams } from 'react-router-dom';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { ErrorState, Loading } from '../../../components/ui/states';
import { type LocalResuscitation } from '../../../lib/offline';
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
import { CausesChecklist } from './causes-checklist';
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
  const { record, events, etco2, loadError } = useLiveRecord(id);
  if (record === null) return <Loading />;
  if (!record)
    return loadError ? <ErrorState error={loadError} /> : <Loading label="Opening the record…" />;
  return <LiveScreen record={record} events={events} etco2={etco2} />;
}

function LiveScreen({
  record,
  events,
  etco2,
}: { record: LocalResuscitation } & Pick<ReturnType<typeof useLiveRecord>, 'events' | 'etco2'>) {
  const now = useNow();
  const { thresholds, etco2Unit } = useSiteSettings(record.siteId);
  const state = useMemo(() => liveState(events), [events]);
  const actions = useLiveActions(record.id, state, etco2Unit);
  // The log, checklist and analysis redraw at low priority, so a tap's write is never kept
  // waiting behind them (tap-to-commit budget: 16 ms).
  const laterEvents = useDeferredValue(events);
  const laterEtco2 = useDeferredValue(etco2);
  const laterState = useMemo(() => liveState(laterEvents), [laterEvents]);
  const prompts = usePrompts({
    arrestAt: record.arrestAt,
    events: laterEvents,
    etco2: laterEtco2,
    thresholds,
    state: laterState,
    now,
  });
  const [dialog, setDialog] = useState<DialogName | 'details' | 'team' | null>(null);
  const childWeight = record.ageGroup !== 'adult' ? record.weightKg : undefined;
  return (
    <Stack spacing={1.5}>
      <LiveHeader
        title="Live"
        ended={state.ended}
        recordId={record.id}
        onDetails={() => setDialog('details')}
        onTeam={() => setDialog('team')}
      />
      <ClinicalCaution dense />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '3fr 2fr' }, gap: 2 }}>
        <Stack spacing={1.5}>
          <TimersBar arrestAt={record.arrestAt} state={state} thresholds={thresholds} now={now} />
          <CompressionsToggle
            compressing={state.compressing}
            changedAt={state.compressionsChangedAt}
            now={now}
            pauseMaxSec={thresholds.pauseMaxSec}
            onToggle={actions.toggleCompressions}
          />
          <PromptBanner prompts={prompts} />
          <ActionGrid
            onOpen={setDialog}
            onRosc={() => actions.record('rosc', {})}
            onRearrest={() => actions.record('rearrest', {})}
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
            onEtco2={(mmHg, at) => void actions.etco2At(mmHg, at)}
          />
          <Metronome />
          <EventLog arrestAt={record.arrestAt} events={laterEvents} etco2={laterEtco2} />
          <CausesChecklist events={events} onNote={actions.note} />
        </Stack>
      </Box>
      <LiveDialogs
        open={dialog === 'details' || dialog === 'team' ? null : dialog}
        onClose={() => setDialog(null)}
        record={actions.record}
        onEtco2={actions.etco2}
        thresholds={thresholds}
        etco2Unit={etco2Unit}
        weightKg={childWeight}
        shocksGiven={state.shocks}
      />
      {dialog === 'details' && (
        <DetailsDialog open record={record} onClose={() => setDialog(null)} />
      )}
      <RosterDialog
        open={dialog === 'team'}
        recordId={record.id}
        roster={record.roster}
        onClose={() => setDialog(null)}
      />
    </Stack>
  );
}
