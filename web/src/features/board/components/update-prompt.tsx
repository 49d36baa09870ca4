/// <reference types="vite-plugin-pwa/react" />
import { Button, Snackbar } from '@mui/material';
import { useRegisterSW } from 'virtual:pwa-register/react';
import { useIsLiveOpen } from '../../../hooks/use-live-open';

/**
 * Registers the service worker (the app then opens with no network) and offers a new version
 * when one is deployed — never while a Live screen is open: a running code is not interrupted.
 */
export function UpdatePrompt() {
  const liveOpen = useIsLiveOpen();
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW();
  return (
    <Snackbar
      open={needRefresh && !liveOpen}
      message="A new version of Upstroke is ready."
      action={
        <>
          <Button color="secondary" onClick={() => void updateServiceWorker(true)}>
            Update
          </Button>
          <Button color="inherit" onClick={() => setNeedRefresh(false)}>
            Later
          </Button>
        </>
      }
    />
  );
}
