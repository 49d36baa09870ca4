import { memo, useState } from 'react';
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

/** The causes already ticked in this record, as one string (equal while nothing changes). */
export function tickedCauses(events: LocalEvent[]): string {
  return events
    .flatMap((e) => (e.kind === 'note' && e.data.text.startsWith(prefix) ? [e.data.text] : []))
    .map((text) => text.slice(prefix.length))
    .join('\n');
}

export const CausesChecklist = memo(function CausesChecklist(props: {
  /** From `tickedCauses`. */
  ticked: string;
  onNote: (text: string) => void;
}) {
  // Ticked at once on tap; the recorded note confirms it a moment later (and keeps it ticked).
  const [tapped, setTapped] = useState<ReadonlySet<string>>(new Set());
  const ticked = new Set([...props.ticked.split('\n'), ...tapped]);
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
              onChange={() => {
                setTapped((t) => new Set(t).add(c));
                props.onNote(prefix + c);
              }}
            />
          }
        />
      ))}
    </FormGroup>
  );
});
