import { Box, Card, CardContent, Typography } from '@mui/material';
import {
  clockFromArrest,
  type Debrief,
  type Finding,
  findingKindLabels,
} from '@upstroke/contracts';
import { forwardRef, useMemo, useState } from 'react';
import type { Formatter } from '../../../hooks/use-display-format';
import { eventRows } from './event-rows';
import { EventTable } from './event-table';
import { TimelineChart } from './timeline-chart';
import type { Band, TimelineModel } from './timeline-model';

interface Props {
  debrief: Debrief;
  model: TimelineModel;
  fmt: Formatter;
  view: Band | null;
  finding: Finding | null;
  onResetView: () => void;
}

/**
 * The timeline with the event table beside it (below it on a narrow screen), linked both
 * ways: hovering or tapping a marker picks its row, and a row picks its marker.
 */
export const TimelineSection = forwardRef<HTMLElement, Props>(function TimelineSection(
  { debrief, model, fmt, view, finding, onResetView },
  ref,
) {
  const [active, setActive] = useState<string | null>(null);
  const rows = useMemo(() => eventRows(debrief), [debrief]);
  return (
    <Card
      variant="outlined"
      component="section"
      ref={ref}
      aria-label="Timeline and events"
      sx={{ scrollMarginTop: 72 }}
    >
      <CardContent>
        <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 1.5 }}>
          Timeline and events
        </Typography>
        {finding && (
          <Typography
            data-testid="timeline-highlight"
            sx={{ mb: 1, fontWeight: 600 }}
            aria-live="polite"
          >
            Highlighted: {findingKindLabels[finding.kind] ?? finding.kind},{' '}
            {clockFromArrest(finding.startSec)} – {clockFromArrest(finding.endSec)}
          </Typography>
        )}
        <Box
          sx={{
            display: 'grid',
            gap: 2,
            gridTemplateColumns: { xs: 'minmax(0, 1fr)', lg: 'minmax(0, 3fr) minmax(0, 2fr)' },
          }}
        >
          <TimelineChart
            model={model}
            view={view}
            highlight={finding}
            onResetView={onResetView}
            active={active}
            onActive={setActive}
          />
          <EventTable rows={rows} fmt={fmt} active={active} onActive={setActive} />
        </Box>
      </CardContent>
    </Card>
  );
});
