import MenuIcon from '@mui/icons-material/Menu';
import { IconButton } from '@mui/material';
import { lazy, Suspense, useId, useState } from 'react';
import type { NavEntry } from './nav';

const HeaderMenuPopup = lazy(() =>
  import('./header-menu-popup').then((m) => ({ default: m.HeaderMenuPopup })),
);

export interface HeaderProps {
  entries: NavEntry[];
  /** "Name · Role" of the signed-in user. */
  who: string;
  mode: 'light' | 'dark';
  onToggleMode: () => void;
  onSignOut: () => void;
}

/**
 * The top bar's menu on a narrow screen (a phone, a tablet held upright): one labelled
 * button opens the screens, the theme and sign out, so the bar never wraps onto a second
 * line. The menu's code loads on the first open.
 */
export function HeaderMenu(props: HeaderProps) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const [opened, setOpened] = useState(false);
  const id = useId();
  return (
    <>
      <IconButton
        color="inherit"
        aria-label="Menu"
        aria-haspopup="menu"
        aria-controls={anchor ? id : undefined}
        aria-expanded={anchor ? 'true' : 'false'}
        onClick={(e) => {
          setAnchor(e.currentTarget);
          setOpened(true);
        }}
        sx={{ width: 56, height: 56 }}
      >
        <MenuIcon />
      </IconButton>
      {opened && (
        <Suspense fallback={null}>
          <HeaderMenuPopup {...props} id={id} anchor={anchor} onClose={() => setAnchor(null)} />
        </Suspense>
      )}
    </>
  );
}
