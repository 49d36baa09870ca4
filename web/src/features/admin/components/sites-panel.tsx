import Add from '@mui/icons-material/Add';
import { Button, Card, CardActions, CardContent, Chip, Stack, Typography } from '@mui/material';
import type { Site } from '@upstroke/contracts';
import { useState } from 'react';
import { EmptyState, ErrorState, Loading } from '../../../components/ui/states';
import { useSites } from '../api/list-sites';
import { SiteDialog } from './site-dialog';
import { UnitDialog } from './unit-dialog';

type Editing =
  | { kind: 'site'; site: Site | null }
  | { kind: 'unit'; siteId: string; unit: { id: string; name: string } | null };

/** The admin's sites with their units, display unit, paper size and current profile. */
export function SitesPanel() {
  const sites = useSites();
  const [editing, setEditing] = useState<Editing | null>(null);
  if (sites.isPending) return <Loading label="Loading sites…" />;
  if (sites.isError) return <ErrorState error={sites.error} onRetry={() => void sites.refetch()} />;
  return (
    <Stack spacing={2}>
      <Stack direction="row" sx={{ justifyContent: 'flex-end' }}>
        <Button
          variant="contained"
          startIcon={<Add />}
          onClick={() => setEditing({ kind: 'site', site: null })}
        >
          New site
        </Button>
      </Stack>
      {sites.data.total === 0 && (
        <EmptyState title="No sites yet">Create the first site with New site.</EmptyState>
      )}
      {sites.data.items.map((site) => (
        <Card key={site.id} component="section" aria-label={site.name} variant="outlined">
          <CardContent>
            <Typography variant="h3" gutterBottom>
              {site.name}
            </Typography>
            <Typography color="text.secondary" gutterBottom>
              EtCO2 in {site.etco2Unit} · PDFs on {site.paperSize} · {site.timeZone},{' '}
              {site.clock === '24h' ? '24-hour' : '12-hour'} clock ({site.locale}) ·{' '}
              {site.profile
                ? `Protocol profile v${site.profile.version} (${site.profile.name})`
                : 'No protocol profile'}
            </Typography>
            <Stack
              direction="row"
              sx={{ flexWrap: 'wrap', gap: 1, mt: 1 }}
              aria-label={`Units of ${site.name}`}
            >
              {site.units.length === 0 && (
                <Typography color="text.secondary">No units yet.</Typography>
              )}
              {site.units.map((u) => (
                <Chip
                  key={u.id}
                  label={u.name}
                  onClick={() => setEditing({ kind: 'unit', siteId: site.id, unit: u })}
                  aria-label={`Rename unit ${u.name}`}
                />
              ))}
            </Stack>
          </CardContent>
          <CardActions>
            <Button onClick={() => setEditing({ kind: 'site', site })}>Edit site</Button>
            <Button onClick={() => setEditing({ kind: 'unit', siteId: site.id, unit: null })}>
              Add unit
            </Button>
          </CardActions>
        </Card>
      ))}
      {editing?.kind === 'site' && (
        <SiteDialog site={editing.site} onClose={() => setEditing(null)} />
      )}
      {editing?.kind === 'unit' && (
        <UnitDialog siteId={editing.siteId} unit={editing.unit} onClose={() => setEditing(null)} />
      )}
    </Stack>
  );
}
