import { Typography } from '@mui/material';
import type { Thresholds } from '@upstroke/contracts';
import { paediatricShock } from '../lib/paediatric';
import { ChoiceDialog, type Choice } from './choice-dialog';

/** Common adult biphasic settings (common practice; the device's own range applies). */
const adultEnergies = [120, 150, 200, 300, 360];

export function ShockDialog(props: {
  open: boolean;
  weightKg?: number;
  thresholds: Thresholds;
  shocksGiven: number;
  onShock: (energyJ: number) => void;
  onClose: () => void;
}) {
  const child = props.weightKg
    ? paediatricShock(props.thresholds, props.weightKg, props.shocksGiven)
    : null;
  const choices: Choice<number>[] = adultEnergies.map((j) => ({ label: `${j} J`, value: j }));
  if (child) choices.unshift({ label: `${child.value} J`, value: child.value, hint: 'per kg' });
  return (
    <ChoiceDialog
      open={props.open}
      title="Shock: energy"
      choices={choices}
      onPick={props.onShock}
      onClose={props.onClose}
    >
      {child && (
        <Typography aria-label="Weight-based energy">
          Child ({props.weightKg} kg): {child.working} (site profile)
        </Typography>
      )}
    </ChoiceDialog>
  );
}
