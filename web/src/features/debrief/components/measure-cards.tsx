import HelpOutlined from '@mui/icons-material/HelpOutlineOutlined';
import { Card, CardContent, Grid, IconButton, Stack, Tooltip, Typography } from '@mui/material';
import {
  clockFromArrest,
  type Etco2DisplayUnit,
  etco2MeasureRows,
  formatPercent,
  type Measures,
  measureDefinitions,
} from '@upstroke/contracts';

type Key = keyof typeof measureDefinitions;
const pct = (f: number | null) => formatPercent(f);
const dur = (s: number | null) => (s === null ? '—' : clockFromArrest(s));

function cards(m: Measures, unit: Etco2DisplayUnit): { key: Key; title: string; value: string }[] {
  const pre = m.pauses
    .filter((p) => p.context === 'pre-shock')
    .map((p) => p.preShockSec ?? p.durationSec);
  return [
    { key: 'duration', title: 'Duration', value: dur(m.durationSec) },
    {
      key: 'compressionFraction',
      title: 'Compression fraction',
      value: pct(m.compressionFraction),
    },
    {
      key: 'longestPause',
      title: 'Longest pause',
      value: m.longestPauseSec === null ? '—' : `${Math.round(m.longestPauseSec)} s`,
    },
    {
      key: 'preShockPauses',
      title: 'Pre-shock pauses',
      value: pre.length ? pre.map((s) => `${Math.round(s)} s`).join(', ') : 'none',
    },
    { key: 'firstShock', title: 'Time to first shock', value: dur(m.timeToFirstShockSec) },
    {
      key: 'firstEpinephrine',
      title: 'Time to first epinephrine',
      value: dur(m.timeToFirstEpinephrineSec),
    },
    {
      key: 'epinephrineIntervals',
      title: 'Epinephrine intervals',
      value: m.epinephrineIntervalsSec.length ? m.epinephrineIntervalsSec.map(dur).join(', ') : '—',
    },
    {
      key: 'ventilationRate',
      title: 'Ventilation rate',
      value: m.ventilationRatePerMin === null ? '—' : `${Math.round(m.ventilationRatePerMin)} /min`,
    },
    ...etco2MeasureRows(m.etco2, unit),
  ];
}

/** The measures the team can act on, each with its definition one tap away. */
export function MeasureCards({ measures, unit }: { measures: Measures; unit: Etco2DisplayUnit }) {
  return (
    <Grid container spacing={1.5} component="section" aria-label="Measures">
      {cards(measures, unit).map((c) => (
        <Grid key={c.key} size={{ xs: 6, sm: 4, md: 3 }}>
          <Card variant="outlined" sx={{ height: '100%' }}>
            <CardContent sx={{ py: 1.5 }}>
              <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
                <Typography variant="body2" color="text.secondary">
                  {c.title}
                </Typography>
                <Tooltip title={measureDefinitions[c.key]} enterTouchDelay={0}>
                  <IconButton
                    aria-label={`What is ${c.title}?`}
                    size="small"
                    sx={{ minWidth: 40, minHeight: 40 }}
                  >
                    <HelpOutlined fontSize="small" />
                  </IconButton>
                </Tooltip>
              </Stack>
              <Typography variant="h5" component="p" aria-label={`${c.title}: ${c.value}`}>
                {c.value}
              </Typography>
            </CardContent>
          </Card>
        </Grid>
      ))}
    </Grid>
  );
}
