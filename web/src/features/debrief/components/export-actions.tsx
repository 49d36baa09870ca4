import { Alert, Button, Stack } from '@mui/material';
import { useState } from 'react';
import { useAuth } from '../../../hooks/use-auth';
import { downloadExport } from '../api/download-export';
import { EmailDialog } from './email-dialog';

/** PDF and FHIR for the chart (leads and quality), e-mail to the team (leads). */
export function ExportActions({ id, offline }: { id: string; offline: boolean }) {
  const { hasRole } = useAuth();
  const [error, setError] = useState<string | null>(null);
  const [emailing, setEmailing] = useState(false);
  if (!hasRole('lead', 'quality')) return null;
  const get = (kind: 'pdf' | 'fhir') => {
    setError(null);
    downloadExport(id, kind).catch((e: unknown) =>
      setError(e instanceof Error ? e.message : 'Download failed'),
    );
  };
  return (
    <Stack spacing={1}>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button
          variant="outlined"
          onClick={() => get('pdf')}
          disabled={offline}
          sx={{ minHeight: 48 }}
        >
          PDF
        </Button>
        <Button
          variant="outlined"
          onClick={() => get('fhir')}
          disabled={offline}
          sx={{ minHeight: 48 }}
        >
          FHIR
        </Button>
        {hasRole('lead') && (
          <Button
            variant="outlined"
            onClick={() => setEmailing(true)}
            disabled={offline}
            sx={{ minHeight: 48 }}
          >
            E-mail
          </Button>
        )}
      </Stack>
      {error && <Alert severity="error">{error}</Alert>}
      {emailing && <EmailDialog id={id} onClose={() => setEmailing(false)} />}
    </Stack>
  );
}
