import { memo } from 'react';
import { List, ListItem, ListItemText, Paper, Typography } from '@mui/material';
import { eventLabel } from '@upstroke/contracts';
import type { LocalEtco2, LocalEvent, SyncAck } from '../../../lib/offline';
import { formatDuration } from '../../../lib/format';

function describe(e: LocalEvent): string {
  return e.kind === 'correction' ? 'Undo (correction)' : eventLabel(e.kind, e.data);
}

/** What this tablet has recorded, newest first, with a mark for values not yet on the server. */
/** Rows drawn at once: enough to check the latest taps, cheap to redraw during a long code. */
const SHOWN = 40;

/** One line; redrawn only when its text or mark changes (a tap adds one line, not forty). */
const LogRow = memo(function LogRow(props: { line: string; mark: string | null }) {
  return (
    <ListItem disableGutters>
      <ListItemText primary={props.line} secondary={props.mark} />
    </ListItem>
  );
});

export const EventLog = memo(function EventLog(props: {
  arrestAt: string;
  events: LocalEvent[];
  etco2: LocalEtco2[];
  acks: ReadonlyMap<string, SyncAck>;
}) {
  const t0 = Date.parse(props.arrestAt);
  const rows = [
    ...props.events.map((e) => ({ id: e.id, at: e.at, text: describe(e) })),
    ...props.etco2.map((v) => ({ id: v.id, at: v.at, text: `EtCO2 ${v.value} ${v.unit}` })),
  ]
    .sort((a, b) => b.at.localeCompare(a.at))
    .slice(0, SHOWN);
  return (
    <Paper variant="outlined" sx={{ p: 1 }}>
      <Typography variant="subtitle2" component="h2">
        Recorded: {props.events.length} events, {props.etco2.length} EtCO2 values
      </Typography>
      <List dense aria-label="Recorded events" sx={{ maxHeight: 220, overflow: 'auto' }}>
        {rows.map((r) => {
          const state = props.acks.get(r.id)?.state ?? 0;
          return (
            <LogRow
              key={r.id}
              line={`${formatDuration((Date.parse(r.at) - t0) / 1000)}  ${r.text}`}
              mark={state === 0 ? 'waiting' : state === 2 ? 'refused by server (kept here)' : null}
            />
          );
        })}
      </List>
    </Paper>
  );
});
