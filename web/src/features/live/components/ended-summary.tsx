import { Box, Button, Paper, Stack, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { formatDuration } from '../../../lib/format';
import type { EndSummary } from '../lib/end-summary';

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <Box>
      <Typography variant="caption" component="div" sx={{ fontWeight: 600 }}>
        {label}
      </Typography>
      <Typography sx={{ fontSize: '1.3rem' }}>{value}</Typography>
    </Box>
  );
}

/**
 * The code after End: what happened, read-only (no running clock, no buttons that record),
 * and the way on to the debrief.
 */
export function EndedSummary(props: { recordId: string; arrestAt: string; summary: EndSummary }) {
  const s = props.summary;
  const fmt = useDisplayFormat();
  const arrestMs = Date.parse(props.arrestAt);
  const rosc = s.roscPeriods.length
    ? s.roscPeriods
        .map(
          (p) =>
            `${formatDuration((p.fromMs - arrestMs) / 1000)} for ${formatDuration((p.toMs - p.fromMs) / 1000)}`,
        )
        .join('; ')
    : 'none recorded';
  return (
    <Paper variant="outlined" sx={{ p: 2 }} aria-labelledby="ended-title">
      <Stack spacing={2}>
        <Typography id="ended-title" variant="h2">
          Code ended · {s.reason}
        </Typography>
        <Box
          sx={{
            display: 'grid',
            gridTemplateColumns: 'repeat(auto-fit, minmax(180px, 1fr))',
            gap: 2,
          }}
        >
          <Fact label="Arrest" value={fmt.dateTime(props.arrestAt)} />
          <Fact label="Ended" value={fmt.time(new Date(s.endedAtMs).toISOString())} />
          <Fact label="Duration" value={formatDuration(s.durationSec)} />
          <Fact label="Shocks" value={String(s.shocks)} />
          <Fact label="Epinephrine doses" value={String(s.epinephrineDoses)} />
          <Fact label="ROSC (from arrest, lasting)" value={rosc} />
        </Box>
        <Box>
          <Button
            component={Link}
            to={`/debrief/${props.recordId}`}
            variant="contained"
            size="large"
            sx={{ minHeight: 64, minWidth: 240, fontSize: '1.3rem' }}
          >
            Open debrief
          </Button>
        </Box>
      </Stack>
    </Paper>
  );
}
