import { memo } from 'react';
import VolumeOff from '@mui/icons-material/VolumeOff';
import VolumeUp from '@mui/icons-material/VolumeUp';
import { Button, IconButton, Stack, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import { useMuted } from '../lib/audio';

export const LiveHeader = memo(function LiveHeader(props: {
  title: string;
  ended: boolean;
  recordId: string;
  onDetails: () => void;
  onTeam: () => void;
  onArrestTime?: () => void;
}) {
  const [muted, setMuted] = useMuted();
  return (
    <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
      <Typography variant="h1" sx={{ flexGrow: 1, fontSize: '1.6rem' }}>
        {props.title}
      </Typography>
      <IconButton
        aria-label="Sound"
        aria-pressed={!muted}
        onClick={() => setMuted(!muted)}
        sx={{ width: 56, height: 56 }}
      >
        {muted ? <VolumeOff /> : <VolumeUp />}
      </IconButton>
      <Button variant="outlined" onClick={props.onDetails} sx={{ minHeight: 56 }}>
        Details
      </Button>
      <Button variant="outlined" onClick={props.onTeam} sx={{ minHeight: 56 }}>
        Team
      </Button>
      {props.onArrestTime && (
        <Button variant="outlined" onClick={props.onArrestTime} sx={{ minHeight: 56 }}>
          Arrest time
        </Button>
      )}
      {props.ended && (
        <Button
          component={Link}
          to={`/debrief/${props.recordId}`}
          variant="contained"
          sx={{ minHeight: 56 }}
        >
          Debrief
        </Button>
      )}
    </Stack>
  );
});
