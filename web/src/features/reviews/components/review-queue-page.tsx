import {
  Button,
  Link,
  Tab,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Tabs,
  Typography,
} from '@mui/material';
import {
  labelOf,
  outcomeLabels,
  type ReviewQueueItem,
  reviewStatusLabels,
  rhythmLabels,
} from '@upstroke/contracts';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState, ErrorState, Loading, PageHeader } from '../../../components/ui/states';
import { type QueueStatus, useReviewQueue } from '../api/get-review-queue';
import { ReviewDialog } from './review-dialog';

const tabs: [QueueStatus, string][] = [
  ['awaiting', 'Awaiting review'],
  ['needs-follow-up', 'Needs follow-up'],
  ['reviewed', 'Reviewed'],
];

/** Signed records awaiting the committee, oldest first. */
export function ReviewQueuePage() {
  const [status, setStatus] = useState<QueueStatus>('awaiting');
  const [open, setOpen] = useState<ReviewQueueItem | null>(null);
  const queue = useReviewQueue(status);
  const { dateTime } = useDisplayFormat();
  return (
    <>
      <PageHeader title="Review queue" />
      <Tabs value={status} onChange={(_, v: QueueStatus) => setStatus(v)} aria-label="Queue">
        {tabs.map(([v, l]) => (
          <Tab key={v} value={v} label={l} />
        ))}
      </Tabs>
      {queue.isPending ? (
        <Loading label="Loading the queue…" />
      ) : queue.error ? (
        <ErrorState error={queue.error} onRetry={() => void queue.refetch()} />
      ) : queue.data.total === 0 ? (
        <EmptyState title="Nothing here">No signed records in this list.</EmptyState>
      ) : (
        <>
          <Typography sx={{ my: 1 }} aria-live="polite" data-testid="queue-count">
            {queue.data.total} records
          </Typography>
          <Table size="small" aria-label="Records to review">
            <TableHead>
              <TableRow>
                <TableCell>Arrest</TableCell>
                <TableCell>Site / unit</TableCell>
                <TableCell>First rhythm</TableCell>
                <TableCell>Outcome</TableCell>
                <TableCell>Last review</TableCell>
                <TableCell />
              </TableRow>
            </TableHead>
            <TableBody>
              {queue.data.items.map((i) => (
                <TableRow key={i.resuscitationId}>
                  <TableCell>
                    <Link component={RouterLink} to={`/debrief/${i.resuscitationId}`}>
                      {dateTime(i.arrestAt)}
                    </Link>
                  </TableCell>
                  <TableCell>{[i.siteName, i.unitName].filter(Boolean).join(' / ')}</TableCell>
                  <TableCell>{labelOf(rhythmLabels, i.firstRhythm)}</TableCell>
                  <TableCell>{labelOf(outcomeLabels, i.outcome)}</TableCell>
                  <TableCell>
                    {i.status
                      ? `${reviewStatusLabels[i.status]}${i.lastComment ? `: ${i.lastComment}` : ''}`
                      : 'None yet'}
                  </TableCell>
                  <TableCell>
                    <Button sx={{ minHeight: 48 }} onClick={() => setOpen(i)}>
                      Review
                    </Button>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </>
      )}
      {open ? <ReviewDialog item={open} onClose={() => setOpen(null)} /> : null}
    </>
  );
}
