import type { Thresholds } from '@upstroke/contracts';
import { paediatricShocks } from '../lib/paediatric';
import type { Choice } from './choice-dialog';
import type { OnAgeGroup } from './age-group-switch';
import { DoseChoiceDialog, type OnWeight, type Patient } from './dose-choice-dialog';

/** Common adult biphasic settings (common practice; the device's own range applies). */
const adultEnergies: Choice<number>[] = [120, 150, 200, 300, 360].map((j) => ({
  label: `${j} J`,
  value: j,
}));

export function ShockDialog(props: {
  open: boolean;
  patient: Patient;
  thresholds: Thresholds;
  shocksGiven: number;
  onShock: (energyJ: number) => void;
  onWeight: OnWeight;
  onAgeGroup: OnAgeGroup;
  onClose: () => void;
}) {
  const weightChoices = (kg: number): Choice<number>[] =>
    paediatricShocks(props.thresholds, kg, props.shocksGiven).map((d) => ({
      label: `${d.value} J`,
      value: d.value,
      hint: d.working,
    }));
  return (
    <DoseChoiceDialog
      open={props.open}
      title="Shock: energy"
      patient={props.patient}
      weightChoices={weightChoices}
      adultChoices={adultEnergies}
      adultLabel="Adult energies"
      onPick={props.onShock}
      onWeight={props.onWeight}
      onAgeGroup={props.onAgeGroup}
      onClose={props.onClose}
    />
  );
}
