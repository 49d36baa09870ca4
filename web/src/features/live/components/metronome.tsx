import { Box, IconButton, Slider, Stack, Typography } from '@mui/material';
import PlayArrow from '@mui/icons-material/PlayArrow';
import Stop from '@mui/icons-material/Stop';
import { memo, useEffect, useState } from 'react';
import { beep } from '../lib/audio';

/**
 * Compression-rate metronome, 100–120/min (guideline range), default 110; sound follows Mute.
 * `paused` (ROSC, no compressions) silences it; a metronome left on resumes on re-arrest.
 */
export const Metronome = memo(function Metronome({ paused = false }: { paused?: boolean }) {
  const [rate, setRate] = useState(110);
  const [on, setOn] = useState(false);
  const [tick, setTick] = useState(false);
  const running = on && !paused;
  useEffect(() => {
    if (!running) return;
    const id = setInterval(() => {
      beep(1200, 30, 0.15);
      setTick((t) => !t);
    }, 60_000 / rate);
    return () => clearInterval(id);
  }, [running, rate]);
  return (
    <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
      <IconButton
        aria-label={on ? 'Stop metronome' : 'Start metronome'}
        aria-pressed={on}
        onClick={() => setOn(!on)}
        sx={{ width: 56, height: 56 }}
      >
        {on ? <Stop /> : <PlayArrow />}
      </IconButton>
      <Box
        aria-hidden
        sx={{
          width: 20,
          height: 20,
          borderRadius: '50%',
          bgcolor: running && tick ? 'secondary.main' : 'action.disabled',
        }}
      />
      <Typography id="metronome-rate" sx={{ minWidth: 90 }}>
        {rate}/min
      </Typography>
      {on && paused && <Typography color="text.secondary">Paused during ROSC</Typography>}
      <Slider
        aria-labelledby="metronome-rate"
        aria-label="Metronome rate"
        min={100}
        max={120}
        step={5}
        value={rate}
        onChange={(_, v) => setRate(v as number)}
        sx={{ maxWidth: 160 }}
      />
    </Stack>
  );
});
