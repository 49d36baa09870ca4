import { Typography } from '@mui/material';

/** What the last Undo took back, in one line of fixed height (nothing below it moves). */
export function UndoNotice({ text }: { text: string | null }) {
  return (
    <Typography role="status" aria-label="Undo" sx={{ minHeight: 24, fontWeight: 600 }}>
      {text ? `Undid: ${text}` : ''}
    </Typography>
  );
}
