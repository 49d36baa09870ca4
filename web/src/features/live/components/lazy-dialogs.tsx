import { lazy } from 'react';

/*
 * Live's dialogs are closed when the screen first draws: their code (forms, pickers, the team
 * roster) is fetched right after, so the buttons work before it arrives. Render them inside a
 * Suspense boundary of their own (a dialog opened in that instant shows a moment later).
 */
export const LiveDialogs = lazy(() =>
  import('./live-dialogs').then((m) => ({ default: m.LiveDialogs })),
);
const details = () => import('./details-dialog');
const arrestTime = () => import('./arrest-time-dialog');
export const DetailsDialog = lazy(() => details().then((m) => ({ default: m.DetailsDialog })));
export const ArrestTimeDialog = lazy(() =>
  arrestTime().then((m) => ({ default: m.ArrestTimeDialog })),
);
/** The dialogs drawn only once opened: fetched once the screen is up, so they open at once. */
export const preloadDialogs = () => Promise.all([details(), arrestTime()]);
export const RosterDialog = lazy(() =>
  import('../../../components/roster-dialog').then((m) => ({ default: m.RosterDialog })),
);

/** The metronome (its rate slider) joins the screen a moment after it first draws. */
export const Metronome = lazy(() => import('./metronome').then((m) => ({ default: m.Metronome })));

/** The prompts (the analysis engine behind them) follow the first draw by a moment. */
export const LivePrompts = lazy(() =>
  import('./live-prompts').then((m) => ({ default: m.LivePrompts })),
);
