import { Box, Paper, Typography } from '@mui/material';
import type { Thresholds } from '@upstroke/contracts';
import { memo, useEffect, useRef } from 'react';
import { formatDuration } from '../../../lib/format';
import { useNow } from '../hooks/use-now';
import { beep } from '../lib/audio';
import { cycleStart, type LiveState } from '../lib/live-state';

function Timer(props: { label: string; value: string; alert?: boolean; calm?: boolean }) {
  const { label, value, alert, calm } = props;
  return (
    <Paper
      variant="outlined"
      sx={{
        px: 2,
        py: 1,
        borderColor: alert ? 'warning.main' : calm ? 'success.main' : undefined,
        borderWidth: alert || calm ? 3 : 1,
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

/**
 * Elapsed since arrest; while pulseless, the countdown to the rhythm check (with a sound cue)
 * and the epinephrine timer; during ROSC, a calm "ROSC for" clock in their place.
 */
export const TimersBar = memo(function TimersBar(props: {
  arrestAt: string;
  state: LiveState;
  thresholds: Thresholds;
}) {
  const now = useNow();
  const { state } = props;
  const elapsed = (now - Date.parse(props.arrestAt)) / 1000;
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(3, 1fr)', gap: 1 }}>
      <Timer label="Since arrest" value={formatDuration(elapsed)} />
      {state.phase === 'rosc' ? (
        <Box sx={{ gridColumn: 'span 2' }}>
          <Timer label="ROSC for" value={formatDuration((now - state.phaseSince) / 1000)} calm />
        </Box>
      ) : (
        <ArrestTimers {...props} now={now} />
      )}
    </Box>
  );
});

/** The cycle and epinephrine timers: shown, and cueing, only while the patient is pulseless. */
function ArrestTimers(props: {
  arrestAt: string;
  state: LiveState;
  thresholds: Thresholds;
  now: number;
}) {
  const { state, thresholds: t, now } = props;
  const cycleFrom = cycleStart(state, Date.parse(props.arrestAt));
  const toCheck = t.rhythmCheckIntervalSec - (now - cycleFrom) / 1000;
  const sinceEpi = state.lastEpinephrineAt === null ? null : (now - state.lastEpinephrineAt) / 1000;
  const due = toCheck <= 0;
  const cued = useRef<number | null>(null);
  useEffect(() => {
    if (due && cued.current !== cycleFrom && state.phase === 'pulseless') {
      cued.current = cycleFrom;
      beep(660, 400, 0.3);
    }
  }, [due, cycleFrom, state.phase]);
  return (
    <>
      <Timer label="Rhythm check in" value={due ? 'Due' : formatDuration(toCheck)} alert={due} />
      <Timer
        label="Since epinephrine"
        value={sinceEpi === null ? '—' : formatDuration(sinceEpi)}
        alert={sinceEpi !== null && sinceEpi >= t.epinephrineMinSec}
      />
    </>
  );
}
