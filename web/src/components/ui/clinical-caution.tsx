import InfoOutlined from '@mui/icons-material/InfoOutlined';
import { Stack, Typography } from '@mui/material';

export const cautionText =
  'Documentation and review aid only. Follow your local resuscitation protocol and clinical judgement; thresholds are this site’s settings.';

/** The short caution shown beside every finding and prompt. */
export function ClinicalCaution({
  text = cautionText,
  dense = false,
}: {
  text?: string;
  dense?: boolean;
}) {
  return (
    <Stack
      sx={{ alignItems: 'flex-start' }}
      direction="row"
      spacing={1}
      role="note"
      aria-label="Clinical caution"
    >
      <InfoOutlined fontSize="small" color="info" sx={{ mt: '2px' }} />
      <Typography variant={dense ? 'caption' : 'body2'} color="text.secondary">
        {text}
      </Typography>
    </Stack>
  );
}
