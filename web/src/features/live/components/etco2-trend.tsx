import { Box, Typography } from '@mui/material';
import { toMmHg } from '@upstroke/capno';
import { type Etco2DisplayUnit, etco2InUnit } from '@upstroke/contracts';
import { lazy, memo, Suspense } from 'react';
import type { LocalEtco2 } from '../../../lib/offline';
import { etco2Reading } from '../lib/undo-target';

const Etco2TrendChart = lazy(() =>
  import('./etco2-trend-chart').then((m) => ({ default: m.Etco2TrendChart })),
);

/** A small trend of recorded EtCO2 over the code, with the site's low band shaded. */
export const Etco2Trend = memo(function Etco2Trend(props: {
  arrestAt: string;
  values: LocalEtco2[];
  lowMmHg: number;
  unit: Etco2DisplayUnit;
}) {
  const t0 = Date.parse(props.arrestAt);
  const scale = etco2InUnit(1, props.unit);
  const points = props.values.map((v) => ({
    x: (Date.parse(v.at) - t0) / 60_000,
    y: etco2InUnit(toMmHg(v.value, v.unit), props.unit),
  }));
  const last = props.values.at(-1);
  return (
    <Box>
      <Typography variant="subtitle2">
        EtCO2 {last ? `· last ${etco2Reading(last, props.unit)}` : '· none yet'}
      </Typography>
      <Box sx={{ height: 140 }}>
        <Suspense fallback={null}>
          <Etco2TrendChart
            points={points}
            lowMmHg={props.lowMmHg}
            unit={props.unit}
            scale={scale}
          />
        </Suspense>
      </Box>
    </Box>
  );
});
