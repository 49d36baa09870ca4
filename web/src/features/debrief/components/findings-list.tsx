import { ageGroupRulesNote } from '@upstroke/capno';
import {
  Alert,
  Chip,
  List,
  ListItem,
  ListItemButton,
  ListItemText,
  ListSubheader,
  Stack,
  Typography,
} from '@mui/material';
import {
  type AgeGroup,
  clockFromArrest,
  confounderLabels,
  type Finding,
  findingKindLabels,
  severityLabels,
} from '@upstroke/contracts';
import { Fragment } from 'react';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';

const chipColor = { info: 'info', warning: 'warning', critical: 'error' } as const;

interface Props {
  findings: Finding[];
  selected: number | null;
  onSelect: (index: number) => void;
}

/** Findings by kind, in order of first appearance, each keeping its index in the debrief. */
export function groupFindings(findings: Finding[]): { kind: string; items: [Finding, number][] }[] {
  const groups = new Map<string, [Finding, number][]>();
  findings.forEach((f, i) => groups.set(f.kind, [...(groups.get(f.kind) ?? []), [f, i]]));
  return [...groups].map(([kind, items]) => ({ kind, items }));
}

/**
 * Findings grouped by kind with their counts; the caution once, above them all. Choosing a
 * finding brings the timeline into view around its interval.
 */
export function FindingsList(props: Props & { ageGroup?: AgeGroup | null }) {
  const note = ageGroupRulesNote(props.ageGroup);
  const cautions = [...new Set(props.findings.map((f) => f.caution).filter(Boolean))];
  return (
    <Stack spacing={1}>
      {note && (
        <Alert severity="info" variant="outlined">
          {note}
        </Alert>
      )}
      {cautions.map((c) => (
        <ClinicalCaution key={c} text={c} />
      ))}
      {props.findings.length === 0 ? (
        <Typography color="text.secondary">
          No findings for this record with the site’s thresholds.
        </Typography>
      ) : (
        <FindingGroups {...props} />
      )}
    </Stack>
  );
}

function FindingGroups({ findings, selected, onSelect }: Props) {
  return (
    <List aria-label="Findings" disablePadding>
      {groupFindings(findings).map((g) => (
        <Fragment key={g.kind}>
          <ListSubheader disableSticky sx={{ px: 0, lineHeight: 2.5, fontSize: '1rem' }}>
            {findingKindLabels[g.kind as Finding['kind']] ?? g.kind} ({g.items.length})
          </ListSubheader>
          {g.items.map(([f, i]) => (
            // A list holds items: each finding's button sits in its own item.
            <ListItem key={`${f.kind}-${f.startSec}-${i}`} disablePadding>
              <ListItemButton
                selected={selected === i}
                aria-current={selected === i ? 'true' : undefined}
                onClick={() => onSelect(i)}
                sx={{
                  alignItems: 'flex-start',
                  minHeight: 48,
                  borderBottom: 1,
                  borderColor: 'divider',
                }}
              >
                <ListItemText
                  disableTypography
                  primary={
                    <Stack
                      direction="row"
                      spacing={1}
                      sx={{ alignItems: 'center', flexWrap: 'wrap' }}
                    >
                      <Chip
                        size="small"
                        label={severityLabels[f.severity]}
                        color={chipColor[f.severity]}
                      />
                      <Typography variant="subtitle2">
                        {findingKindLabels[f.kind] ?? f.kind}, {clockFromArrest(f.startSec)} –{' '}
                        {clockFromArrest(f.endSec)}
                      </Typography>
                      {f.confounder && (
                        <Chip
                          size="small"
                          variant="outlined"
                          label={confounderLabels[f.confounder]}
                        />
                      )}
                    </Stack>
                  }
                  secondary={
                    <Typography variant="body2" sx={{ mt: 0.5 }}>
                      {f.message}
                    </Typography>
                  }
                />
              </ListItemButton>
            </ListItem>
          ))}
        </Fragment>
      ))}
    </List>
  );
}
