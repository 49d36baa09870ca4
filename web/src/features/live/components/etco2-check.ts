import { toMmHg } from '@upstroke/capno';
import { formatEtco2 } from '@upstroke/contracts';

/** Above this, a value during CPR is unusual enough to ask "are you sure?" (common practice). */
export const CONFIRM_ABOVE_MMHG = 60;
export const MAX_MMHG = 150;

export type Etco2Check =
  | { kind: 'ok'; mmHg: number }
  | { kind: 'confirm'; mmHg: number; message: string }
  | { kind: 'refuse'; message: string };

/** Range check of a typed EtCO2 value (0–150 mmHg, whatever the unit typed). */
export function checkEtco2(text: string, unit: 'mmHg' | 'kPa'): Etco2Check {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value))
    return { kind: 'refuse', message: 'Type a number' };
  const mmHg = toMmHg(value, unit);
  if (mmHg < 0 || mmHg > MAX_MMHG)
    return {
      kind: 'refuse',
      message: `EtCO2 must be between 0 and ${formatEtco2(MAX_MMHG, unit)}`,
    };
  if (mmHg > CONFIRM_ABOVE_MMHG)
    return {
      kind: 'confirm',
      mmHg,
      message: `${value} ${unit} is unusually high. Record it anyway?`,
    };
  return { kind: 'ok', mmHg };
}
