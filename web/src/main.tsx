import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProvider } from './app/provider';
import { createRouter } from './app/router';
import { prefetchScreensWhenIdle } from './app/screens';
import { UpdatePrompt } from './features/board/components/update-prompt';

const background = import('./background').then((m) => m.startBackground());
const router = createRouter(background);

createRoot(document.getElementById('root') as HTMLElement).render(
  <StrictMode>
    <AppProvider>
      <RouterProvider router={router} />
      {/* On every page, Sign in included: the first visit already stores the app for offline use. */}
      <UpdatePrompt />
    </AppProvider>
  </StrictMode>,
);
// Every other screen's code follows once this one is idle, so each opens later offline.
window.addEventListener('load', prefetchScreensWhenIdle, { once: true });
