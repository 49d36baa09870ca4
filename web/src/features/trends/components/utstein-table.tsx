import { Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { TrendsFilter } from '@upstroke/contracts';
import { useUtstein } from '../api/get-utstein';
import { ErrorState, Loading } from '../../../components/ui/states';

/** Utstein-style core elements for the filtered period: counts, shares and medians. */
export function UtsteinTable({ filter }: { filter: TrendsFilter }) {
  const { data, error, isPending, refetch } = useUtstein(filter);
  if (isPending) return <Loading label="Loading the summary…" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  return (
    <>
      <Typography color="text.secondary" sx={{ mb: 1 }}>
        Period: {data.from ?? 'first record'} to {data.to ?? 'today'} (end not included). Shares are
        of all {data.total} treated arrests.
      </Typography>
      <Table size="small" aria-label="Utstein-style summary">
        <TableHead>
          <TableRow>
            <TableCell>Element</TableCell>
            <TableCell align="right">Count</TableCell>
            <TableCell align="right">%</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {data.lines.map((l) => (
            <TableRow key={l.key}>
              <TableCell>{l.label}</TableCell>
              <TableCell align="right">{l.count}</TableCell>
              <TableCell align="right">{l.percent ?? '—'}</TableCell>
            </TableRow>
          ))}
          {data.medians.map((m) => (
            <TableRow key={m.key}>
              <TableCell>Median {m.label.charAt(0).toLowerCase() + m.label.slice(1)}</TableCell>
              <TableCell align="right">
                {m.value === null ? '—' : Math.round(m.value * 100) / 100}
              </TableCell>
              <TableCell align="right">n = {m.n}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </>
  );
}
