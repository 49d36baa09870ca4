import {
  Checkbox,
  FormControl,
  FormControlLabel,
  FormGroup,
  FormHelperText,
  FormLabel,
} from '@mui/material';
import type { Site } from '@upstroke/contracts';

/** Pick the sites a user may work on. */
export function SiteCheckboxes(props: {
  sites: Site[];
  value: string[];
  onChange: (ids: string[]) => void;
  error?: string;
}) {
  const { sites, value, onChange, error } = props;
  const toggle = (id: string, on: boolean) =>
    onChange(on ? [...value, id] : value.filter((v) => v !== id));
  return (
    <FormControl component="fieldset" error={Boolean(error)}>
      <FormLabel component="legend">Sites</FormLabel>
      <FormGroup>
        {sites.map((s) => (
          <FormControlLabel
            key={s.id}
            label={s.name}
            control={
              <Checkbox
                checked={value.includes(s.id)}
                onChange={(e) => toggle(s.id, e.target.checked)}
              />
            }
          />
        ))}
      </FormGroup>
      {error && <FormHelperText>{error}</FormHelperText>}
    </FormControl>
  );
}
