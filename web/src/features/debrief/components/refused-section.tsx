import { Card, CardContent, Typography } from '@mui/material';
import { useState } from 'react';
import { RefusedEntries, useSyncProblems } from '../../../components/sync/refused-entries';

/**
 * This record's entries the server refused, kept on this tablet: shown to everyone, resolved
 * by a lead (send again, or discard with a reason). Stays in view once resolved, so the
 * outcome can be read.
 */
export function RefusedSection({ resuscitationId }: { resuscitationId: string }) {
  const problems = useSyncProblems(resuscitationId);
  const count = problems ? problems.ops.length + problems.items.length : 0;
  const [shown, setShown] = useState(false);
  if (count > 0 && !shown) setShown(true);
  if (!shown) return null;
  return (
    <Card variant="outlined" component="section" aria-labelledby="refused-title">
      <CardContent>
        <Typography id="refused-title" variant="h2" sx={{ fontSize: '1.25rem', mb: 1 }}>
          Not accepted by the server ({count})
        </Typography>
        <Typography variant="body2" sx={{ mb: 1 }}>
          Kept on this tablet, unchanged, and not part of the record until accepted.
        </Typography>
        <RefusedEntries recordId={resuscitationId} />
      </CardContent>
    </Card>
  );
}
