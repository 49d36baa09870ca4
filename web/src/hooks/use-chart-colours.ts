import { useTheme } from '@mui/material/styles';
import { type ChartColours, chartColours } from '../config/chart-colours';

/** The canvas colours of the theme in force (Chart.js cannot read the MUI theme). */
export function useChartColours(): ChartColours {
  return chartColours[useTheme().palette.mode];
}
