import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Link,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { formatPercent, labelOf, outcomeLabels, type TrendsFilter } from '@upstroke/contracts';
import { Link as RouterLink } from 'react-router-dom';
import { ErrorState, Loading } from '../../../../components/ui/states';
import { useDisplayFormat } from '../../../../hooks/use-display-format';
import { useTrendRecords } from '../../api/get-trend-records';

const PAGE = { sort: 'arrestAt', order: 'asc', limit: 500, offset: 0 } as const;

export interface PointSelection {
  /** What the point is, in words: "Emergency" or "2026-06". */
  label: string;
  records: TrendsFilter;
}

/** The records behind one chart point; each opens its Debrief. */
export function PointRecordsDialog({
  point,
  onClose,
}: {
  point: PointSelection | null;
  onClose: () => void;
}) {
  return (
    <Dialog open={point !== null} onClose={onClose} maxWidth="md" fullWidth>
      <DialogTitle>Records behind {point?.label}</DialogTitle>
      <DialogContent>{point ? <RecordsTable filter={point.records} /> : null}</DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}

function RecordsTable({ filter }: { filter: TrendsFilter }) {
  const { data, error, isPending, refetch } = useTrendRecords(filter, PAGE);
  const fmt = useDisplayFormat(filter.siteId);
  if (isPending) return <Loading label="Loading records…" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  if (data.total === 0) return <Typography>No signed records behind this point.</Typography>;
  return (
    <>
      <Typography gutterBottom>
        {data.total} record{data.total === 1 ? '' : 's'}
        {data.total > data.items.length ? ` (first ${data.items.length} shown)` : ''}
      </Typography>
      <Table size="small" aria-label="Records behind this point">
        <TableHead>
          <TableRow>
            <TableCell>Arrest</TableCell>
            <TableCell>Unit</TableCell>
            <TableCell>Outcome</TableCell>
            <TableCell>Compression fraction</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {data.items.map((r) => (
            <TableRow key={r.resuscitationId}>
              <TableCell>
                <Link component={RouterLink} to={`/debrief/${r.resuscitationId}`}>
                  {fmt.dateTime(r.arrestAt)}
                </Link>
              </TableCell>
              <TableCell>{r.unitName ?? '—'}</TableCell>
              <TableCell>{labelOf(outcomeLabels, r.outcome)}</TableCell>
              <TableCell>{formatPercent(r.compressionFraction)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </>
  );
}
