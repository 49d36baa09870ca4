import { memo } from 'react';
import { List, ListItem, ListItemText, Paper, Typography } from '@mui/material';
import { type Etco2DisplayUnit, eventLabel } from '@upstroke/contracts';
import type { LocalEtco2, LocalEvent, SyncAck } from '../../../lib/offline';
import { formatDuration } from '../../../lib/format';
import { etco2Label, undoneIds } from '../lib/undo-target';

/** Rows drawn at once: enough to check the latest taps, cheap to redraw during a long code. */
const SHOWN = 40;

interface Row {
  id: string;
  at: string;
  text: string;
}

/** Every entry with its words; a correction names the entry it took back. */
function logRows(events: LocalEvent[], etco2: LocalEtco2[], unit?: Etco2DisplayUnit): Row[] {
  const labels = new Map<string, string>();
  for (const e of events) labels.set(e.id, eventLabel(e.kind, e.data));
  for (const v of etco2) labels.set(v.id, etco2Label(v, unit));
  const text = (e: LocalEvent) => {
    if (e.kind !== 'correction') return labels.get(e.id) ?? e.kind;
    const undid = labels.get(String((e.data as { supersedes?: string }).supersedes));
    return undid ? `Undid: ${undid}` : 'Correction';
  };
  return [
    ...events.map((e) => ({ id: e.id, at: e.at, text: text(e) })),
    ...etco2.map((v) => ({ id: v.id, at: v.at, text: labels.get(v.id) ?? '' })),
  ];
}

/** One line; redrawn only when its text or mark changes (a tap adds one line, not forty). */
const LogRow = memo(function LogRow(props: { line: string; mark: string | null; undone: boolean }) {
  return (
    <ListItem disableGutters>
      <ListItemText
        primary={props.undone ? <del>{props.line}</del> : props.line}
        secondary={[props.undone ? 'undone' : null, props.mark].filter(Boolean).join(' · ') || null}
      />
    </ListItem>
  );
});

/**
 * What this tablet holds for the code, newest first: an entry taken back by Undo stays in the
 * list struck through (never silently absent), with a mark for what is not yet on the server.
 */
export const EventLog = memo(function EventLog(props: {
  arrestAt: string;
  events: LocalEvent[];
  etco2: LocalEtco2[];
  acks: ReadonlyMap<string, SyncAck>;
  /** The site's unit (values from the monitor link are converted to it). */
  unit?: Etco2DisplayUnit;
}) {
  const t0 = Date.parse(props.arrestAt);
  const undone = undoneIds(props.events);
  const rows = logRows(props.events, props.etco2, props.unit)
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
              undone={undone.has(r.id)}
              mark={state === 0 ? 'waiting' : state === 2 ? 'refused by server (kept here)' : null}
            />
          );
        })}
      </List>
    </Paper>
  );
});
