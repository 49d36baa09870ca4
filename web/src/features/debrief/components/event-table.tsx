import {
  Box,
  Chip,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { clockFromArrest } from '@upstroke/contracts';
import { useEffect, useRef } from 'react';
import type { Formatter } from '../../../hooks/use-display-format';
import type { EventRow } from './event-rows';

interface Props {
  rows: EventRow[];
  fmt: Formatter;
  /** The row (and chart marker) in focus; hovering or tapping either sets it. */
  active: string | null;
  onActive: (id: string | null) => void;
}

function Struck({ on, children }: { on: boolean; children: React.ReactNode }) {
  return on ? <del>{children}</del> : <>{children}</>;
}

function Row({
  r,
  fmt,
  active,
  onActive,
}: Omit<Props, 'rows' | 'active'> & { r: EventRow; active: boolean }) {
  const ref = useRef<HTMLTableRowElement>(null);
  useEffect(() => {
    if (active) ref.current?.scrollIntoView?.({ block: 'nearest' });
  }, [active]);
  return (
    <TableRow
      ref={ref}
      hover
      selected={active}
      tabIndex={0}
      aria-selected={active}
      data-event-id={r.id}
      data-struck={r.struck ? 'true' : undefined}
      onMouseEnter={() => onActive(r.id)}
      onFocus={() => onActive(r.id)}
      onClick={() => onActive(r.id)}
      sx={{ cursor: 'pointer', '& td': { verticalAlign: 'top' } }}
    >
      <TableCell sx={{ whiteSpace: 'nowrap' }}>
        <Struck on={r.struck}>{clockFromArrest(r.tSec)}</Struck>
        <Typography variant="caption" component="div" color="text.secondary">
          {fmt.time(r.at, true)}
        </Typography>
      </TableCell>
      <TableCell>
        <Struck on={r.struck}>{r.event}</Struck>
        {r.amended && <Chip size="small" label="Amended" color="warning" sx={{ ml: 0.5 }} />}
      </TableCell>
      <TableCell sx={{ overflowWrap: 'anywhere' }}>
        <Struck on={r.struck}>{r.details}</Struck>
        {r.note && (
          <Typography variant="caption" component="div" color="text.secondary">
            {r.note}
          </Typography>
        )}
      </TableCell>
      <TableCell>{r.by ?? '—'}</TableCell>
    </TableRow>
  );
}

/** Every event with its time, details and recorder; corrections struck through. */
export function EventTable({ rows, fmt, active, onActive }: Props) {
  if (rows.length === 0) return <Typography color="text.secondary">No events recorded.</Typography>;
  return (
    <Box onMouseLeave={() => onActive(null)}>
      <TableContainer sx={{ maxHeight: 440 }}>
        <Table stickyHeader size="small" aria-label="Events">
          <TableHead>
            <TableRow>
              <TableCell>Time</TableCell>
              <TableCell>Event</TableCell>
              <TableCell>Details</TableCell>
              <TableCell>Recorded by</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {rows.map((r) => (
              <Row key={r.id} r={r} fmt={fmt} active={active === r.id} onActive={onActive} />
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </Box>
  );
}
