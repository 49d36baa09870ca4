import type { PaletteMode } from '@mui/material';

/** The palette colours a button can take. */
export type Tone = 'primary' | 'secondary' | 'error' | 'warning' | 'success' | 'info';

interface ToneColours {
  /** For text, outlines and icons on the page's background. */
  main: string;
  /** Text on `main` (MUI's filled parts we do not restyle: badges, sliders, switches). */
  contrastText: string;
  /** Text on `fill`. */
  fillText: string;
  /** The fill of a contained control: deep in dark mode so it never glares in a dim room. */
  fill: string;
  fillHover: string;
}

/**
 * Upstroke's own colours: deep teal for structure, ember for the rising edge of the
 * capnogram (our mark), brick for shocks, moss for ROSC, ochre for Re-arrest. Light mode
 * fills with the main tone; dark mode fills with a deep, muted tone of the same hue and keeps
 * the lighter tone for text, outlines and focus, so every label stays above 4.5:1.
 */
export const tones: Record<PaletteMode, Record<Tone, ToneColours>> = {
  light: {
    primary: {
      main: '#0b4f5c',
      contrastText: '#ffffff',
      fill: '#0b4f5c',
      fillText: '#ffffff',
      fillHover: '#083c46',
    },
    secondary: {
      main: '#c2410c',
      contrastText: '#ffffff',
      fill: '#c2410c',
      fillText: '#ffffff',
      fillHover: '#9a340a',
    },
    error: {
      main: '#b3261e',
      contrastText: '#ffffff',
      fill: '#b3261e',
      fillText: '#ffffff',
      fillHover: '#8c1d17',
    },
    warning: {
      main: '#8a5a00',
      contrastText: '#ffffff',
      fill: '#8a5a00',
      fillText: '#ffffff',
      fillHover: '#6b4600',
    },
    success: {
      main: '#1e6b3a',
      contrastText: '#ffffff',
      fill: '#1e6b3a',
      fillText: '#ffffff',
      fillHover: '#16522c',
    },
    info: {
      main: '#2556a8',
      contrastText: '#ffffff',
      fill: '#2556a8',
      fillText: '#ffffff',
      fillHover: '#1c4281',
    },
  },
  dark: {
    primary: {
      main: '#86c6cc',
      contrastText: '#0f1517',
      fill: '#1d4a51',
      fillText: '#e4f1f2',
      fillHover: '#245a62',
    },
    secondary: {
      main: '#e3a47f',
      contrastText: '#0f1517',
      fill: '#5f3520',
      fillText: '#f7e6da',
      fillHover: '#723f27',
    },
    error: {
      main: '#e8928a',
      contrastText: '#0f1517',
      fill: '#672a25',
      fillText: '#f8e1de',
      fillHover: '#7a332d',
    },
    warning: {
      main: '#d8b56a',
      contrastText: '#0f1517',
      fill: '#54421a',
      fillText: '#f5ead0',
      fillHover: '#655021',
    },
    success: {
      main: '#8fcca3',
      contrastText: '#0f1517',
      fill: '#1f4a31',
      fillText: '#dcf0e2',
      fillHover: '#275a3c',
    },
    info: {
      main: '#a3bde8',
      contrastText: '#0f1517',
      fill: '#263f66',
      fillText: '#e0e8f8',
      fillHover: '#2e4b79',
    },
  },
};

/** Page, surfaces and text: a blue-grey near-black with soft light text in dark mode. */
export const surfaces: Record<
  PaletteMode,
  { page: string; paper: string; text: string; textSecondary: string; divider: string }
> = {
  light: {
    page: '#f5f6f2',
    paper: '#ffffff',
    text: '#172326',
    textSecondary: '#4a5a5e',
    divider: 'rgba(23, 35, 38, 0.14)',
  },
  dark: {
    page: '#0f1517',
    paper: '#161e21',
    text: '#dde5e4',
    textSecondary: '#a6b3b1',
    divider: 'rgba(221, 229, 228, 0.16)',
  },
};
