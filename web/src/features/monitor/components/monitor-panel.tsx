import { Button, Paper, Typography } from '@mui/material';

export interface MonitorPanelProps {
  resuscitationId: string;
  arrestAt: string;
  onEtco2?: (mmHg: number, at: string) => void;
}

/**
 * Placeholder for the bedside monitor link (issue 5 replaces this file with the real panel:
 * WebSocket link, live capnogram). Kept so the Live layout has its place and builds.
 */
export function MonitorPanel(_props: MonitorPanelProps) {
  return (
    <Paper variant="outlined" sx={{ p: 1 }}>
      <Typography variant="subtitle2">Monitor link</Typography>
      <Button disabled sx={{ minHeight: 56 }}>
        Connect monitor
      </Button>
    </Paper>
  );
}
