import { ageGroupRulesNote } from '@upstroke/capno';
import { Alert, Chip, List, ListItemButton, ListItemText, Stack, Typography } from '@mui/material';
import {
  type AgeGroup,
  clockFromArrest,
  confounderLabels,
  type Finding,
  findingKindLabels,
  severityLabels,
} from '@upstroke/contracts';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';

const chipColor = { info: 'info', warning: 'warning', critical: 'error' } as const;

/** Findings in time order; choosing one brings the timeline to its place. */
export function FindingsList(props: {
  findings: Finding[];
  selected: number | null;
  onSelect: (index: number) => void;
  ageGroup?: AgeGroup | null;
}) {
  const note = ageGroupRulesNote(props.ageGroup);
  return (
    <Stack spacing={1}>
      {note && (
        <Alert severity="info" variant="outlined">
          {note}
        </Alert>
      )}
      {props.findings.length === 0 ? (
        <Typography color="text.secondary">
          No findings for this record with the site’s thresholds.
        </Typography>
      ) : (
        <FindingItems {...props} />
      )}
    </Stack>
  );
}

function FindingItems(props: {
  findings: Finding[];
  selected: number | null;
  onSelect: (index: number) => void;
}) {
  return (
    <List aria-label="Findings" disablePadding>
      {props.findings.map((f, i) => (
        <ListItemButton
          key={`${f.kind}-${f.startSec}-${i}`}
          selected={props.selected === i}
          aria-current={props.selected === i ? 'true' : undefined}
          onClick={() => props.onSelect(i)}
          sx={{ alignItems: 'flex-start', minHeight: 56, borderBottom: 1, borderColor: 'divider' }}
        >
          <ListItemText
            disableTypography
            primary={
              <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
                <Chip
                  size="small"
                  label={severityLabels[f.severity]}
                  color={chipColor[f.severity]}
                />
                <Typography variant="subtitle2">{findingKindLabels[f.kind] ?? f.kind}</Typography>
                <Typography variant="body2" color="text.secondary">
                  {clockFromArrest(f.startSec)} – {clockFromArrest(f.endSec)}
                </Typography>
                {f.confounder && (
                  <Chip size="small" variant="outlined" label={confounderLabels[f.confounder]} />
                )}
              </Stack>
            }
            secondary={
              <Stack spacing={0.5} sx={{ mt: 0.5 }}>
                <Typography variant="body2">{f.message}</Typography>
                <ClinicalCaution text={f.caution} dense />
              </Stack>
            }
          />
        </ListItemButton>
      ))}
    </List>
  );
}
