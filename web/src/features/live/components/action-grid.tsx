import { memo } from 'react';
import { Button, Box } from '@mui/material';
import type { DialogName } from './live-dialogs';

interface Action {
  name: string;
  dialog?: DialogName;
  onTap?: () => void;
  color?: 'primary' | 'secondary' | 'error' | 'success' | 'warning' | 'inherit';
  disabled?: boolean;
}

const pressable = {
  minHeight: 72,
  fontSize: '1.25rem',
  '&:active': { transform: 'scale(0.97)', filter: 'brightness(0.85)' },
  '&.Mui-focusVisible': { outline: '3px solid', outlineColor: 'text.primary', outlineOffset: 2 },
} as const;

/** The Live buttons: one tap each, or one tap to a quick dialog. Named exactly as the trade says. */
export const ActionGrid = memo(function ActionGrid(props: {
  onOpen: (d: DialogName) => void;
  onRosc: () => void;
  onRearrest: () => void;
  onUndo: () => void;
  canUndo: boolean;
}) {
  const actions: Action[] = [
    { name: 'Shock', dialog: 'shock', color: 'error' },
    { name: 'Drug', dialog: 'drug', color: 'secondary' },
    { name: 'Airway', dialog: 'airway' },
    { name: 'Rhythm', dialog: 'rhythm' },
    { name: 'Pulse', dialog: 'pulse' },
    { name: 'ROSC', onTap: props.onRosc, color: 'success' },
    { name: 'Re-arrest', onTap: props.onRearrest, color: 'warning' },
    { name: 'Access', dialog: 'access' },
    { name: 'Note', dialog: 'note' },
    { name: 'EtCO2', dialog: 'etco2', color: 'secondary' },
    { name: 'Undo', onTap: props.onUndo, color: 'inherit', disabled: !props.canUndo },
    { name: 'End', dialog: 'end', color: 'inherit' },
  ];
  return (
    <Box
      sx={{
        display: 'grid',
        gridTemplateColumns: { xs: 'repeat(3, 1fr)', md: 'repeat(4, 1fr)' },
        gap: 1,
      }}
    >
      {actions.map((a) => (
        <Button
          key={a.name}
          variant={a.color === 'inherit' ? 'outlined' : 'contained'}
          color={a.color ?? 'primary'}
          disabled={a.disabled}
          onClick={() => (a.dialog ? props.onOpen(a.dialog) : a.onTap?.())}
          // An instant pressed look instead of the ripple: visible at once through gloves,
          // and no element added and animated on every tap during a code.
          disableRipple
          sx={pressable}
        >
          {a.name}
        </Button>
      ))}
    </Box>
  );
});
