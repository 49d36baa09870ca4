import { MenuItem, Stack, TextField } from '@mui/material';
import {
  clockFromArrest,
  type DebriefEvent,
  eventLabel,
  rhythmLabels,
  routeLabels,
} from '@upstroke/contracts';

/** Event kinds an amendment can correct here, and the detail it changes. */
const correctable = new Set(['drug', 'access', 'shock', 'rhythm']);

export interface EventFix {
  eventId: string;
  data: Record<string, unknown>;
}

/** Events still in force that the dialog can correct (not already replaced or taken back). */
export function correctableEvents(events: DebriefEvent[]): DebriefEvent[] {
  return events.filter((e) => correctable.has(e.kind) && !e.supersededBy);
}

function DetailField({
  e,
  fix,
  onFix,
}: {
  e: DebriefEvent;
  fix: EventFix;
  onFix: (f: EventFix) => void;
}) {
  const set = (k: string, v: unknown) => onFix({ ...fix, data: { ...fix.data, [k]: v } });
  const select = (key: string, label: string, words: Record<string, string>) => (
    <TextField
      select
      label={label}
      value={String(fix.data[key] ?? '')}
      onChange={(x) => set(key, x.target.value)}
    >
      {Object.entries(words).map(([v, l]) => (
        <MenuItem key={v} value={v}>
          {l}
        </MenuItem>
      ))}
    </TextField>
  );
  if (e.kind === 'drug' || e.kind === 'access') return select('route', 'Route', routeLabels);
  if (e.kind === 'rhythm') return select('rhythm', 'Rhythm', rhythmLabels);
  return (
    <TextField
      type="number"
      label="Energy (J)"
      value={String(fix.data.energyJ ?? '')}
      onChange={(x) => set('energyJ', x.target.value === '' ? undefined : Number(x.target.value))}
    />
  );
}

/** Pick an event and its corrected detail (route, rhythm or energy); the rest stays as recorded. */
export function EventCorrection(props: {
  events: DebriefEvent[];
  fix: EventFix | null;
  onFix: (f: EventFix | null) => void;
}) {
  const options = correctableEvents(props.events);
  const chosen = options.find((e) => e.id === props.fix?.eventId);
  return (
    <Stack spacing={2}>
      <TextField
        select
        label="Correct an event"
        value={props.fix?.eventId ?? ''}
        onChange={(x) => {
          const e = options.find((o) => o.id === x.target.value);
          props.onFix(e ? { eventId: e.id, data: { ...e.data } } : null);
        }}
        helperText="The event stays in the record struck through, with the correction beside it."
      >
        <MenuItem value="">No event to correct</MenuItem>
        {options.map((e) => (
          <MenuItem key={e.id} value={e.id}>
            {clockFromArrest(e.tSec)} {eventLabel(e.kind, e.data)}
          </MenuItem>
        ))}
      </TextField>
      {chosen && props.fix && <DetailField e={chosen} fix={props.fix} onFix={props.onFix} />}
    </Stack>
  );
}
