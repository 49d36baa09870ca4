import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Stack,
  Typography,
} from '@mui/material';
import type { ReactNode } from 'react';

export interface Choice<T> {
  label: string;
  value: T;
  hint?: string;
}

/** One tap to record: a title and large choices (energies, rhythms, routes…). */
export function ChoiceDialog<T>({
  open,
  title,
  choices,
  onPick,
  onClose,
  children,
}: {
  open: boolean;
  title: string;
  choices: Choice<T>[];
  onPick: (value: T) => void;
  onClose: () => void;
  children?: ReactNode;
}) {
  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="choice-title">
      <DialogTitle id="choice-title">{title}</DialogTitle>
      <DialogContent>
        {children}
        <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1.5, mt: 1 }}>
          {choices.map((c) => (
            <Button
              key={c.label}
              variant="contained"
              onClick={() => onPick(c.value)}
              sx={{ minHeight: 64, minWidth: 120, fontSize: '1.2rem', flexDirection: 'column' }}
            >
              {c.label}
              {c.hint && (
                <Typography variant="caption" component="span" sx={{ display: 'block' }}>
                  {c.hint}
                </Typography>
              )}
            </Button>
          ))}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} sx={{ minHeight: 56 }}>
          Cancel
        </Button>
      </DialogActions>
    </Dialog>
  );
}
