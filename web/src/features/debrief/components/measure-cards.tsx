import HelpOutlined from '@mui/icons-material/HelpOutlineOutlined';
import { Card, CardContent, Grid, IconButton, Stack, Tooltip, Typography } from '@mui/material';
import { type Etco2DisplayUnit, type Measures, measureDefinitions } from '@upstroke/contracts';
import { measureRows } from '../../../lib/measure-rows';

/** The measures the team can act on, each with its definition one tap away. */
export function MeasureCards({ measures, unit }: { measures: Measures; unit: Etco2DisplayUnit }) {
  return (
    <Grid container spacing={1.5} component="section" aria-label="Measures">
      {measureRows(measures, unit).map((c) => (
        <Grid key={c.key} size={{ xs: 6, sm: 4, md: 3 }}>
          <Card variant="outlined" sx={{ height: '100%' }}>
            <CardContent sx={{ py: 1.5 }}>
              <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
                <Typography variant="body2" color="text.secondary">
                  {c.title}
                </Typography>
                <Tooltip title={measureDefinitions[c.key]} enterTouchDelay={0}>
                  <IconButton
                    aria-label={`What is ${c.title}?`}
                    size="small"
                    sx={{ minWidth: 40, minHeight: 40 }}
                  >
                    <HelpOutlined fontSize="small" />
                  </IconButton>
                </Tooltip>
              </Stack>
              <Typography variant="h5" component="p" aria-label={`${c.title}: ${c.value}`}>
                {c.value}
              </Typography>
            </CardContent>
          </Card>
        </Grid>
      ))}
    </Grid>
  );
}
