import { LivePage } from '../../features/live/components/live-page';
import { MonitorPanel } from '../../features/monitor/components/monitor-panel';

/** Live, with the monitor link's panel beside its EtCO2 trend (features meet only here). */
export function LiveRoute() {
  return <LivePage monitor={MonitorPanel} />;
}
