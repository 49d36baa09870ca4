import { Alert, Button, MenuItem, Paper, Stack, TextField } from '@mui/material';
import { useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { startResuscitation } from '../../../lib/offline';
import { useRecordingContext } from '../hooks/use-recording-context';

/** One tap starts a code now, on this device's last site and unit; details come later. */
export function StartPanel() {
  const navigate = useNavigate();
  const { sites, siteId, unitId, setChoice } = useRecordingContext();
  // A second tap while the first is stored starts nothing (a ref: no redraw before Live).
  const starting = useRef(false);
  const [error, setError] = useState<string | null>(null);
  const site = sites.find((s) => s.id === siteId);
  const start = async () => {
    if (!siteId || starting.current) return;
    starting.current = true;
    try {
      const record = await startResuscitation({ siteId, unitId });
      // Live draws the new record from this at once instead of reading it back first.
      void navigate(`/live/${record.id}`, { state: { started: record } });
    } catch (e) {
      starting.current = false;
      setError(
        `The code could not be stored on this tablet (${e instanceof Error ? e.message : String(e)}). Tap Start again; if it fails again, record on paper and tell the administrator.`,
      );
    }
  };
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Stack
        direction={{ xs: 'column', md: 'row' }}
        spacing={2}
        sx={{ alignItems: { md: 'center' } }}
      >
        <Button
          variant="contained"
          color="secondary"
          disabled={!siteId}
          onClick={() => void start()}
          sx={{ minHeight: 96, minWidth: 240, fontSize: '2rem' }}
        >
          Start
        </Button>
        {sites.length > 1 && (
          <TextField
            select
            label="Site"
            value={siteId ?? ''}
            onChange={(e) => setChoice({ siteId: e.target.value })}
            sx={{ minWidth: 220 }}
          >
            {sites.map((s) => (
              <MenuItem key={s.id} value={s.id}>
                {s.name}
              </MenuItem>
            ))}
          </TextField>
        )}
        {site && (
          <TextField
            select
            label="Unit"
            value={unitId ?? ''}
            onChange={(e) => setChoice({ siteId, unitId: e.target.value || undefined })}
            sx={{ minWidth: 220 }}
          >
            <MenuItem value="">Not set</MenuItem>
            {site.units.map((u) => (
              <MenuItem key={u.id} value={u.id}>
                {u.name}
              </MenuItem>
            ))}
          </TextField>
        )}
      </Stack>
      {error && (
        <Alert severity="error" sx={{ mt: 2 }} onClose={() => setError(null)}>
          {error}
        </Alert>
      )}
    </Paper>
  );
}
