import { lazy, Suspense } from 'react';
import { LivePage } from '../../features/live/components/live-page';
import type { MonitorPanelProps } from '../../features/monitor/components/monitor-panel';

// The monitor link's panel (capnogram, link settings) follows the screen's first draw.
const LazyMonitorPanel = lazy(() =>
  import('../../features/monitor/components/monitor-panel').then((m) => ({
    default: m.MonitorPanel,
  })),
);

function MonitorPanel(props: MonitorPanelProps) {
  return (
    <Suspense fallback={null}>
      <LazyMonitorPanel {...props} />
    </Suspense>
  );
}

/** Live, with the monitor link's panel beside its EtCO2 trend (features meet only here). */
export function LiveRoute() {
  return <LivePage monitor={MonitorPanel} />;
}
