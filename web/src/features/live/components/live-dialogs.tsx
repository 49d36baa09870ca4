import { memo } from 'react';
import {
  endReasonLabels,
  type EventData,
  type EventKind,
  type Thresholds,
} from '@upstroke/contracts';
import type { OnAgeGroup } from './age-group-switch';
import { AirwayDialog } from './airway-dialog';
import { ChoiceDialog } from './choice-dialog';
import type { OnWeight, Patient } from './dose-choice-dialog';
import { DrugDialog } from './drug-dialog';
import { Etco2Keypad } from './etco2-keypad';
import { NoteDialog } from './note-dialog';
import { ShockDialog } from './shock-dialog';

export type DialogName =
  'shock' | 'drug' | 'airway' | 'rhythm' | 'pulse' | 'access' | 'note' | 'etco2' | 'end';

type Record = <K extends EventKind>(kind: K, data: EventData<K>) => void;

const rhythms = [
  { label: 'VF', value: 'vf' },
  { label: 'pVT', value: 'pvt' },
  { label: 'PEA', value: 'pea' },
  { label: 'Asystole', value: 'asystole' },
  { label: 'Organised', value: 'organised' },
] as const;
type EndReason = 'rosc-sustained' | 'terminated' | 'transferred';
// The contract's reasons, labelled as a tap can know them ("ROSC at end of record").
const endReasons = (['rosc-sustained', 'terminated', 'transferred'] as const).map((value) => ({
  label: endReasonLabels[value],
  value,
}));

/** The quick dialogs behind the Live buttons; each records one event and closes. */
export const LiveDialogs = memo(function LiveDialogs(props: {
  open: DialogName | null;
  onClose: () => void;
  record: Record;
  onEtco2: (value: number) => void;
  onEnd: (reason: EndReason) => void;
  thresholds: Thresholds;
  etco2Unit: 'mmHg' | 'kPa';
  /** Age group and weight: child and infant records get weight-based choices only. */
  patient: Patient;
  onWeight: OnWeight;
  onAgeGroup: OnAgeGroup;
  shocksGiven: number;
}) {
  const { open, onClose, record } = props;
  const done =
    <K extends EventKind>(kind: K) =>
    (data: EventData<K>) => {
      record(kind, data);
      onClose();
    };
  return (
    <>
      <ShockDialog
        open={open === 'shock'}
        patient={props.patient}
        thresholds={props.thresholds}
        shocksGiven={props.shocksGiven}
        onWeight={props.onWeight}
        onAgeGroup={props.onAgeGroup}
        onShock={(energyJ) => done('shock')({ energyJ })}
        onClose={onClose}
      />
      <DrugDialog
        open={open === 'drug'}
        patient={props.patient}
        thresholds={props.thresholds}
        onDrug={done('drug')}
        onWeight={props.onWeight}
        onAgeGroup={props.onAgeGroup}
        onClose={onClose}
      />
      <AirwayDialog
        open={open === 'airway'}
        onAirway={(d) => record('airway', d)}
        onClose={onClose}
      />
      <ChoiceDialog
        open={open === 'rhythm'}
        title="Rhythm"
        choices={[...rhythms]}
        onPick={(rhythm) => done('rhythm')({ rhythm })}
        onClose={onClose}
      />
      <ChoiceDialog
        open={open === 'pulse'}
        title="Pulse"
        choices={[
          { label: 'Pulse present', value: true },
          { label: 'No pulse', value: false },
        ]}
        onPick={(present) => done('pulse')({ present })}
        onClose={onClose}
      />
      <ChoiceDialog
        open={open === 'access'}
        title="Access"
        choices={[
          { label: 'IV', value: 'iv' as const },
          { label: 'IO', value: 'io' as const },
        ]}
        onPick={(route) => done('access')({ route })}
        onClose={onClose}
      />
      <ChoiceDialog
        open={open === 'end'}
        title="End the code"
        choices={endReasons}
        onPick={(reason) => {
          props.onEnd(reason);
          onClose();
        }}
        onClose={onClose}
      />
      <NoteDialog
        open={open === 'note'}
        onNote={(text) => done('note')({ text })}
        onClose={onClose}
      />
      <Etco2Keypad
        open={open === 'etco2'}
        unit={props.etco2Unit}
        onValue={props.onEtco2}
        onClose={onClose}
      />
    </>
  );
});
