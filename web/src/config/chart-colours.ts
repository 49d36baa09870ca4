import type { PaletteMode } from '@mui/material';

/** Colours drawn on canvases (Chart.js and the capnogram), which the theme cannot reach. */
export interface ChartColours {
  text: string;
  grid: string;
  /** The low-EtCO2 band and its threshold line. */
  lowBand: string;
  lowLine: string;
  compressions: string;
  rosc: string;
  roscText: string;
  gap: string;
  markerLine: string;
  focusFill: string;
  focusLine: string;
  /** Lines and points of a data series, and of a target. */
  series: string;
  seriesSoft: string;
  /** Ember, our mark: the EtCO2 values recorded on Live. */
  mark: string;
  target: string;
  signal: string;
  limit: string;
}

export const chartColours: Record<PaletteMode, ChartColours> = {
  light: {
    text: '#4a5a5e',
    grid: 'rgba(23, 35, 38, 0.1)',
    lowBand: 'rgba(190, 50, 40, 0.22)',
    lowLine: '#b3261e',
    compressions: 'rgba(60, 150, 90, 0.14)',
    rosc: 'rgba(37, 86, 168, 0.13)',
    roscText: '#1c4281',
    gap: 'rgba(110, 120, 130, 0.2)',
    markerLine: 'rgba(60, 60, 60, 0.45)',
    focusFill: 'rgba(214, 160, 20, 0.14)',
    focusLine: '#b7860b',
    series: '#0b5c8a',
    seriesSoft: '#8f9ba6',
    mark: '#c2410c',
    target: '#1e6b3a',
    signal: '#b3261e',
    limit: '#6d4c41',
  },
  dark: {
    text: '#a6b3b1',
    grid: 'rgba(221, 229, 228, 0.1)',
    // Stronger than in light mode: a faint red on near-black disappears in a dim room.
    lowBand: 'rgba(226, 96, 84, 0.34)',
    lowLine: '#e8928a',
    compressions: 'rgba(120, 200, 140, 0.16)',
    rosc: 'rgba(130, 165, 230, 0.2)',
    roscText: '#a3bde8',
    gap: 'rgba(170, 180, 190, 0.18)',
    markerLine: 'rgba(221, 229, 228, 0.35)',
    focusFill: 'rgba(216, 181, 106, 0.16)',
    focusLine: '#d8b56a',
    series: '#86c6cc',
    seriesSoft: '#5d6b70',
    mark: '#e3a47f',
    target: '#8fcca3',
    signal: '#e8928a',
    limit: '#c4a597',
  },
};
