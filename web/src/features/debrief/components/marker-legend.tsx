import { Box, Typography } from '@mui/material';
import { screenLegend } from './timeline-model';

/** What each marker code on the timeline means (the PDF prints the same codes). */
export function MarkerLegend() {
  return (
    <Box component="section" aria-label="Marker legend" sx={{ mt: 1 }}>
      <Typography variant="caption" component="h3" sx={{ fontWeight: 600 }}>
        Markers
      </Typography>
      <Box
        component="dl"
        sx={{
          m: 0,
          display: 'grid',
          gridTemplateColumns: 'repeat(auto-fill, minmax(170px, 1fr))',
          columnGap: 2,
          rowGap: 0.25,
        }}
      >
        {screenLegend.map((l) => (
          <Box key={l.code} sx={{ display: 'flex', gap: 1, alignItems: 'baseline' }}>
            <Typography
              component="dt"
              variant="caption"
              sx={{ fontWeight: 700, minWidth: 36, fontFamily: 'monospace' }}
            >
              {l.code}
            </Typography>
            <Typography component="dd" variant="caption" sx={{ m: 0 }}>
              {l.meaning}
            </Typography>
          </Box>
        ))}
      </Box>
    </Box>
  );
}
