import {
  Button,
  Chip,
  List,
  ListItem,
  ListItemText,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableRow,
  Typography,
} from '@mui/material';
import { clockFromArrest, findingKindLabels, severityLabels } from '@upstroke/contracts';
import { Link as RouterLink } from 'react-router-dom';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { ErrorState, Loading } from '../../../components/ui/states';
import { measureRows } from '../../../lib/measure-rows';
import { useRecordDebrief } from '../api/get-record-debrief';

/**
 * What the committee reviews: the record's measures and findings, read from the debrief the
 * API composed for the Debrief screen (one path, nothing recomputed here), and a link to it.
 */
export function RecordSummary({ resuscitationId }: { resuscitationId: string }) {
  const query = useRecordDebrief(resuscitationId);
  if (query.isPending) return <Loading label="Loading the record's measures and findings…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const d = query.data;
  return (
    <Stack spacing={1} component="section" aria-label="Measures and findings">
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
        <Typography variant="h3" component="h3" sx={{ fontSize: '1.1rem' }}>
          Measures
        </Typography>
        <Button component={RouterLink} to={`/debrief/${resuscitationId}`} size="small">
          Open the Debrief
        </Button>
      </Stack>
      <Table size="small" aria-label="Measures">
        <TableBody>
          {measureRows(d.measures, d.record.etco2Unit).map((m) => (
            <TableRow key={m.key}>
              <TableCell component="th" scope="row">
                {m.title}
              </TableCell>
              <TableCell>{m.value}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Typography variant="h3" component="h3" sx={{ fontSize: '1.1rem', pt: 1 }}>
        Findings ({d.findings.length})
      </Typography>
      {d.findings.length > 0 && <ClinicalCaution dense />}
      <List dense aria-label="Findings">
        {d.findings.map((f, i) => (
          <ListItem key={`${f.kind}-${f.startSec}-${i}`} disableGutters>
            <ListItemText
              primary={
                <>
                  <Chip size="small" label={severityLabels[f.severity]} sx={{ mr: 1 }} />
                  {findingKindLabels[f.kind] ?? f.kind}, {clockFromArrest(f.startSec)} –{' '}
                  {clockFromArrest(f.endSec)}
                </>
              }
              secondary={f.message}
            />
          </ListItem>
        ))}
        {d.findings.length === 0 && (
          <ListItem disableGutters>
            <ListItemText primary="No findings for this record." />
          </ListItem>
        )}
      </List>
    </Stack>
  );
}
