import {
  Accordion,
  AccordionDetails,
  AccordionSummary,
  Button,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import type { ControlChartResponse } from '@upstroke/contracts';
import { formatSpcValue } from './spc-format';

/** Every point in words with its limits, each with a button to the records behind it. */
export function ControlPointsTable({
  chart,
  title,
  onPoint,
  monthName,
}: {
  chart: ControlChartResponse;
  title: string;
  onPoint: (index: number) => void;
  monthName: (month: string) => string;
}) {
  const m = chart.measure;
  return (
    <Accordion disableGutters variant="outlined" sx={{ mt: 1 }}>
      <AccordionSummary>
        <Typography>Points and their records</Typography>
      </AccordionSummary>
      <AccordionDetails>
        <Table size="small" aria-label={`Points of the control chart of ${title}`}>
          <TableHead>
            <TableRow>
              <TableCell>Month</TableCell>
              <TableCell>Value</TableCell>
              <TableCell>n</TableCell>
              <TableCell>Limits</TableCell>
              <TableCell>Signal</TableCell>
              <TableCell>Records</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {chart.points.map((p, i) => (
              <TableRow key={p.month} selected={p.signal}>
                <TableCell>{monthName(p.month)}</TableCell>
                <TableCell>
                  {p.value === null ? 'no records' : formatSpcValue(m, p.value)}
                </TableCell>
                <TableCell>{p.n}</TableCell>
                <TableCell>
                  {p.lower === null || p.upper === null
                    ? '—'
                    : `${formatSpcValue(m, p.lower)} to ${formatSpcValue(m, p.upper)}`}
                </TableCell>
                <TableCell>{p.signal ? 'Yes' : ''}</TableCell>
                <TableCell>
                  <Button
                    size="small"
                    disabled={p.n === 0}
                    onClick={() => onPoint(i)}
                    aria-label={`Records behind ${monthName(p.month)}`}
                  >
                    Open
                  </Button>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </AccordionDetails>
    </Accordion>
  );
}
