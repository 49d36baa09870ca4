import { Box, Paper, Typography } from '@mui/material';
import type { Thresholds } from '@upstroke/contracts';
import { memo, useEffect, useRef } from 'react';
import { formatDuration } from '../../../lib/format';
import { useNow } from '../hooks/use-now';
import { beep } from '../lib/audio';
import type { LiveState } from '../lib/live-state';

function Timer({ label, value, alert }: { label: string; value: string; alert?: boolean }) {
  return (
    <Paper
      variant="outlined"
      sx={{
        px: 2,
        py: 1,
        borderColor: alert ? 'warning.main' : undefined,
        borderWidth: alert ? 3 : 1,
      }}
    >
      <Typography variant="caption" component="div" sx={{ fontWeight: 600 }}>
        {label}
      </Typography>
      <Typography
        role="timer"
        aria-label={label}
        sx={{
          fontSize: '2.2rem',
          fontWeight: 700,
          fontVariantNumeric: 'tabular-nums',
          lineHeight: 1.1,
        }}
      >
        {value}
      </Typography>
    </Paper>
  );
}

/** Elapsed since arrest, countdown to the rhythm check (with a sound cue), epinephrine timer. */
export const TimersBar = memo(function TimersBar(props: {
  arrestAt: string;
  state: LiveState;
  thresholds: Thresholds;
}) {
  const now = useNow();
  const { state, thresholds: t } = props;
  const elapsed = (now - Date.parse(props.arrestAt)) / 1000;
  const cycleFrom = state.lastRhythmCheckAt ?? Date.parse(props.arrestAt);
  const toCheck = t.rhythmCheckIntervalSec - (now - cycleFrom) / 1000;
  const sinceEpi = state.lastEpinephrineAt === null ? null : (now - state.lastEpinephrineAt) / 1000;
  const due = toCheck <= 0;
  const cued = useRef<number | null>(null);
  useEffect(() => {
    if (due && cued.current !== cycleFrom && !state.ended) {
      cued.current = cycleFrom;
      beep(660, 400, 0.3);
    }
  }, [due, cycleFrom, state.ended]);
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(3, 1fr)', gap: 1 }}>
      <Timer label="Since arrest" value={formatDuration(elapsed)} />
      <Timer label="Rhythm check in" value={due ? 'Due' : formatDuration(toCheck)} alert={due} />
      <Timer
        label="Since epinephrine"
        value={sinceEpi === null ? '—' : formatDuration(sinceEpi)}
        alert={sinceEpi !== null && sinceEpi >= t.epinephrineMinSec}
      />
    </Box>
  );
});
