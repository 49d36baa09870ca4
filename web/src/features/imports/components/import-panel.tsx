import { Alert, Button, LinearProgress, Paper, Stack, Typography } from '@mui/material';
import type { MonitorImport } from '@upstroke/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { ApiRequestError } from '../../../lib/api-client';
import { useAuth } from '../../../hooks/use-auth';
import { useImports } from '../api/get-imports';
import { uploadImport } from '../api/upload-import';
import { OffsetEditor } from './offset-editor';

export interface ImportPanelProps {
  resuscitationId: string;
  /** Called while the lead moves the offset, before it is saved (timeline preview). */
  onOffsetPreview?: (offsetSec: number) => void;
}

type Upload =
  | { state: 'idle' }
  | { state: 'sending'; fraction: number; name: string }
  | { state: 'failed'; message: string; lines: { path: string; message: string }[] }
  | { state: 'done'; item: MonitorImport };

/**
 * Monitor file import on the Debrief page: choose a CSV (format in CONTRACT.md), watch it
 * upload, see every line the server refused, and line its clock up with the record.
 */
export function ImportPanel({ resuscitationId, onOffsetPreview }: ImportPanelProps) {
  const input = useRef<HTMLInputElement>(null);
  const [upload, setUpload] = useState<Upload>({ state: 'idle' });
  const imports = useImports(resuscitationId);
  const client = useQueryClient();
  const { hasRole } = useAuth();
  const send = async (file: File) => {
    setUpload({ state: 'sending', fraction: 0, name: file.name });
    try {
      const item = await uploadImport(resuscitationId, file, (fraction) =>
        setUpload({ state: 'sending', fraction, name: file.name }),
      );
      setUpload({ state: 'done', item });
      await client.invalidateQueries({ queryKey: ['resuscitations', resuscitationId] });
      await client.invalidateQueries({ queryKey: ['debrief', resuscitationId] });
    } catch (e) {
      const body = e instanceof ApiRequestError ? e.body : null;
      const message = body?.message ?? (e instanceof Error ? e.message : 'The upload failed');
      setUpload({ state: 'failed', message, lines: body?.details ?? [] });
    }
  };
  return (
    <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-label="Monitor file import">
      <Stack spacing={1.5}>
        <Typography variant="h6" component="h2">
          Monitor file
        </Typography>
        <Typography variant="body2" color="text.secondary">
          A CSV exported from the monitor: columns time, co2 and optionally unit and event (shock
          markers line the monitor clock up with the record).
        </Typography>
        <input
          ref={input}
          type="file"
          accept=".csv,text/csv"
          hidden
          aria-label="Monitor file"
          onChange={(e) => {
            const file = e.target.files?.[0];
            e.target.value = '';
            if (file) void send(file);
          }}
        />
        <Button
          variant="contained"
          onClick={() => input.current?.click()}
          disabled={upload.state === 'sending'}
          sx={{ minHeight: 48, alignSelf: 'flex-start' }}
        >
          Import monitor file
        </Button>
        <UploadState upload={upload} />
        {imports.data?.items.map((item) => (
          <Stack key={item.id} spacing={0.5}>
            <Typography variant="subtitle2">
              {item.fileName}: {item.rows.toLocaleString()} rows at {item.sampleRateHz} Hz,{' '}
              {item.breaths} breaths
            </Typography>
            <OffsetEditor item={item} canAdjust={hasRole('lead')} onPreview={onOffsetPreview} />
          </Stack>
        ))}
        {imports.isError && <Alert severity="error">The imports could not be loaded.</Alert>}
      </Stack>
    </Paper>
  );
}

function UploadState({ upload }: { upload: Upload }) {
  if (upload.state === 'sending')
    return (
      <Stack spacing={0.5}>
        <Typography variant="body2">Sending {upload.name}…</Typography>
        <LinearProgress
          variant="determinate"
          value={Math.round(upload.fraction * 100)}
          aria-label="Upload progress"
        />
      </Stack>
    );
  if (upload.state === 'done')
    return <Alert severity="success">Imported {upload.item.fileName}.</Alert>;
  if (upload.state !== 'failed') return null;
  return (
    <Alert severity="error">
      {upload.message}
      {upload.lines.length > 0 && (
        <ul aria-label="Line errors">
          {upload.lines.map((l) => (
            <li key={`${l.path}-${l.message}`}>
              {l.path}: {l.message}
            </li>
          ))}
        </ul>
      )}
    </Alert>
  );
}
