import {
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import {
  type AuditEntry,
  auditActionLabels,
  auditEntityLabels,
  labelOf,
} from '@upstroke/contracts';
import type { ReactNode } from 'react';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { changeRows, otherDetails, type SiteNamer } from './audit-details';

/** Ids in full, in a typeface where 0/O and 1/l differ, so they can be compared and copied. */
const Id = ({ value }: { value: string | null }) =>
  value ? (
    <Box component="code" sx={{ fontFamily: 'monospace', wordBreak: 'break-all' }}>
      {value}
    </Box>
  ) : (
    <>—</>
  );

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <Typography component="dt" sx={{ fontWeight: 500 }}>
        {label}
      </Typography>
      <Typography component="dd" sx={{ m: 0 }}>
        {children}
      </Typography>
    </>
  );
}

/** One audit entry in full: who, what, when, which ids, and each change as before → after. */
export function AuditEntryDialog({
  entry,
  sites,
  onClose,
}: {
  entry: AuditEntry;
  sites: SiteNamer;
  onClose: () => void;
}) {
  const { dateTime } = useDisplayFormat();
  const changes = changeRows(entry, sites);
  const others = otherDetails(entry, sites);
  const what = labelOf(auditActionLabels, entry.action);
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md" aria-labelledby="audit-entry-title">
      <DialogTitle id="audit-entry-title">{what}</DialogTitle>
      <DialogContent>
        <Box
          component="dl"
          sx={{ display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: 2, rowGap: 1 }}
        >
          <Fact label="When">
            {dateTime(entry.at)} <Id value={entry.at} />
          </Fact>
          <Fact label="Who">
            {entry.userName ?? 'Nobody signed in'}
            {entry.userEmail ? ` (${entry.userEmail})` : ''} <Id value={entry.userId} />
          </Fact>
          <Fact label="What">{what}</Fact>
          <Fact label={labelOf(auditEntityLabels, entry.entity)}>
            <Id value={entry.entityId} />
          </Fact>
          {entry.resuscitationId && entry.resuscitationId !== entry.entityId && (
            <Fact label="Record">
              <Id value={entry.resuscitationId} />
            </Fact>
          )}
          <Fact label="Device">
            <Id value={entry.deviceId} />
          </Fact>
          {others.map(([label, value]) => (
            <Fact key={label} label={label}>
              {value}
            </Fact>
          ))}
        </Box>
        {changes.length > 0 && (
          <Table size="small" aria-label="Changes" sx={{ mt: 2 }}>
            <TableHead>
              <TableRow>
                <TableCell>Field</TableCell>
                <TableCell>Before</TableCell>
                <TableCell>After</TableCell>
                <TableCell>Reason</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {changes.map((c) => (
                <TableRow key={c.field}>
                  <TableCell component="th" scope="row">
                    {c.field}
                  </TableCell>
                  <TableCell>{c.before}</TableCell>
                  <TableCell>{c.after}</TableCell>
                  <TableCell>{c.note ?? '—'}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
