import { ToggleButton, ToggleButtonGroup } from '@mui/material';
import type { EventData, Thresholds } from '@upstroke/contracts';
import { useState } from 'react';
import type { OnAgeGroup } from './age-group-switch';
import { DoseChoiceDialog, type OnWeight, type Patient } from './dose-choice-dialog';
import { adultDrugPresets, type DrugPreset, paediatricDrugPresets } from './drug-presets';

const asChoices = (presets: DrugPreset[]) =>
  presets.map((p) => ({ label: p.label, value: p.data, hint: p.hint }));

export function DrugDialog(props: {
  open: boolean;
  patient: Patient;
  thresholds: Thresholds;
  onDrug: (data: EventData<'drug'>) => void;
  onWeight: OnWeight;
  onAgeGroup: OnAgeGroup;
  onClose: () => void;
}) {
  const [route, setRoute] = useState<'iv' | 'io'>('iv');
  return (
    <DoseChoiceDialog
      open={props.open}
      title="Drug given"
      patient={props.patient}
      weightChoices={(kg) => asChoices(paediatricDrugPresets(route, props.thresholds, kg))}
      adultChoices={asChoices(adultDrugPresets(route))}
      adultLabel="Adult doses"
      onPick={props.onDrug}
      onWeight={props.onWeight}
      onAgeGroup={props.onAgeGroup}
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
    </DoseChoiceDialog>
  );
}
