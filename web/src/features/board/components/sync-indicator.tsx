import CloudDone from '@mui/icons-material/CloudDone';
import CloudOff from '@mui/icons-material/CloudOff';
import CloudUpload from '@mui/icons-material/CloudUpload';
import { Chip } from '@mui/material';
import { useSyncState } from '../../../lib/offline';

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
  );
}
