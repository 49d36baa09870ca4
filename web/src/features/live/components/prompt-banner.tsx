import { Alert, Stack } from '@mui/material';
import type { Prompt } from '../hooks/use-prompts';

/** Room for two prompts; more scroll inside it. */
export const PROMPT_AREA_PX = 104;

/**
 * Prompts during the code: what the record shows, never an order (caution always visible).
 * The area keeps one height whether it holds no prompt or several, so the buttons below it
 * never move under a finger when a prompt appears.
 */
export function PromptBanner({ prompts }: { prompts: Prompt[] }) {
  return (
    <Stack
      spacing={0.5}
      role="status"
      aria-label="Prompts"
      aria-live="polite"
      sx={{ height: PROMPT_AREA_PX, flexShrink: 0, overflowY: 'auto', '& > *': { flexShrink: 0 } }}
    >
      {prompts.map((p) => (
        <Alert
          key={p.key}
          severity={p.severity}
          variant={p.severity === 'success' ? 'outlined' : 'filled'}
          sx={{ fontSize: '1.1rem', py: 0 }}
        >
          {p.text}
        </Alert>
      ))}
    </Stack>
  );
}
