import { Box, Button, GlobalStyles, Stack, Typography } from '@mui/material';
import { formatEtco2Both, type TrendsResponse } from '@upstroke/contracts';
import { useState } from 'react';
import { ErrorState, Loading, PageHeader } from '../../../components/ui/states';
import { downloadCsv } from '../api/download-csv';
import { useTrends } from '../api/get-trends';
import { useTrendsFilter } from '../hooks/use-trends-filter';
import { FiltersSummary } from './filters-summary';
import { MonthlyReportButton } from './monthly-report-button';
import { RecordsGrid } from './records-grid';
import { FunnelSection } from './spc/funnel-section';
import { type ChartSpec, TrendChart } from './trend-chart';
import { TrendsFilters } from './trends-filters';
import { TrendsHelp } from './trends-help';
import { UtsteinTable } from './utstein-table';

function chartSpecs(t: TrendsResponse): ChartSpec[] {
  const s = t.series;
  return [
    {
      title: 'Median compression fraction',
      spc: ['compressionFraction', 'compressionFractionMet'],
      scale: 100,
      unit: '%',
      points: s.compressionFraction,
      target: t.targets.compressionFraction,
    },
    {
      title: 'Records with EtCO2 documented',
      spc: ['etco2Documented'],
      scale: 100,
      unit: '%',
      points: s.etco2Documented,
      target: null,
    },
    {
      title: `Median % of CPR time with EtCO2 ≥ ${formatEtco2Both(10)}`,
      scale: 100,
      unit: '%',
      points: s.fractionGe10,
      target: t.targets.fractionGe10,
    },
    {
      title: 'Median time to first shock (shockable)',
      spc: ['timeToFirstShockSec'],
      scale: 1,
      unit: 's',
      points: s.timeToFirstShockSec,
      target: t.targets.timeToFirstShockSec,
    },
    {
      title: 'Median time to first epinephrine (non-shockable)',
      spc: ['timeToFirstEpinephrineSec'],
      scale: 1,
      unit: 's',
      points: s.timeToFirstEpinephrineSec,
      target: t.targets.timeToFirstEpinephrineSec,
    },
    {
      title: 'Long pre-shock pauses per shocked record',
      scale: 1,
      unit: 'pauses',
      points: s.preshockLongPerRecord,
      target: t.targets.preshockLongPerRecord,
    },
    { title: 'Any ROSC', scale: 100, unit: '%', points: s.anyRosc, target: null, spc: ['anyRosc'] },
    { title: 'Sustained ROSC', scale: 100, unit: '%', points: s.sustainedRosc, target: null },
  ];
}

/** Trends for the quality committee: filters, monthly charts, records, Utstein summary. */
export function TrendsPage() {
  const [filter, setFilter] = useTrendsFilter();
  const trends = useTrends(filter);
  const [exportError, setExportError] = useState<unknown>(null);
  const download = (kind: 'export' | 'utstein') => {
    setExportError(null);
    downloadCsv(kind, filter).catch(setExportError);
  };
  return (
    <>
      <GlobalStyles
        styles={{ '@media print': { '.no-print, header, nav': { display: 'none !important' } } }}
      />
      <PageHeader
        title="Trends"
        actions={
          <Box className="no-print" sx={{ display: 'flex', gap: 1 }}>
            <Button variant="outlined" onClick={() => download('export')}>
              Export records CSV
            </Button>
            <Button variant="outlined" onClick={() => download('utstein')}>
              Export summary CSV
            </Button>
            <MonthlyReportButton filter={filter} />
            <Button variant="outlined" onClick={() => window.print()}>
              Print
            </Button>
          </Box>
        }
      />
      {exportError ? <ErrorState error={exportError} /> : null}
      <Box className="no-print">
        <TrendsFilters value={filter} onChange={setFilter} />
      </Box>
      <FiltersSummary filter={filter} />
      <TrendsHelp />
      {trends.isPending ? (
        <Loading label="Loading trends…" />
      ) : trends.error ? (
        <ErrorState error={trends.error} onRetry={() => void trends.refetch()} />
      ) : (
        <Box
          className="no-print"
          sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', lg: '1fr 1fr' }, mb: 3 }}
        >
          {trends.data.total === 0 ? (
            <Typography color="text.secondary">No signed records match these filters.</Typography>
          ) : (
            chartSpecs(trends.data).map((c) => <TrendChart key={c.title} {...c} filter={filter} />)
          )}
        </Box>
      )}
      <FunnelSection filter={filter} />
      <Stack spacing={3}>
        <Box component="section" aria-labelledby="records-title" className="no-print">
          <Typography id="records-title" variant="h2" gutterBottom>
            Records
          </Typography>
          <RecordsGrid filter={filter} />
        </Box>
        <Box component="section" aria-labelledby="utstein-title">
          <Typography id="utstein-title" variant="h2" gutterBottom>
            Utstein-style summary
          </Typography>
          <UtsteinTable filter={filter} />
        </Box>
      </Stack>
    </>
  );
}
