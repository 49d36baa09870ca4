import { memo } from 'react';
import { Checkbox, FormControlLabel, FormGroup, Typography } from '@mui/material';
import type { LocalEvent } from '../../../lib/offline';

/** The trade's reversible causes (4 Hs and 4 Ts); ticking one records a note. */
export const reversibleCauses = [
  'Hypoxia',
  'Hypovolaemia',
  'Hypo-/hyperkalaemia and metabolic',
  'Hypothermia',
  'Thrombosis (coronary or pulmonary)',
  'Tension pneumothorax',
  'Tamponade',
  'Toxins',
];
const prefix = 'Reversible cause considered: ';

export const CausesChecklist = memo(function CausesChecklist(props: {
  events: LocalEvent[];
  onNote: (text: string) => void;
}) {
  const ticked = new Set(
    props.events
      .filter((e) => e.kind === 'note' && String(e.data.text).startsWith(prefix))
      .map((e) => String(e.data.text).slice(prefix.length)),
  );
  return (
    <FormGroup aria-label="Reversible causes">
      <Typography variant="subtitle2">Reversible causes (4 Hs, 4 Ts)</Typography>
      {reversibleCauses.map((c) => (
        <FormControlLabel
          key={c}
          label={c}
          sx={{ minHeight: 48 }}
          control={
            <Checkbox
              checked={ticked.has(c)}
              disabled={ticked.has(c)}
              onChange={() => props.onNote(prefix + c)}
            />
          }
        />
      ))}
    </FormGroup>
  );
});
