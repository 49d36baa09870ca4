import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProvider } from './app/provider';
import { createRouter } from './app/router';
import { statusSlot } from './app/status-slot';
import { StatusArea } from './features/board/components/status-area';
import { UpdatePrompt } from './features/board/components/update-prompt';
import { startSync } from './lib/offline';

// The top bar shows the sync state everywhere, and the outbox drains in the background.
statusSlot.set(StatusArea);
startSync();

const router = createRouter();

createRoot(document.getElementById('root') as HTMLElement).render(
  <StrictMode>
    <AppProvider>
      <RouterProvider router={router} />
      {/* On every page, Sign in included: the first visit already stores the app for offline use. */}
      <UpdatePrompt />
    </AppProvider>
  </StrictMode>,
);
