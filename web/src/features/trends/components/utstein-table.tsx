import { Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { formatPercent, type TrendsFilter, type UtsteinSummary } from '@upstroke/contracts';
import { useUtstein } from '../api/get-utstein';
import { ErrorState, Loading } from '../../../components/ui/states';
import { formatDuration } from '../../../lib/format';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { periodText } from './filters-summary';

type Median = UtsteinSummary['medians'][number];

/** Each median in its own unit: a share as %, times as m:ss, EtCO2 to one decimal. */
function medianText(m: Median): string {
  if (m.value === null) return '—';
  if (m.key === 'compressionFraction') return formatPercent(m.value);
  if (m.key.startsWith('timeTo')) return formatDuration(m.value);
  return m.value.toFixed(1);
}

/** "(s)" in a label is replaced by the m:ss the value is shown in. */
const medianLabel = (m: Median) =>
  `Median ${m.label.charAt(0).toLowerCase()}${m.label.slice(1)}`.replace(' (s)', ' (m:ss)');

/** Utstein-style core elements for the filtered period: counts, shares and medians. */
export function UtsteinTable({ filter }: { filter: TrendsFilter }) {
  const { data, error, isPending, refetch } = useUtstein(filter);
  const { display } = useDisplayFormat(filter.siteId);
  if (isPending) return <Loading label="Loading the summary…" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  return (
    <>
      <Typography color="text.secondary" sx={{ mb: 1 }}>
        Period: {periodText({ from: data.from ?? undefined, to: data.to ?? undefined }, display)}.
        Shares are of all {data.total} treated arrests.
      </Typography>
      <Table size="small" aria-label="Utstein-style summary">
        <TableHead>
          <TableRow>
            <TableCell>Element</TableCell>
            <TableCell align="right">Count</TableCell>
            <TableCell align="right">Share</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {data.lines.map((l) => (
            <TableRow key={l.key}>
              <TableCell>{l.label}</TableCell>
              <TableCell align="right">{l.count}</TableCell>
              <TableCell align="right">
                {l.percent === null ? '—' : formatPercent(l.percent / 100, 1)}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Table size="small" aria-label="Medians" sx={{ mt: 2 }}>
        <TableHead>
          <TableRow>
            <TableCell>Median</TableCell>
            <TableCell align="right">Value</TableCell>
            <TableCell align="right">Records (n)</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {data.medians.map((m) => (
            <TableRow key={m.key}>
              <TableCell>{medianLabel(m)}</TableCell>
              <TableCell align="right">{medianText(m)}</TableCell>
              <TableCell align="right">{m.n}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </>
  );
}
