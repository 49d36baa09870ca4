import { Alert, Button, Stack, TextField, Typography } from '@mui/material';
import { type AgeGroup, PLAUSIBLE } from '@upstroke/contracts';
import { useState } from 'react';
import { estimateWeight, type WeightEstimate } from '../lib/paediatric';

/**
 * Asked instead of any dose when a child or infant record has no weight: a weight, or an age
 * from which a published formula estimates one (named beside the estimate).
 */
export function WeightPrompt(props: {
  ageGroup: AgeGroup;
  onWeight: (kg: number, estimate?: WeightEstimate & { age: string }) => void;
}) {
  const infant = props.ageGroup === 'infant';
  const [weight, setWeight] = useState('');
  const [age, setAge] = useState('');
  const kg = weight === '' ? null : Number(weight);
  const { min, max } = PLAUSIBLE.weightKg;
  const weightBad = kg !== null && !(kg >= min && kg <= max);
  const ageValue = age === '' ? null : Number(age);
  const estimate =
    ageValue === null ? null : estimateWeight(infant ? { months: ageValue } : { years: ageValue });
  const ageText = `${age} ${infant ? 'months' : 'years'}`;
  return (
    <Stack spacing={2} sx={{ mt: 1 }}>
      <Alert severity="warning">
        {infant ? 'Infant' : 'Child'} record with no weight: doses and energies are weight-based.
        Enter a weight, or an age to estimate one. No adult dose is offered by default.
      </Alert>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
        <TextField
          label="Weight (kg)"
          inputMode="decimal"
          value={weight}
          onChange={(e) => setWeight(e.target.value)}
          error={weightBad}
          helperText={weightBad ? `Weight must be between ${min} and ${max} kg` : ' '}
        />
        <Button
          variant="contained"
          disabled={kg === null || weightBad}
          onClick={() => kg !== null && props.onWeight(kg)}
          sx={{ minHeight: 56 }}
        >
          Use this weight
        </Button>
      </Stack>
      <Typography variant="subtitle2">Or estimate from age</Typography>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
        <TextField
          label={infant ? 'Age (months)' : 'Age (years)'}
          inputMode="numeric"
          value={age}
          onChange={(e) => setAge(e.target.value)}
          error={ageValue !== null && !estimate}
          helperText={
            ageValue !== null && !estimate
              ? infant
                ? 'Months from 0 to 11'
                : 'Years from 1 to 12: otherwise weigh or measure'
              : ' '
          }
        />
        <Button
          variant="outlined"
          disabled={!estimate}
          onClick={() => estimate && props.onWeight(estimate.kg, { ...estimate, age: ageText })}
          sx={{ minHeight: 56 }}
        >
          {estimate ? `Use ${estimate.kg} kg` : 'Use the estimate'}
        </Button>
      </Stack>
      {estimate && (
        <Typography variant="body2" aria-label="Weight estimate">
          Estimated {estimate.kg} kg — {estimate.formula}. A measured weight is better.
        </Typography>
      )}
    </Stack>
  );
}
