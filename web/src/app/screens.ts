import type { ComponentType } from 'react';

/**
 * Every screen's code, loaded on first use (each in its own chunk, so Sign in and Live fetch
 * only what they need). Calling a loader again reuses the module already fetched.
 */
export const screens = {
  signIn: () => import('../features/auth/components/sign-in-page').then((m) => m.SignInPage),
  setPassword: () =>
    import('../features/account/components/set-password-page').then((m) => m.SetPasswordPage),
  board: () => import('../features/board/components/board-page').then((m) => m.BoardPage),
  live: () => import('./routes/live').then((m) => m.LiveRoute),
  debrief: () => import('./routes/debrief').then((m) => m.DebriefRoute),
  trends: () => import('../features/trends/components/trends-page').then((m) => m.TrendsPage),
  review: () =>
    import('../features/reviews/components/review-queue-page').then((m) => m.ReviewQueuePage),
  admin: () => import('../features/admin/components/admin-page').then((m) => m.AdminPage),
} satisfies Record<string, () => Promise<ComponentType>>;

/** Chunks loaded inside screens on first use: the signed-in frame and the charts' parts. */
const parts = [
  () => import('./layout'),
  () => import('../features/live/components/etco2-trend-chart'),
  () => import('chartjs-plugin-zoom'),
];

/**
 * Fetches every screen while the page is idle, one per idle period, so all of them open later
 * without the network (the service worker also precaches every chunk; this covers the visit
 * that installed it). Never forced: a busy screen (Live streaming a capnogram) is not slowed.
 */
export function prefetchScreensWhenIdle(): void {
  const idle = (globalThis as { requestIdleCallback?: (cb: () => void) => number })
    .requestIdleCallback;
  const later = idle ?? ((cb: () => void) => setTimeout(cb, 2_000));
  const queue: (() => Promise<unknown>)[] = [...Object.values(screens), ...parts];
  const next = () => {
    const load = queue.shift();
    if (load)
      void load().then(
        () => later(next),
        () => later(next),
      );
  };
  later(next);
}
