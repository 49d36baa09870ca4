import { DebriefPage } from '../../features/debrief/components/debrief-page';
import { ImportPanel } from '../../features/imports/components/import-panel';

/** Debrief, with the monitor-file import panel for leads and recorders (features meet here). */
export function DebriefRoute() {
  return <DebriefPage importPanel={ImportPanel} />;
}
