import { Stack, Typography } from '@mui/material';
import { useEffect, useMemo } from 'react';
import { useParams } from 'react-router-dom';
import { ErrorState, Loading } from '../../../components/ui/states';
import { type LocalResuscitation, offlineDb, tapWriter } from '../../../lib/offline';
import { useMarkLiveOpen } from '../../../hooks/use-live-open';
import { useLiveRecord } from '../hooks/use-live-record';
import { arrestAtInForce } from '../lib/arrest-time';
import { endSummary } from '../lib/end-summary';
import { liveState } from '../lib/live-state';
import { EndedSummary } from './ended-summary';
import { EventLog } from './event-log';
import { LiveScreen, type LiveData, type MonitorSlot } from './live-screen';

export function LivePage({ monitor }: { monitor: MonitorSlot }) {
  const { id = '' } = useParams();
  useMarkLiveOpen();
  // Taps are committed by a worker; start it before the first one.
  useEffect(() => tapWriter.warm(), []);
  const { record, events, etco2, acks, loadError } = useLiveRecord(id);
  if (record === null) return <Loading />;
  if (!record)
    return loadError ? <ErrorState error={loadError} /> : <Loading label="Opening the record…" />;
  return (
    <LiveOrSummary record={record} events={events} etco2={etco2} acks={acks} monitor={monitor} />
  );
}

/** While the code runs, the Live screen; once it has ended, its read-only summary. */
function LiveOrSummary(props: { record: LocalResuscitation; monitor: MonitorSlot } & LiveData) {
  const { events, etco2, acks } = props;
  // Another tablet's change of the arrest time arrives as corrections: every clock follows.
  const arrestAt = arrestAtInForce(events, props.record.arrestAt);
  const record = useMemo(
    () => (arrestAt === props.record.arrestAt ? props.record : { ...props.record, arrestAt }),
    [props.record, arrestAt],
  );
  const state = useMemo(() => liveState(events, record.arrestAt), [events, record.arrestAt]);
  const summary = useMemo(
    () => (state.ended ? endSummary(state, record.arrestAt) : null),
    [state, record.arrestAt],
  );
  // An End from another tablet closes the record on this one too (the Board lists it as
  // recent, not in progress). The tablet that tapped End also tells the server.
  useEffect(() => {
    if (summary && record.status === 'open')
      void offlineDb.resuscitations.update(record.id, { status: 'closed' });
  }, [summary, record.id, record.status]);
  if (!summary) return <LiveScreen state={state} {...props} record={record} />;
  return (
    <Stack spacing={1.5}>
      <Typography variant="h1" sx={{ fontSize: '1.6rem' }}>
        Code summary
      </Typography>
      <EndedSummary recordId={record.id} arrestAt={record.arrestAt} summary={summary} />
      <EventLog arrestAt={record.arrestAt} events={events} etco2={etco2} acks={acks} />
    </Stack>
  );
}
