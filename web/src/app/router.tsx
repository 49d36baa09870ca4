import type { Role } from '@upstroke/contracts';
import type { ComponentType } from 'react';
import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { RequireAuth } from './require-auth';
import { NotFoundPage } from './routes/not-found';
import { screens } from './screens';

/** A screen loaded on first visit (React Router `lazy`), shown only to the roles named. */
function guarded(roles: Role[], load: () => Promise<ComponentType>): Pick<RouteObject, 'lazy'> {
  return {
    lazy: async () => {
      const Page = await load();
      return {
        element: (
          <RequireAuth roles={roles}>
            <Page />
          </RequireAuth>
        ),
      };
    },
  };
}

/** Screens inside the signed-in frame; each names the roles that may open it. */
export const appRoutes: RouteObject[] = [
  { index: true, ...guarded(['recorder', 'lead', 'quality'], screens.board) },
  { path: 'live/:id', ...guarded(['recorder', 'lead'], screens.live) },
  { path: 'debrief/:id', ...guarded(['recorder', 'lead', 'quality'], screens.debrief) },
  { path: 'trends', ...guarded(['quality', 'admin', 'lead'], screens.trends) },
  { path: 'review', ...guarded(['quality'], screens.review) },
  { path: 'admin/*', ...guarded(['admin'], screens.admin) },
  { path: '*', element: <NotFoundPage /> },
];

/**
 * Every route loads its code on first use. The signed-in frame also waits for `frameReady`
 * (the tablet's store and sync, started beside the first screen).
 */
export function createRouter(frameReady: Promise<unknown> = Promise.resolve()) {
  return createBrowserRouter([
    { path: '/sign-in', lazy: async () => ({ Component: await screens.signIn() }) },
    { path: '/set-password', lazy: async () => ({ Component: await screens.setPassword() }) },
    {
      path: '/',
      lazy: async () => {
        const [{ Layout }] = await Promise.all([import('./layout'), frameReady]);
        return { Component: Layout };
      },
      children: appRoutes,
    },
  ]);
}
