import DarkMode from '@mui/icons-material/DarkMode';
import LightMode from '@mui/icons-material/LightMode';
import Logout from '@mui/icons-material/Logout';
import { Button, IconButton, Stack, Typography } from '@mui/material';
import { NavLink } from 'react-router-dom';
import type { HeaderProps } from './header-menu';

/** The main menu as links along the bar (wide screens). */
export function HeaderNav({ entries }: Pick<HeaderProps, 'entries'>) {
  return (
    <Stack component="nav" aria-label="Main" direction="row" spacing={0.5}>
      {entries.map((e) => (
        <Button
          key={e.to}
          component={NavLink}
          to={e.to}
          end={e.to === '/'}
          color="inherit"
          sx={{ '&.active': { bgcolor: 'rgba(255,255,255,0.16)' } }}
        >
          {e.label}
        </Button>
      ))}
    </Stack>
  );
}

/** Theme, who is signed in, and sign out, at the end of the bar (wide screens). */
export function HeaderActions({
  who,
  mode,
  onToggleMode,
  onSignOut,
}: Omit<HeaderProps, 'entries'>) {
  return (
    <>
      {/* Plain titles for the hover hint: MUI's tooltip would weigh on Live's first load. */}
      <IconButton
        color="inherit"
        onClick={onToggleMode}
        aria-label={mode === 'dark' ? 'Use light theme' : 'Use dark theme'}
        title={mode === 'dark' ? 'Light theme' : 'Dark theme'}
      >
        {mode === 'dark' ? <LightMode /> : <DarkMode />}
      </IconButton>
      <Typography variant="body2" aria-label="Signed in as">
        {who}
      </Typography>
      <IconButton color="inherit" onClick={onSignOut} aria-label="Sign out" title="Sign out">
        <Logout />
      </IconButton>
    </>
  );
}
