import { Card, CardContent, Typography } from '@mui/material';
import { ImportPanel } from '../../imports/components/import-panel';

/** Monitor-file import (issue 5's ImportPanel) on the Debrief screen, for leads and recorders. */
export function ImportSlot({ resuscitationId }: { resuscitationId: string }) {
  return (
    <Card variant="outlined" component="section" aria-label="Monitor file">
      <CardContent>
        <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 1.5 }}>
          Monitor file
        </Typography>
        <ImportPanel resuscitationId={resuscitationId} />
      </CardContent>
    </Card>
  );
}
