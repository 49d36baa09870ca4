import { List, ListItem, ListItemButton, ListItemText, Paper, Typography } from '@mui/material';
import { Link } from 'react-router-dom';
import { labelOf, resuscitationStatusLabels } from '@upstroke/contracts';
import { useDisplayFormat } from '../../../hooks/use-display-format';

export interface RecordRow {
  id: string;
  arrestAt: string;
  status: string;
  detail?: string;
  to: string;
}

/** Rows that each open a record (Live while it runs, Debrief once it has ended). */
export function RecordRows({
  label,
  rows,
  empty,
}: {
  label: string;
  rows: RecordRow[];
  empty: string;
}) {
  const { dateTime } = useDisplayFormat();
  if (rows.length === 0) return <Typography color="text.secondary">{empty}</Typography>;
  return (
    <List aria-label={label}>
      {rows.map((r) => (
        <ListItem key={r.id} disablePadding>
          <ListItemButton component={Link} to={r.to} sx={{ minHeight: 56 }}>
            <ListItemText
              primary={`${dateTime(r.arrestAt)} · ${labelOf(resuscitationStatusLabels, r.status)}`}
              secondary={r.detail}
            />
          </ListItemButton>
        </ListItem>
      ))}
    </List>
  );
}

export function RecordList({
  title,
  rows,
  empty,
}: {
  title: string;
  rows: RecordRow[];
  empty: string;
}) {
  return (
    <Paper variant="outlined" sx={{ p: 1.5 }}>
      <Typography variant="h2" sx={{ mb: 1 }}>
        {title}
      </Typography>
      <RecordRows label={title} rows={rows} empty={empty} />
    </Paper>
  );
}
