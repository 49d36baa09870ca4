import { MenuItem, Stack, TextField } from '@mui/material';
import { auditActionLabels, auditEntityLabels, labelOf } from '@upstroke/contracts';
import { useUsers } from '../api/list-users';
import { type AuditFilters, useAuditVocabulary } from '../api/list-audit';

/** `datetime-local` value (local time) ↔ ISO-8601 with offset for the API. */
const toIso = (local: string) => (local ? new Date(local).toISOString() : undefined);

export function AuditFilterBar({
  value,
  onChange,
}: {
  value: AuditFilters;
  onChange: (f: AuditFilters) => void;
}) {
  const users = useUsers();
  const vocabulary = useAuditVocabulary();
  const set = (patch: AuditFilters) => onChange({ ...value, ...patch });
  const select = (
    label: string,
    key: 'action' | 'entity' | 'userId',
    options: { value: string; label: string }[],
  ) => (
    <TextField
      select
      label={label}
      value={value[key] ?? ''}
      onChange={(e) => set({ [key]: e.target.value || undefined })}
      sx={{ minWidth: 180 }}
    >
      <MenuItem value="">Any</MenuItem>
      {options.map((o) => (
        <MenuItem key={o.value} value={o.value}>
          {o.label}
        </MenuItem>
      ))}
    </TextField>
  );
  return (
    <Stack
      direction="row"
      sx={{ flexWrap: 'wrap', gap: 2 }}
      role="search"
      aria-label="Audit filters"
    >
      {select(
        'User',
        'userId',
        (users.data?.items ?? []).map((u) => ({ value: u.id, label: u.name })),
      )}
      {select(
        'Action',
        'action',
        (vocabulary.data?.actions ?? []).map((a) => ({
          value: a,
          label: labelOf(auditActionLabels, a),
        })),
      )}
      {select(
        'Entity',
        'entity',
        (vocabulary.data?.entities ?? []).map((a) => ({
          value: a,
          label: labelOf(auditEntityLabels, a),
        })),
      )}
      <TextField
        label="Record id"
        value={value.resuscitationId ?? ''}
        onChange={(e) => set({ resuscitationId: e.target.value.trim() || undefined })}
        error={
          Boolean(value.resuscitationId) && !/^[0-9a-f-]{36}$/i.test(value.resuscitationId ?? '')
        }
        helperText={
          value.resuscitationId && !/^[0-9a-f-]{36}$/i.test(value.resuscitationId)
            ? 'A record id has 36 characters'
            : undefined
        }
        sx={{ minWidth: 320 }}
      />
      <TextField
        label="From"
        type="datetime-local"
        onChange={(e) => set({ from: toIso(e.target.value) })}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <TextField
        label="To"
        type="datetime-local"
        onChange={(e) => set({ to: toIso(e.target.value) })}
        slotProps={{ inputLabel: { shrink: true } }}
      />
    </Stack>
  );
}
