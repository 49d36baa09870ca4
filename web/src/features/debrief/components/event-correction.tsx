import { MenuItem, Stack, TextField } from '@mui/material';
import {
  clockFromArrest,
  type DebriefEvent,
  doseProblem,
  entryTimeProblem,
  eventLabel,
  rhythmLabels,
  routeLabels,
} from '@upstroke/contracts';

/** Kinds whose detail the dialog can change; any other event's time can be corrected too. */
const detailed = new Set(['drug', 'access', 'shock', 'rhythm']);

export interface EventFix {
  eventId: string;
  data: Record<string, unknown>;
  /** The corrected time (ISO), the recorded one unless changed. */
  at: string;
  /** The time as typed ("m:ss" from the arrest), kept while it is being typed. */
  clock: string;
}

/** Events still in force that the dialog can correct (not already replaced or taken back). */
export function correctableEvents(events: DebriefEvent[]): DebriefEvent[] {
  // The arrest is time zero itself: its time is a record detail, not an event to move.
  return events.filter((e) => e.kind !== 'correction' && e.kind !== 'arrest' && !e.supersededBy);
}

/** Seconds from "m:ss", "h:mm:ss" or "-m:ss" (as the Debrief writes times), or null. */
export function secondsFromClock(text: string): number | null {
  const m = /^\s*(-)?(?:(\d+):)?(\d+):([0-5]\d)\s*$/.exec(text);
  if (!m) return null;
  const sec = Number(m[2] ?? 0) * 3600 + Number(m[3]) * 60 + Number(m[4]);
  return m[1] ? -sec : sec;
}

/** What is wrong with a correction as typed (time format or window, dose range), or null. */
export function fixProblem(fix: EventFix, arrestAt: string): string | null {
  if (secondsFromClock(fix.clock) === null) return 'Time: write it as m:ss from the arrest';
  const late = entryTimeProblem(fix.at, arrestAt);
  if (late) return `Time: ${late}`;
  const { drug, dose, unit } = fix.data;
  if (dose !== undefined && !(typeof dose === 'number' && dose > 0))
    return 'Dose: must be above zero';
  if (typeof drug === 'string' && typeof dose === 'number') {
    const high = doseProblem(drug, dose, typeof unit === 'string' ? unit : undefined);
    if (high) return `Dose: ${high}`;
  }
  return null;
}

function DetailFields({
  e,
  fix,
  onFix,
  doseError,
}: {
  e: DebriefEvent;
  fix: EventFix;
  onFix: (f: EventFix) => void;
  doseError?: string;
}) {
  const set = (k: string, v: unknown) => onFix({ ...fix, data: { ...fix.data, [k]: v } });
  const num = (v: string) => (v === '' ? undefined : Number(v));
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
  if (!detailed.has(e.kind)) return null;
  if (e.kind === 'rhythm') return select('rhythm', 'Rhythm', rhythmLabels);
  if (e.kind === 'access') return select('route', 'Route', routeLabels);
  if (e.kind === 'shock')
    return (
      <TextField
        type="number"
        label="Energy (J)"
        value={String(fix.data.energyJ ?? '')}
        onChange={(x) => set('energyJ', num(x.target.value))}
      />
    );
  return (
    <>
      {select('route', 'Route', routeLabels)}
      <TextField
        type="number"
        label={`Dose${typeof fix.data.unit === 'string' ? ` (${fix.data.unit})` : ''}`}
        value={String(fix.data.dose ?? '')}
        onChange={(x) => set('dose', num(x.target.value))}
        error={Boolean(doseError)}
        helperText={doseError}
        slotProps={{ htmlInput: { min: 0, step: 'any' } }}
      />
    </>
  );
}

/**
 * Pick an event and correct its time and its detail (route and dose, rhythm or energy); the
 * rest stays as recorded. Times are typed from the arrest and must lie within the record's
 * plausible window (1 h before the arrest to 24 h after).
 */
export function EventCorrection(props: {
  events: DebriefEvent[];
  arrestAt: string;
  fix: EventFix | null;
  onFix: (f: EventFix | null) => void;
}) {
  const options = correctableEvents(props.events);
  const chosen = options.find((e) => e.id === props.fix?.eventId);
  const { fix, onFix } = props;
  const problem = fix && fixProblem(fix, props.arrestAt);
  const setClock = (clock: string) => {
    if (!fix) return;
    const sec = secondsFromClock(clock);
    const at =
      sec === null ? fix.at : new Date(Date.parse(props.arrestAt) + sec * 1000).toISOString();
    onFix({ ...fix, clock, at });
  };
  return (
    <Stack spacing={2}>
      <TextField
        select
        label="Correct an event"
        value={fix?.eventId ?? ''}
        onChange={(x) => {
          const e = options.find((o) => o.id === x.target.value);
          onFix(
            e
              ? { eventId: e.id, data: { ...e.data }, at: e.at, clock: clockFromArrest(e.tSec) }
              : null,
          );
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
      {chosen && fix && (
        <>
          <TextField
            label="Time from the arrest (m:ss)"
            value={fix.clock}
            onChange={(x) => setClock(x.target.value)}
            error={Boolean(problem?.startsWith('Time'))}
            helperText={
              problem?.startsWith('Time') ? problem : 'Within 1 h before and 24 h after the arrest'
            }
          />
          <DetailFields
            e={chosen}
            fix={fix}
            onFix={onFix}
            doseError={problem?.startsWith('Dose') ? problem : undefined}
          />
        </>
      )}
    </Stack>
  );
}
