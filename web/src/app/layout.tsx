import { AppBar, Box, Toolbar, Typography } from '@mui/material';
import { roleLabels } from '@upstroke/contracts';
import { Outlet } from 'react-router-dom';
import { useAuth } from '../hooks/use-auth';
import { useColorMode } from '../hooks/use-color-mode';
import { HeaderActions, HeaderNav } from './header-bar';
import { HeaderMenu, type HeaderProps } from './header-menu';
import { navEntries } from './nav';
import { statusSlot } from './status-slot';

// Which of the two headers shows is CSS's choice (no script waits on the screen's width).
const wide = { display: { xs: 'none', md: 'flex' }, alignItems: 'center', gap: 1 } as const;
const narrow = { display: { xs: 'block', md: 'none' } } as const;

/**
 * The frame around every signed-in screen: menu for the role, sync state, theme, user, sign
 * out. Below the medium width (a phone, an upright tablet) the menu, theme and sign out fold
 * into one Menu button so the bar stays one line and the sync state stays in sight.
 */
export function Layout() {
  const { user, signOut } = useAuth();
  const { mode, toggle } = useColorMode();
  const Status = statusSlot.get();
  const header: HeaderProps = {
    entries: navEntries.filter((e) => user && e.roles.includes(user.role)),
    who: user ? `${user.name} · ${roleLabels[user.role]}` : '',
    mode,
    onToggleMode: toggle,
    onSignOut: signOut,
  };
  return (
    <Box sx={{ minHeight: '100vh', display: 'flex', flexDirection: 'column' }}>
      <AppBar position="sticky" color="primary" elevation={1}>
        <Toolbar sx={{ gap: 1, px: { xs: 1, sm: 2 } }}>
          <Typography variant="h3" component="span" sx={{ mr: { xs: 0, md: 2 } }}>
            Upstroke
          </Typography>
          <Box sx={wide}>
            <HeaderNav entries={header.entries} />
          </Box>
          <Box sx={{ flexGrow: 1 }} />
          {Status && <Status />}
          <Box sx={wide}>
            <HeaderActions {...header} />
          </Box>
          <Box sx={narrow}>
            <HeaderMenu {...header} />
          </Box>
        </Toolbar>
      </AppBar>
      <Box component="main" sx={{ flexGrow: 1, p: { xs: 1.5, md: 3 } }}>
        <Outlet />
      </Box>
    </Box>
  );
}
