import { MenuItem, Stack, TextField } from '@mui/material';
import { outcomeLabels, type TrendsFilter } from '@upstroke/contracts';
import { useTrendSites } from '../api/get-sites';

const outcomes = Object.entries(outcomeLabels);

interface Props {
  value: TrendsFilter;
  /** Receives only what changed; the owner merges it over the latest filter. */
  onChange: (patch: Partial<TrendsFilter>) => void;
}

/** Site, unit, period (from inclusive, to exclusive), first rhythm and outcome. */
export function TrendsFilters({ value, onChange }: Props) {
  const sites = useTrendSites().data?.sites ?? [];
  const units = sites
    .filter((s) => !value.siteId || s.id === value.siteId)
    .flatMap((s) =>
      s.units.map((u) => ({ ...u, label: sites.length > 1 ? `${u.name} (${s.name})` : u.name })),
    );
  const set = onChange;
  const field = { size: 'small' as const, sx: { minWidth: 170 } };
  return (
    <Stack
      direction="row"
      sx={{ flexWrap: 'wrap', gap: 2, mb: 2 }}
      role="search"
      aria-label="Trend filters"
    >
      <TextField
        select
        label="Site"
        value={value.siteId ?? ''}
        {...field}
        onChange={(e) => set({ siteId: e.target.value || undefined, unitId: undefined })}
      >
        <MenuItem value="">All my sites</MenuItem>
        {sites.map((s) => (
          <MenuItem key={s.id} value={s.id}>
            {s.name}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        label="Unit"
        value={value.unitId ?? ''}
        {...field}
        onChange={(e) => set({ unitId: e.target.value || undefined })}
      >
        <MenuItem value="">All units</MenuItem>
        {units.map((u) => (
          <MenuItem key={u.id} value={u.id}>
            {u.label}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        type="date"
        label="From"
        value={value.from ?? ''}
        {...field}
        slotProps={{ inputLabel: { shrink: true } }}
        onChange={(e) => set({ from: e.target.value || undefined })}
      />
      <TextField
        type="date"
        label="To (not included)"
        value={value.to ?? ''}
        {...field}
        slotProps={{ inputLabel: { shrink: true } }}
        onChange={(e) => set({ to: e.target.value || undefined })}
      />
      <TextField
        select
        label="First rhythm"
        value={value.firstRhythm ?? ''}
        {...field}
        onChange={(e) =>
          set({ firstRhythm: (e.target.value || undefined) as TrendsFilter['firstRhythm'] })
        }
      >
        <MenuItem value="">Any</MenuItem>
        <MenuItem value="shockable">Shockable (VF / pVT)</MenuItem>
        <MenuItem value="non-shockable">Non-shockable</MenuItem>
      </TextField>
      <TextField
        select
        label="Outcome"
        value={value.outcome ?? ''}
        {...field}
        onChange={(e) => set({ outcome: (e.target.value || undefined) as TrendsFilter['outcome'] })}
      >
        <MenuItem value="">Any</MenuItem>
        {outcomes.map(([v, l]) => (
          <MenuItem key={v} value={v}>
            {l}
          </MenuItem>
        ))}
      </TextField>
    </Stack>
  );
}
