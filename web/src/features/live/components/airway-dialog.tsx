import type { EventData } from '@upstroke/contracts';
import { useState } from 'react';
import { ChoiceDialog } from './choice-dialog';

type Device = EventData<'airway'>['device'];
type Confirmation = NonNullable<EventData<'airway'>['confirmation']>;

const devices: { label: string; value: Device }[] = [
  { label: 'Bag-mask', value: 'bag-mask' },
  { label: 'Supraglottic', value: 'supraglottic' },
  { label: 'Tracheal tube', value: 'tracheal-tube' },
];
const confirmations: { label: string; value: Confirmation }[] = [
  { label: 'Waveform capnography', value: 'waveform-capnography' },
  { label: 'Colorimetric', value: 'colorimetric' },
  { label: 'Auscultation', value: 'auscultation' },
  { label: 'Not confirmed', value: 'none' },
];

/** Two taps: the device, then how its position was confirmed (bag-mask needs none). */
export function AirwayDialog(props: {
  open: boolean;
  onAirway: (data: EventData<'airway'>) => void;
  onClose: () => void;
}) {
  const [device, setDevice] = useState<Device | null>(null);
  const close = () => {
    setDevice(null);
    props.onClose();
  };
  const pickDevice = (d: Device) => {
    if (d === 'bag-mask') {
      props.onAirway({ device: d });
      close();
    } else setDevice(d);
  };
  if (device)
    return (
      <ChoiceDialog
        open={props.open}
        title="Airway: confirmed by"
        choices={confirmations}
        onPick={(c) => {
          props.onAirway({ device, confirmation: c });
          close();
        }}
        onClose={close}
      />
    );
  return (
    <ChoiceDialog
      open={props.open}
      title="Airway: device"
      choices={devices}
      onPick={pickDevice}
      onClose={close}
    />
  );
}
