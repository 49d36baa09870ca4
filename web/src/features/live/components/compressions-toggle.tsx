import { Button, Typography } from '@mui/material';
import { memo } from 'react';
import { useNow } from '../hooks/use-now';

/** Compressions on/off; while off it shows the hands-off seconds counting up. */
export const CompressionsToggle = memo(function CompressionsToggle(props: {
  compressing: boolean;
  changedAt: number | null;
  pauseMaxSec: number;
  onToggle: () => void;
}) {
  const now = useNow();
  const handsOff =
    !props.compressing && props.changedAt !== null
      ? Math.max(0, (now - props.changedAt) / 1000)
      : null;
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
