import { Alert, Button, Typography } from '@mui/material';
import type { AgeGroup } from '@upstroke/contracts';
import { type ReactNode, useState } from 'react';
import { isPaediatric, type WeightEstimate } from '../lib/paediatric';
import { AgeGroupSwitch, type OnAgeGroup } from './age-group-switch';
import { type Choice, ChoiceDialog } from './choice-dialog';
import { WeightPrompt } from './weight-prompt';

export interface Patient {
  ageGroup?: AgeGroup;
  weightKg?: number;
}

export type OnWeight = (kg: number, estimate?: WeightEstimate & { age: string }) => void;

/**
 * A dose or energy dialog that follows the patient: adults get the fixed choices; a child or
 * infant gets weight-based choices only (a weight is asked for first when none is recorded),
 * and the adult fixed choices only behind an explicit "Adult doses" step that says so.
 */
export function DoseChoiceDialog<T>(props: {
  open: boolean;
  title: string;
  patient: Patient;
  weightChoices: (weightKg: number) => Choice<T>[];
  adultChoices: Choice<T>[];
  /** "Adult doses" or "Adult energies". */
  adultLabel: string;
  onPick: (value: T) => void;
  onWeight: OnWeight;
  onAgeGroup: OnAgeGroup;
  onClose: () => void;
  children?: ReactNode;
}) {
  const [adultStep, setAdultStep] = useState(false);
  const { ageGroup, weightKg } = props.patient;
  const close = () => {
    setAdultStep(false);
    props.onClose();
  };
  const pick = (value: T) => {
    setAdultStep(false);
    props.onPick(value);
  };
  const base = { open: props.open, title: props.title, onPick: pick, onClose: close };
  const onAgeGroup = (g: AgeGroup) => {
    setAdultStep(false);
    props.onAgeGroup(g);
  };
  const ages = <AgeGroupSwitch value={ageGroup ?? 'adult'} onChange={onAgeGroup} />;
  if (!ageGroup || !isPaediatric(ageGroup))
    return (
      <ChoiceDialog {...base} choices={props.adultChoices}>
        {ages}
        {props.children}
      </ChoiceDialog>
    );
  const who = ageGroup === 'infant' ? 'Infant' : 'Child';
  if (!weightKg)
    return (
      <ChoiceDialog {...base} choices={[]}>
        {ages}
        <WeightPrompt ageGroup={ageGroup} onWeight={props.onWeight} />
      </ChoiceDialog>
    );
  if (adultStep)
    return (
      <ChoiceDialog
        {...base}
        title={`${props.title}: ${props.adultLabel.toLowerCase()}`}
        choices={props.adultChoices}
      >
        {ages}
        <Alert severity="warning" sx={{ mb: 1 }}>
          {props.adultLabel}: fixed adult values, not weight-based. This is a {who.toLowerCase()}{' '}
          record ({weightKg} kg).
        </Alert>
        <Button onClick={() => setAdultStep(false)} sx={{ minHeight: 56, mb: 1 }}>
          Back to weight-based choices
        </Button>
        {props.children}
      </ChoiceDialog>
    );
  return (
    <ChoiceDialog {...base} choices={props.weightChoices(weightKg)}>
      {ages}
      <Typography variant="body2" sx={{ mb: 1 }}>
        {who}, {weightKg} kg: weight-based values from the site profile, each with its arithmetic
        and cap.
      </Typography>
      {props.children}
      <Button
        variant="outlined"
        color="warning"
        onClick={() => setAdultStep(true)}
        sx={{ minHeight: 56, mt: 1, display: 'block' }}
      >
        {props.adultLabel}…
      </Button>
    </ChoiceDialog>
  );
}
