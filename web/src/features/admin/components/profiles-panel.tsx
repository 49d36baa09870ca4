import {
  Alert,
  List,
  ListItemButton,
  ListItemText,
  MenuItem,
  Paper,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { EmptyState, ErrorState, Loading } from '../../../components/ui/states';
import { useProfiles } from '../api/list-profiles';
import { useSites } from '../api/list-sites';
import { ProfileForm } from './profile-form';

/** A site's protocol profile: its version history, and a form that saves the next version. */
export function ProfilesPanel() {
  const sites = useSites();
  const [chosenSite, setSite] = useState<string>();
  const siteId = chosenSite ?? sites.data?.items[0]?.id;
  const profiles = useProfiles(siteId);
  const { dateTime } = useDisplayFormat(siteId);
  const [chosenVersion, setVersion] = useState<string>();
  // Kept here: saving remounts the form on the new version, which would drop its own notice.
  const [saved, setSaved] = useState<string | null>(null);
  if (sites.isPending) return <Loading label="Loading sites…" />;
  if (sites.isError) return <ErrorState error={sites.error} onRetry={() => void sites.refetch()} />;
  if (!siteId) return <EmptyState title="No sites yet">Create a site first.</EmptyState>;
  const items = profiles.data?.items ?? [];
  const basis = items.find((p) => p.id === chosenVersion) ?? items[0] ?? null;
  return (
    <Stack spacing={2}>
      {sites.data.total > 1 && (
        <TextField
          select
          label="Site"
          value={siteId}
          onChange={(e) => {
            setSite(e.target.value);
            setVersion(undefined);
            setSaved(null);
          }}
          sx={{ maxWidth: 420 }}
        >
          {sites.data.items.map((s) => (
            <MenuItem key={s.id} value={s.id}>
              {s.name}
            </MenuItem>
          ))}
        </TextField>
      )}
      {saved && (
        <Alert severity="success" role="status" onClose={() => setSaved(null)}>
          {saved}
        </Alert>
      )}
      {profiles.isError && (
        <ErrorState error={profiles.error} onRetry={() => void profiles.refetch()} />
      )}
      {profiles.isPending ? (
        <Loading label="Loading profile versions…" />
      ) : (
        <Stack
          direction={{ xs: 'column', lg: 'row' }}
          spacing={2}
          sx={{ alignItems: 'flex-start' }}
        >
          <Paper variant="outlined" sx={{ minWidth: 240 }}>
            <Typography variant="h3" sx={{ p: 2, pb: 0 }}>
              Versions
            </Typography>
            <List aria-label="Profile versions">
              {items.map((p) => (
                <ListItemButton
                  key={p.id}
                  selected={p.id === basis?.id}
                  onClick={() => setVersion(p.id)}
                  sx={{ minHeight: 48 }}
                >
                  <ListItemText
                    primary={`v${p.version} · ${p.name}`}
                    secondary={dateTime(p.createdAt)}
                  />
                </ListItemButton>
              ))}
            </List>
          </Paper>
          <Paper variant="outlined" sx={{ p: 2, flexGrow: 1 }}>
            <ProfileForm
              key={`${siteId}:${basis?.id}`}
              siteId={siteId}
              basis={basis}
              onSaved={(p) => {
                setVersion(p.id);
                setSaved(
                  `Saved “${p.name}” as version ${p.version}; new records use it from now on.`,
                );
              }}
            />
          </Paper>
        </Stack>
      )}
    </Stack>
  );
}
