import { Button, Slider, Stack, TextField, Typography } from '@mui/material';
import type { MonitorImport } from '@upstroke/contracts';
import { useState } from 'react';
import { useSetImportOffset } from '../api/set-import-offset';

/**
 * The clock offset of one import: what was chosen (automatically from shock markers, or
 * by hand), and for the lead a slider and field to adjust it with a live preview.
 */
export function OffsetEditor({
  item,
  canAdjust,
  onPreview,
}: {
  item: MonitorImport;
  canAdjust: boolean;
  onPreview?: (offsetSec: number) => void;
}) {
  const [value, setValue] = useState(item.offsetSec);
  const save = useSetImportOffset(item.resuscitationId);
  const change = (v: number) => {
    if (!Number.isFinite(v)) return;
    setValue(v);
    onPreview?.(v);
  };
  const how =
    item.offsetMethod === 'manual'
      ? 'set by hand'
      : item.matchedMarkers > 0
        ? `from ${item.matchedMarkers} of ${item.markers} shock marker(s), residual ${item.residualSec ?? 0} s`
        : 'no shock markers in the file: clocks taken as equal';
  return (
    <Stack spacing={1}>
      <Typography variant="body2">
        Clock offset {item.offsetSec > 0 ? '+' : ''}
        {item.offsetSec} s ({how}). Positive means the monitor clock ran ahead.
      </Typography>
      {canAdjust && (
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
          <Slider
            aria-label="Clock offset (s)"
            value={value}
            min={Math.floor(item.offsetSec - 120)}
            max={Math.ceil(item.offsetSec + 120)}
            step={0.5}
            onChange={(_, v) => change(v as number)}
            sx={{ flex: 1, minWidth: 160 }}
          />
          <TextField
            label="Offset (s)"
            type="number"
            value={value}
            onChange={(e) => change(Number(e.target.value))}
            slotProps={{ htmlInput: { step: 0.5 } }}
            sx={{ width: 130 }}
          />
          <Button
            variant="contained"
            sx={{ minHeight: 48 }}
            disabled={save.isPending || value === item.offsetSec}
            onClick={() => save.mutate({ importId: item.id, offsetSec: value })}
          >
            Save offset
          </Button>
        </Stack>
      )}
      {save.isError && <Typography color="error">{save.error.message}</Typography>}
    </Stack>
  );
}
