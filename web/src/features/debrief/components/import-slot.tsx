import { Card, CardContent, Typography } from '@mui/material';
import type { ComponentType } from 'react';

/** The monitor-file import panel; another feature owns it, so the app shell passes it in. */
export type ImportPanelSlot = ComponentType<{ resuscitationId: string }>;

/** Monitor-file import on the Debrief screen, for leads and recorders. */
export function ImportSlot(props: { resuscitationId: string; panel: ImportPanelSlot }) {
  const { resuscitationId, panel: Panel } = props;
  return (
    <Card variant="outlined" component="section" aria-label="Monitor file">
      <CardContent>
        <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 1.5 }}>
          Monitor file
        </Typography>
        <Panel resuscitationId={resuscitationId} />
      </CardContent>
    </Card>
  );
}
