import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { SetPasswordPage } from '../features/account/components/set-password-page';
import { AdminPage } from '../features/admin/components/admin-page';
import { SignInPage } from '../features/auth/components/sign-in-page';
import { BoardPage } from '../features/board/components/board-page';
import { DebriefPage } from '../features/debrief/components/debrief-page';
import { LivePage } from '../features/live/components/live-page';
import { ReviewQueuePage } from '../features/reviews/components/review-queue-page';
import { TrendsPage } from '../features/trends/components/trends-page';
import { Layout } from './layout';
import { RequireAuth } from './require-auth';
import { NotFoundPage } from './routes/not-found';

/** Screens inside the signed-in frame; each names the roles that may open it. */
export const appRoutes: RouteObject[] = [
  {
    index: true,
    element: (
      <RequireAuth roles={['recorder', 'lead', 'quality']}>
        <BoardPage />
      </RequireAuth>
    ),
  },
  {
    path: 'live/:id',
    element: (
      <RequireAuth roles={['recorder', 'lead']}>
        <LivePage />
      </RequireAuth>
    ),
  },
  {
    path: 'debrief/:id',
    element: (
      <RequireAuth roles={['recorder', 'lead', 'quality']}>
        <DebriefPage />
      </RequireAuth>
    ),
  },
  {
    path: 'trends',
    element: (
      <RequireAuth roles={['quality', 'admin', 'lead']}>
        <TrendsPage />
      </RequireAuth>
    ),
  },
  {
    path: 'review',
    element: (
      <RequireAuth roles={['quality']}>
        <ReviewQueuePage />
      </RequireAuth>
    ),
  },
  {
    path: 'admin/*',
    element: (
      <RequireAuth roles={['admin']}>
        <AdminPage />
      </RequireAuth>
    ),
  },
  { path: '*', element: <NotFoundPage /> },
];

export function createRouter() {
  return createBrowserRouter([
    { path: '/sign-in', element: <SignInPage /> },
    { path: '/set-password', element: <SetPasswordPage /> },
    { path: '/', element: <Layout />, children: appRoutes },
  ]);
}
