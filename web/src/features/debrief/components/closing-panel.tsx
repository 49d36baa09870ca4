import { Alert, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import {
  type DebriefEvent,
  type DebriefRecord,
  formatDateTime,
  outcomeLabels,
  rhythmName,
} from '@upstroke/contracts';
import { useState } from 'react';
import { useSign, useUpdateClosing } from '../api/sign-resuscitation';
import { AmendDialog } from './amend-dialog';
import { SignDialog } from './sign-dialog';

type Tri = '' | 'yes' | 'no';
const tri = (v: boolean | null): Tri => (v === null ? '' : v ? 'yes' : 'no');
const fromTri = (v: Tri) => (v === '' ? null : v === 'yes');
const rhythms = ['vf', 'pvt', 'pea', 'asystole', 'organised'];

/**
 * Utstein core closing details, the signature, and afterwards amendments only: a signed
 * record shows its details read-only and offers "Amend" instead of "Save".
 */
export function ClosingPanel({
  record,
  events,
  canSign,
}: {
  record: DebriefRecord;
  events: DebriefEvent[];
  canSign: boolean;
}) {
  const signed = record.status === 'signed';
  const [form, setForm] = useState({
    outcome: record.outcome ?? '',
    firstRhythm: record.firstRhythm ?? '',
    witnessed: tri(record.witnessed),
    monitored: tri(record.monitored),
  });
  const [amending, setAmending] = useState(false);
  const [signing, setSigning] = useState(false);
  const save = useUpdateClosing(record.id);
  const sign = useSign(record.id);
  const missing = [
    !form.outcome && 'Outcome',
    !form.firstRhythm && 'First documented rhythm',
    !form.witnessed && 'Witnessed',
    !form.monitored && 'Monitored',
  ].filter((m): m is string => Boolean(m));
  const body = {
    outcome: (form.outcome || null) as DebriefRecord['outcome'],
    firstRhythm: (form.firstRhythm || null) as DebriefRecord['firstRhythm'],
    witnessed: fromTri(form.witnessed),
    monitored: fromTri(form.monitored),
  };
  const field = (name: keyof typeof form, label: string, options: [string, string][]) => (
    <TextField
      select
      label={label}
      value={form[name]}
      disabled={signed || !canSign}
      onChange={(e) => setForm({ ...form, [name]: e.target.value })}
      sx={{ minWidth: 200 }}
    >
      <MenuItem value="">Not recorded</MenuItem>
      {options.map(([v, l]) => (
        <MenuItem key={v} value={v}>
          {l}
        </MenuItem>
      ))}
    </TextField>
  );
  const yesNo: [string, string][] = [
    ['yes', 'Yes'],
    ['no', 'No'],
  ];
  return (
    <Stack spacing={2} component="section" aria-label="Closing details">
      <Stack direction="row" spacing={2} sx={{ flexWrap: 'wrap', gap: 2 }}>
        {field('outcome', 'Outcome', Object.entries(outcomeLabels))}
        {field(
          'firstRhythm',
          'First documented rhythm',
          rhythms.map((r) => [r, rhythmName(r)]),
        )}
        {field('witnessed', 'Witnessed', yesNo)}
        {field('monitored', 'Monitored', yesNo)}
      </Stack>
      {signed ? (
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <Alert severity="success" sx={{ flex: 1 }}>
            Signed by {record.signedByName ?? 'the lead'} on{' '}
            {formatDateTime(record.signedAt, record.display)}. The record is locked; corrections are
            amendments with a reason.
          </Alert>
          {canSign && (
            <Button variant="contained" onClick={() => setAmending(true)} sx={{ minHeight: 48 }}>
              Amend
            </Button>
          )}
        </Stack>
      ) : (
        canSign && (
          <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
            <Button
              variant="outlined"
              onClick={() => save.mutate(body)}
              disabled={save.isPending}
              sx={{ minHeight: 48 }}
            >
              Save closing details
            </Button>
            <Button variant="contained" sx={{ minHeight: 48 }} onClick={() => setSigning(true)}>
              Sign and lock…
            </Button>
            {missing.length > 0 && (
              <Typography variant="body2" color="text.secondary">
                All four details are needed to sign.
              </Typography>
            )}
          </Stack>
        )
      )}
      {(save.error ?? sign.error) && (
        <Alert severity="error">{(save.error ?? sign.error)?.message}</Alert>
      )}
      {amending && (
        <AmendDialog record={record} events={events} onClose={() => setAmending(false)} />
      )}
      {signing && (
        <SignDialog
          resuscitationId={record.id}
          missing={missing}
          pending={save.isPending || sign.isPending}
          onClose={() => setSigning(false)}
          onConfirm={() =>
            save.mutate(body, {
              onSuccess: () => sign.mutate(undefined, { onSuccess: () => setSigning(false) }),
            })
          }
        />
      )}
    </Stack>
  );
}
