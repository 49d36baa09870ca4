import { List, ListItemButton, ListItemText, Paper, Typography } from '@mui/material';
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

export function RecordList({
  title,
  rows,
  empty,
}: {
  title: string;
  rows: RecordRow[];
  empty: string;
}) {
  const { dateTime } = useDisplayFormat();
  return (
    <Paper variant="outlined" sx={{ p: 1.5 }}>
      <Typography variant="h2" sx={{ mb: 1 }}>
        {title}
      </Typography>
      {rows.length === 0 ? (
        <Typography color="text.secondary">{empty}</Typography>
      ) : (
        <List aria-label={title}>
          {rows.map((r) => (
            <ListItemButton key={r.id} component={Link} to={r.to} sx={{ minHeight: 56 }}>
              <ListItemText
                primary={`${dateTime(r.arrestAt)} · ${labelOf(resuscitationStatusLabels, r.status)}`}
                secondary={r.detail}
              />
            </ListItemButton>
          ))}
        </List>
      )}
    </Paper>
  );
}
