import { Button, Typography } from '@mui/material';
import { memo } from 'react';
import { useNow } from '../hooks/use-now';

/**
 * Compressions on/off. While off and pulseless it shows the hands-off seconds counting up,
 * from the stop or from a re-arrest, whichever is later; during ROSC nothing counts.
 */
export const CompressionsToggle = memo(function CompressionsToggle(props: {
  compressing: boolean;
  changedAt: number | null;
  /** When the current pulseless period began (ms): the arrest or the last re-arrest. */
  pulselessSince: number;
  /** False during ROSC: there is no hands-off time for a patient with a pulse. */
  counting: boolean;
  pauseMaxSec: number;
  onToggle: () => void;
}) {
  const now = useNow();
  const from = props.changedAt === null ? null : Math.max(props.changedAt, props.pulselessSince);
  const handsOff =
    props.counting && !props.compressing && from !== null ? Math.max(0, (now - from) / 1000) : null;
  const long = handsOff !== null && handsOff > props.pauseMaxSec;
  return (
    <Button
      aria-pressed={props.compressing}
      aria-label="Compressions"
      onClick={props.onToggle}
      variant={props.compressing ? 'contained' : 'outlined'}
      color={long ? 'error' : 'primary'}
      sx={{
        minHeight: 96,
        fontSize: '1.6rem',
        flexDirection: 'column',
        borderWidth: 3,
        '&:hover': { borderWidth: 3 },
      }}
    >
      Compressions
      <Typography component="span" aria-live="off" sx={{ fontSize: '1rem', fontWeight: 600 }}>
        {props.compressing
          ? 'On'
          : handsOff === null
            ? 'Off'
            : `Off · hands off ${Math.floor(handsOff)} s`}
      </Typography>
    </Button>
  );
});
