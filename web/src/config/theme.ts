import { createTheme, type PaletteMode } from '@mui/material/styles';

/**
 * Upstroke's own look: deep teal for structure, ember orange for the rising edge of the
 * capnogram (our mark), high contrast for arm's-length reading, a dark mode for dim rooms.
 */
export function makeTheme(mode: PaletteMode) {
  const dark = mode === 'dark';
  return createTheme({
    palette: {
      mode,
      primary: { main: dark ? '#5cc8d6' : '#0b4f5c', contrastText: dark ? '#06252b' : '#ffffff' },
      secondary: { main: dark ? '#ffa26b' : '#c2410c' },
      error: { main: dark ? '#ff7b7b' : '#b3261e' },
      warning: { main: dark ? '#ffc857' : '#8a5a00' },
      success: { main: dark ? '#6fdc9a' : '#1e6b3a' },
      info: { main: dark ? '#8ab4ff' : '#2556a8' },
      background: { default: dark ? '#0e1417' : '#f5f6f2', paper: dark ? '#162025' : '#ffffff' },
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
      MuiButton: { styleOverrides: { root: { minHeight: 48 } } },
      MuiIconButton: { styleOverrides: { root: { minWidth: 48, minHeight: 48 } } },
      MuiTab: { styleOverrides: { root: { minHeight: 48 } } },
      MuiListItemButton: { styleOverrides: { root: { minHeight: 48 } } },
    },
  });
}
