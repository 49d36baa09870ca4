import { Alert, Stack } from '@mui/material';
import type { Prompt } from '../hooks/use-prompts';

/** Prompts during the code: what the record shows, never an order (caution always visible). */
export function PromptBanner({ prompts }: { prompts: Prompt[] }) {
  return (
    <Stack
      spacing={0.5}
      role="status"
      aria-label="Prompts"
      aria-live="polite"
      sx={{ minHeight: 48 }}
    >
      {prompts.map((p) => (
        <Alert
          key={p.key}
          severity={p.severity}
          variant="filled"
          sx={{ fontSize: '1.1rem', py: 0 }}
        >
          {p.text}
        </Alert>
      ))}
    </Stack>
  );
}
