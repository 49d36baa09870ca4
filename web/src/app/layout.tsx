import DarkMode from '@mui/icons-material/DarkMode';
import LightMode from '@mui/icons-material/LightMode';
import Logout from '@mui/icons-material/Logout';
import {
  AppBar,
  Box,
  Button,
  IconButton,
  Stack,
  Toolbar,
  Tooltip,
  Typography,
} from '@mui/material';
import { roleLabels } from '@upstroke/contracts';
import { NavLink, Outlet } from 'react-router-dom';
import { useAuth } from '../hooks/use-auth';
import { useColorMode } from '../hooks/use-color-mode';
import { navEntries } from './nav';
import { statusSlot } from './status-slot';

/** The frame around every signed-in screen: menu for the role, sync state, user, sign out. */
export function Layout() {
  const { user, signOut } = useAuth();
  const { mode, toggle } = useColorMode();
  const entries = navEntries.filter((e) => user && e.roles.includes(user.role));
  const Status = statusSlot.get();
  return (
    <Box sx={{ minHeight: '100vh', display: 'flex', flexDirection: 'column' }}>
      <AppBar position="sticky" color="primary" elevation={1}>
        <Toolbar sx={{ gap: 1, flexWrap: 'wrap' }}>
          <Typography variant="h3" component="span" sx={{ mr: 2 }}>
            Upstroke
          </Typography>
          <Stack
            component="nav"
            aria-label="Main"
            direction="row"
            spacing={0.5}
            sx={{ flexGrow: 1 }}
          >
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
          {Status && <Status />}
          <Tooltip title={mode === 'dark' ? 'Light theme' : 'Dark theme'}>
            <IconButton
              color="inherit"
              onClick={toggle}
              aria-label={mode === 'dark' ? 'Use light theme' : 'Use dark theme'}
            >
              {mode === 'dark' ? <LightMode /> : <DarkMode />}
            </IconButton>
          </Tooltip>
          <Typography
            variant="body2"
            sx={{ display: { xs: 'none', md: 'block' } }}
            aria-label="Signed in as"
          >
            {user?.name} · {user ? roleLabels[user.role] : ''}
          </Typography>
          <Tooltip title="Sign out">
            <IconButton color="inherit" onClick={signOut} aria-label="Sign out">
              <Logout />
            </IconButton>
          </Tooltip>
        </Toolbar>
      </AppBar>
      <Box component="main" sx={{ flexGrow: 1, p: { xs: 1.5, md: 3 } }}>
        <Outlet />
      </Box>
    </Box>
  );
}
