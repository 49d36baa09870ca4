import { memo } from 'react';
import { Box, Button, type Theme } from '@mui/material';
import type { PatientState } from '@upstroke/capno';
import type { DialogName } from './live-dialogs';

interface Action {
  name: string;
  dialog?: DialogName;
  onTap?: () => void;
  color?: 'primary' | 'secondary' | 'error' | 'success' | 'warning' | 'inherit';
  disabled?: boolean;
  /** The obvious next action in this state: drawn with a ring (never moved). */
  next?: boolean;
}

const pressable = {
  minHeight: 72,
  fontSize: '1.25rem',
  '&:active': { transform: 'scale(0.97)', filter: 'brightness(0.85)' },
  '&.Mui-focusVisible': { outline: '3px solid', outlineColor: 'text.primary', outlineOffset: 2 },
} as const;

const ring = {
  boxShadow: (t: Theme) =>
    `0 0 0 4px ${t.palette.background.default}, 0 0 0 8px ${t.palette.warning.dark}`,
} as const;

/**
 * The Live buttons: one tap each, or one tap to a quick dialog. Named exactly as the trade
 * says. Every button keeps its place in every state (nothing moves under a finger); ROSC and
 * Re-arrest are offered only where they mean something, and Re-arrest is ringed during ROSC.
 */
export const ActionGrid = memo(function ActionGrid(props: {
  phase: PatientState;
  onOpen: (d: DialogName) => void;
  onRosc: () => void;
  onRearrest: () => void;
  onUndo: () => void;
  canUndo: boolean;
}) {
  const rosc = props.phase === 'rosc';
  const actions: Action[] = [
    { name: 'Shock', dialog: 'shock', color: 'error' },
    { name: 'Drug', dialog: 'drug', color: 'secondary' },
    { name: 'Airway', dialog: 'airway' },
    { name: 'Rhythm', dialog: 'rhythm' },
    { name: 'Pulse', dialog: 'pulse' },
    { name: 'ROSC', onTap: props.onRosc, color: 'success', disabled: rosc },
    { name: 'Re-arrest', onTap: props.onRearrest, color: 'warning', disabled: !rosc, next: rosc },
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
          sx={a.next ? { ...pressable, ...ring } : pressable}
        >
          {a.name}
        </Button>
      ))}
    </Box>
  );
});
