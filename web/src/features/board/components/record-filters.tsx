import {
  Button,
  FormControlLabel,
  MenuItem,
  Stack,
  Switch,
  TextField,
  type TextFieldProps,
} from '@mui/material';
import { resuscitationStatusLabels, type SiteContext } from '@upstroke/contracts';
import { useState } from 'react';
import { isFiltered, type RecordFilters } from '../hooks/use-record-filters';

interface Props {
  filters: RecordFilters;
  sites: SiteContext[];
  onChange: (patch: Partial<RecordFilters>) => void;
  onClear: () => void;
}

const selectProps: Partial<TextFieldProps> = { select: true, size: 'small', sx: { minWidth: 170 } };

/** Search (location, patient reference, unit) and filters for the records on the user's sites. */
export function RecordFiltersBar({ filters, sites, onChange, onClear }: Props) {
  const [q, setQ] = useState(filters.q);
  const units = sites.flatMap((s) =>
    s.units.map((u) => ({ id: u.id, name: sites.length > 1 ? `${u.name} (${s.name})` : u.name })),
  );
  return (
    <Stack
      component="form"
      role="search"
      aria-label="Find a record"
      direction="row"
      sx={{ flexWrap: 'wrap', gap: 1.5, alignItems: 'center' }}
      onSubmit={(e) => {
        e.preventDefault();
        onChange({ q });
      }}
    >
      <TextField
        size="small"
        type="search"
        label="Search"
        placeholder="Location, patient ref. or unit"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        slotProps={{ htmlInput: { maxLength: 100 } }}
      />
      <Button type="submit" variant="contained" sx={{ minHeight: 40 }}>
        Search
      </Button>
      <TextField
        size="small"
        type="date"
        label="From"
        value={filters.from}
        onChange={(e) => onChange({ from: e.target.value })}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <TextField
        size="small"
        type="date"
        label="To"
        value={filters.to}
        onChange={(e) => onChange({ to: e.target.value })}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <TextField
        {...selectProps}
        label="Unit"
        value={filters.unitId}
        onChange={(e) => onChange({ unitId: e.target.value })}
      >
        <MenuItem value="">All units</MenuItem>
        {units.map((u) => (
          <MenuItem key={u.id} value={u.id}>
            {u.name}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        {...selectProps}
        label="Status"
        value={filters.status}
        onChange={(e) => onChange({ status: e.target.value as RecordFilters['status'] })}
      >
        <MenuItem value="">Any status</MenuItem>
        {Object.entries(resuscitationStatusLabels).map(([v, l]) => (
          <MenuItem key={v} value={v}>
            {l}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        {...selectProps}
        label="Signature"
        value={filters.signed}
        onChange={(e) => onChange({ signed: e.target.value as RecordFilters['signed'] })}
      >
        <MenuItem value="">Signed or not</MenuItem>
        <MenuItem value="signed">Signed</MenuItem>
        <MenuItem value="unsigned">Not signed yet</MenuItem>
      </TextField>
      <FormControlLabel
        control={
          <Switch checked={filters.mine} onChange={(e) => onChange({ mine: e.target.checked })} />
        }
        label="My records"
      />
      {isFiltered(filters) && (
        <Button
          onClick={() => {
            setQ('');
            onClear();
          }}
        >
          Clear filters
        </Button>
      )}
    </Stack>
  );
}
