import type { ButtonProps, ChipProps } from '@mui/material';
import { createTheme, type PaletteMode } from '@mui/material/styles';
import { surfaces, type Tone, tones } from './palette';

const toneNames: readonly Tone[] = ['primary', 'secondary', 'error', 'warning', 'success', 'info'];

/** A filled button's or chip's fill and text from our own table (muted fills in the dark). */
function filled(mode: PaletteMode, color: ButtonProps['color'] | ChipProps['color']) {
  const tone = toneNames.find((t) => t === color);
  if (!tone) return {};
  const c = tones[mode][tone];
  return {
    backgroundColor: c.fill,
    color: c.fillText,
    '&:hover': { backgroundColor: c.fillHover },
    // In a dim room a thin edge of the same hue tells the buttons apart without glare.
    ...(mode === 'dark' ? { boxShadow: `inset 0 0 0 1px ${c.main}55` } : {}),
  };
}

/**
 * Upstroke's own look (colours in palette.ts): high contrast for arm's-length reading and a
 * dark mode for dim rooms — near-black surfaces, soft light text, deep muted fills.
 */
export function makeTheme(mode: PaletteMode) {
  const s = surfaces[mode];
  const palette = Object.fromEntries(
    toneNames.map((t) => [
      t,
      { main: tones[mode][t].main, contrastText: tones[mode][t].contrastText },
    ]),
  );
  return createTheme({
    palette: {
      mode,
      ...palette,
      background: { default: s.page, paper: s.paper },
      text: { primary: s.text, secondary: s.textSecondary },
      divider: s.divider,
    },
    shape: { borderRadius: 10 },
    typography: {
      fontFamily: 'Roboto, "Helvetica Neue", Arial, sans-serif',
      h1: { fontSize: '2rem', fontWeight: 600, letterSpacing: '-0.01em' },
      h2: { fontSize: '1.5rem', fontWeight: 600 },
      h3: { fontSize: '1.2rem', fontWeight: 600 },
      button: { textTransform: 'none', fontWeight: 600 },
    },
    components: {
      MuiButton: {
        styleOverrides: {
          root: { minHeight: 48 },
          contained: ({ ownerState }) => filled(mode, ownerState.color),
        },
      },
      MuiChip: {
        styleOverrides: {
          filled: ({ ownerState }) => ({
            ...filled(mode, ownerState.color),
            '& .MuiChip-icon': { color: 'inherit' },
          }),
        },
      },
      MuiIconButton: { styleOverrides: { root: { minWidth: 48, minHeight: 48 } } },
      MuiTab: { styleOverrides: { root: { minHeight: 48 } } },
      MuiListItemButton: { styleOverrides: { root: { minHeight: 48 } } },
      // The top bar: deep teal by day, the paper's near-black in the dark.
      MuiAppBar: {
        styleOverrides: {
          colorPrimary: mode === 'dark' ? { backgroundColor: '#13292d', color: s.text } : {},
        },
      },
    },
  });
}
