import CloudDone from '@mui/icons-material/CloudDone';
import CloudOff from '@mui/icons-material/CloudOff';
import CloudUpload from '@mui/icons-material/CloudUpload';
import Schedule from '@mui/icons-material/Schedule';
import { Chip } from '@mui/material';
import { useSyncState } from '../../../lib/offline';

/** The server refused the tablet's clock: entries are kept and wait until the time is fixed. */
function ClockWarning({ reason }: { reason: string }) {
  return (
    // The reason as a plain title: MUI's tooltip (and its popper) would weigh on Live's load.
    <Chip
      role="alert"
      icon={<Schedule />}
      color="warning"
      label="Check this tablet's date and time"
      aria-label="Sync paused: check this tablet's date and time; entries are kept on the tablet"
      title={reason}
      sx={{ fontWeight: 600, minHeight: 40 }}
    />
  );
}

/** "All saved", "N waiting" or "Offline" — in the top bar on every screen. */
export function SyncIndicator() {
  const s = useSyncState();
  const label =
    s.status === 'offline'
      ? s.waiting > 0
        ? `Offline · ${s.waiting} waiting`
        : 'Offline'
      : s.status === 'waiting'
        ? `${s.waiting} waiting`
        : 'All saved';
  const icon =
    s.status === 'offline' ? (
      <CloudOff />
    ) : s.status === 'waiting' ? (
      <CloudUpload />
    ) : (
      <CloudDone />
    );
  return (
    <>
      {s.clockRefused && <ClockWarning reason={s.clockRefused} />}
      <Chip
        role="status"
        aria-label={`Sync: ${label}`}
        icon={icon}
        label={label}
        title={s.lastError ?? undefined}
        sx={{
          bgcolor: 'rgba(255,255,255,0.16)',
          color: 'inherit',
          '& .MuiChip-icon': { color: 'inherit' },
          fontWeight: 600,
        }}
      />
    </>
  );
}
