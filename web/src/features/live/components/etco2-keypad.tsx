import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { checkEtco2 } from './etco2-check';

const keys = ['1', '2', '3', '4', '5', '6', '7', '8', '9', '.', '0', '⌫'];

/** Typed EtCO2 from the monitor, in the site's unit, range-checked before it is recorded. */
export function Etco2Keypad(props: {
  open: boolean;
  unit: 'mmHg' | 'kPa';
  onValue: (value: number) => void;
  onClose: () => void;
}) {
  const [text, setText] = useState('');
  const [confirming, setConfirming] = useState(false);
  const check = text ? checkEtco2(text, props.unit) : null;
  const close = () => {
    setText('');
    setConfirming(false);
    props.onClose();
  };
  const press = (k: string) => {
    setConfirming(false);
    if (k === '⌫') setText((t) => t.slice(0, -1));
    else if (text.length < 5 && !(k === '.' && (text.includes('.') || props.unit === 'mmHg')))
      setText(text + k);
  };
  const save = () => {
    if (!check || check.kind === 'refuse') return;
    if (check.kind === 'confirm' && !confirming) return setConfirming(true);
    props.onValue(Number(text));
    close();
  };
  return (
    <Dialog open={props.open} onClose={close} aria-labelledby="etco2-title">
      <DialogTitle id="etco2-title">EtCO2 ({props.unit})</DialogTitle>
      <DialogContent>
        <Typography
          variant="h2"
          component="output"
          aria-label="Value typed"
          sx={{ display: 'block', textAlign: 'center', minHeight: 48 }}
        >
          {text || '–'} {props.unit}
        </Typography>
        <div style={{ display: 'grid', gridTemplateColumns: 'repeat(3, 80px)', gap: 8 }}>
          {keys.map((k) => (
            <Button
              key={k}
              variant="outlined"
              onClick={() => press(k)}
              sx={{ minHeight: 64, fontSize: '1.5rem' }}
              aria-label={k === '⌫' ? 'Delete digit' : k === '.' ? 'Decimal point' : k}
              disabled={k === '.' && props.unit === 'mmHg'}
            >
              {k}
            </Button>
          ))}
        </div>
        {check?.kind === 'refuse' && (
          <Alert severity="error" sx={{ mt: 1 }}>
            {check.message}
          </Alert>
        )}
        {check?.kind === 'confirm' && confirming && (
          <Alert severity="warning" sx={{ mt: 1 }}>
            {check.message}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={close} sx={{ minHeight: 56 }}>
          Cancel
        </Button>
        <Button
          variant="contained"
          onClick={save}
          disabled={!check || check.kind === 'refuse'}
          sx={{ minHeight: 56, minWidth: 120 }}
        >
          {confirming ? 'Record anyway' : 'Record'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
