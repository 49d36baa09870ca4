import ReportProblem from '@mui/icons-material/ReportProblem';
import { Chip } from '@mui/material';
import { lazy, Suspense, useState } from 'react';
import { useSyncState } from '../../../lib/offline';

// The list and its forms load only when something was refused (this bar is on every screen).
const SyncProblemsDialog = lazy(() =>
  import('./sync-problems-dialog').then((m) => ({ default: m.SyncProblemsDialog })),
);

/** A warning beside the sync state when the server refused something; opens the list. */
export function SyncProblems() {
  const { refused } = useSyncState();
  const [open, setOpen] = useState(false);
  if (refused === 0 && !open) return null;
  return (
    <>
      {refused > 0 && (
        <Chip
          icon={<ReportProblem />}
          label={`${refused} not accepted`}
          color="warning"
          onClick={() => setOpen(true)}
          aria-label={`Sync: ${refused} not accepted — show`}
          sx={{ fontWeight: 600, minHeight: 40 }}
        />
      )}
      <Suspense fallback={null}>
        <SyncProblemsDialog open={open} onClose={() => setOpen(false)} />
      </Suspense>
    </>
  );
}
