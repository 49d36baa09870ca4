import DarkMode from '@mui/icons-material/DarkMode';
import LightMode from '@mui/icons-material/LightMode';
import Logout from '@mui/icons-material/Logout';
import { Divider, ListItemIcon, ListItemText, ListSubheader, Menu, MenuItem } from '@mui/material';
import { NavLink } from 'react-router-dom';
import type { HeaderProps } from './header-menu';

/**
 * The narrow screen's menu itself: the screens, the theme and sign out. MUI's menu takes
 * arrow keys, Escape and touch; it loads on the first open (Live's first screen stays light).
 */
export function HeaderMenuPopup({
  id,
  anchor,
  onClose: close,
  entries,
  who,
  mode,
  onToggleMode,
  onSignOut,
}: HeaderProps & { id: string; anchor: HTMLElement | null; onClose: () => void }) {
  return (
    <Menu
      anchorEl={anchor}
      open={Boolean(anchor)}
      onClose={close}
      // The button names the menu list itself (the element with role="menu").
      slotProps={{ list: { id } }}
    >
      <ListSubheader aria-label="Signed in as" sx={{ lineHeight: 2.5 }}>
        {who}
      </ListSubheader>
      {entries.map((e) => (
        <MenuItem
          key={e.to}
          component={NavLink}
          to={e.to}
          end={e.to === '/'}
          onClick={close}
          sx={{ minHeight: 52, '&.active': { fontWeight: 700, bgcolor: 'action.selected' } }}
        >
          {e.label}
        </MenuItem>
      ))}
      <Divider />
      <MenuItem
        onClick={() => {
          onToggleMode();
          close();
        }}
        sx={{ minHeight: 52 }}
      >
        <ListItemIcon>{mode === 'dark' ? <LightMode /> : <DarkMode />}</ListItemIcon>
        <ListItemText>{mode === 'dark' ? 'Use light theme' : 'Use dark theme'}</ListItemText>
      </MenuItem>
      <MenuItem
        onClick={() => {
          close();
          onSignOut();
        }}
        sx={{ minHeight: 52 }}
      >
        <ListItemIcon>
          <Logout />
        </ListItemIcon>
        <ListItemText>Sign out</ListItemText>
      </MenuItem>
    </Menu>
  );
}
