import {
  Box,
  Card,
  CardContent,
  MenuItem,
  Stack,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import { type SpcProportion, spcMeasureLabels, type TrendsFilter } from '@upstroke/contracts';
import { useState } from 'react';
import { ClinicalCaution } from '../../../../components/ui/clinical-caution';
import { ErrorState, Loading } from '../../../../components/ui/states';
import { type FunnelBy, useFunnel } from '../../api/get-funnel';
import { FunnelCanvas } from './funnel-canvas';
import { FunnelTable } from './funnel-table';
import { type PointSelection, PointRecordsDialog } from './point-records-dialog';
import { funnelMeasures } from './spc-format';

/**
 * Units (or sites) compared on a share against their volume: a small unit's share varies
 * more by chance, so the limits widen as n falls and raw rankings do not mislead.
 */
export function FunnelSection({ filter }: { filter: TrendsFilter }) {
  const [measure, setMeasure] = useState<SpcProportion>('anyRosc');
  const [by, setBy] = useState<FunnelBy>('unit');
  const [point, setPoint] = useState<PointSelection | null>(null);
  const funnel = useFunnel(filter, measure, by);
  const open = (i: number) => {
    const p = funnel.data?.points[i];
    if (p?.records) setPoint({ label: p.name, records: p.records });
  };
  return (
    <Card variant="outlined" component="section" aria-labelledby="funnel-title" sx={{ mb: 3 }}>
      <CardContent>
        <Typography id="funnel-title" variant="h2" gutterBottom>
          Units compared (funnel plot)
        </Typography>
        <Stack direction="row" spacing={1} sx={{ mb: 1, flexWrap: 'wrap', gap: 1 }}>
          <TextField
            select
            size="small"
            label="Funnel measure"
            value={measure}
            onChange={(e) => setMeasure(e.target.value as SpcProportion)}
            sx={{ minWidth: 280 }}
          >
            {funnelMeasures.map((m) => (
              <MenuItem key={m} value={m}>
                {spcMeasureLabels[m]}
              </MenuItem>
            ))}
          </TextField>
          <ToggleButtonGroup
            size="small"
            exclusive
            value={by}
            onChange={(_e, v: FunnelBy | null) => v && setBy(v)}
            aria-label="Compare"
          >
            <ToggleButton value="unit">Units</ToggleButton>
            <ToggleButton value="site">Sites</ToggleButton>
          </ToggleButtonGroup>
        </Stack>
        {funnel.isPending ? (
          <Loading label="Loading funnel plot…" />
        ) : funnel.error ? (
          <ErrorState error={funnel.error} onRetry={() => void funnel.refetch()} />
        ) : (
          <Box>
            <FunnelCanvas funnel={funnel.data} onPoint={open} />
            <FunnelTable funnel={funnel.data} onPoint={open} />
            <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1 }}>
              {funnel.data.source}
            </Typography>
          </Box>
        )}
        <ClinicalCaution dense />
      </CardContent>
      <PointRecordsDialog point={point} onClose={() => setPoint(null)} />
    </Card>
  );
}
