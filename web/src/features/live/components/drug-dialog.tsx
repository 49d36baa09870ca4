import { ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import type { EventData, Thresholds } from '@upstroke/contracts';
import { useState } from 'react';
import { ChoiceDialog } from './choice-dialog';
import { drugPresets } from './drug-presets';

export function DrugDialog(props: {
  open: boolean;
  weightKg?: number;
  thresholds: Thresholds;
  onDrug: (data: EventData<'drug'>) => void;
  onClose: () => void;
}) {
  const [route, setRoute] = useState<'iv' | 'io'>('iv');
  const presets = drugPresets(route, props.thresholds, props.weightKg);
  return (
    <ChoiceDialog
      open={props.open}
      title="Drug given"
      choices={presets.map((p) => ({ label: p.label, value: p.data, hint: p.hint }))}
      onPick={props.onDrug}
      onClose={props.onClose}
    >
      <ToggleButtonGroup
        exclusive
        value={route}
        onChange={(_, v: 'iv' | 'io' | null) => v && setRoute(v)}
        aria-label="Route"
      >
        <ToggleButton value="iv" sx={{ minHeight: 56, minWidth: 80 }}>
          IV
        </ToggleButton>
        <ToggleButton value="io" sx={{ minHeight: 56, minWidth: 80 }}>
          IO
        </ToggleButton>
      </ToggleButtonGroup>
      {props.weightKg && (
        <Typography variant="body2" sx={{ mt: 1 }}>
          Child: weight-based doses from the site profile, shown with the arithmetic.
        </Typography>
      )}
    </ChoiceDialog>
  );
}
