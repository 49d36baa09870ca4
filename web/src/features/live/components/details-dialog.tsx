import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  Stack,
  TextField,
} from '@mui/material';
import { type PatchResuscitation, PLAUSIBLE, weightKgSchema } from '@upstroke/contracts';
import { useState } from 'react';
import { type LocalResuscitation, updateResuscitation } from '../../../lib/offline';

/** Details that can wait until after the code: location, patient reference, age group, weight. */
export function DetailsDialog(props: {
  open: boolean;
  record: LocalResuscitation;
  onClose: () => void;
}) {
  const r = props.record;
  const [location, setLocation] = useState(r.location ?? '');
  const [patientRef, setPatientRef] = useState(r.patientRef ?? '');
  const [ageGroup, setAgeGroup] = useState<string>(r.ageGroup ?? '');
  const [weight, setWeight] = useState(r.weightKg ? String(r.weightKg) : '');
  const weightKg = weight === '' ? null : Number(weight);
  const weightBad = weightKg !== null && !weightKgSchema.safeParse(weightKg).success;
  const save = async () => {
    const patch: PatchResuscitation = {
      location: location.trim() || null,
      patientRef: patientRef.trim() || null,
      ageGroup: ageGroup === '' ? null : (ageGroup as PatchResuscitation['ageGroup']),
      weightKg,
    };
    await updateResuscitation(r.id, patch);
    props.onClose();
  };
  return (
    <Dialog
      open={props.open}
      onClose={props.onClose}
      fullWidth
      maxWidth="sm"
      aria-labelledby="details-title"
    >
      <DialogTitle id="details-title">Details</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ mt: 1 }}>
          <TextField
            label="Location"
            value={location}
            onChange={(e) => setLocation(e.target.value.slice(0, 200))}
          />
          <TextField
            label="Patient reference"
            value={patientRef}
            onChange={(e) => setPatientRef(e.target.value.slice(0, 100))}
          />
          <TextField
            select
            label="Age group"
            value={ageGroup}
            onChange={(e) => setAgeGroup(e.target.value)}
          >
            <MenuItem value="">Not recorded</MenuItem>
            <MenuItem value="adult">Adult</MenuItem>
            <MenuItem value="child">Child</MenuItem>
            <MenuItem value="infant">Infant</MenuItem>
          </TextField>
          <TextField
            label="Weight (kg)"
            inputMode="decimal"
            value={weight}
            onChange={(e) => setWeight(e.target.value)}
            error={weightBad}
            helperText={
              weightBad
                ? `Weight must be between ${PLAUSIBLE.weightKg.min} and ${PLAUSIBLE.weightKg.max} kg`
                : 'Children: drug and energy presets use it'
            }
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={props.onClose}>Cancel</Button>
        <Button variant="contained" disabled={weightBad} onClick={() => void save()}>
          Save details
        </Button>
      </DialogActions>
    </Dialog>
  );
}
