import { type Etco2DisplayUnit, etco2Number, formatEtco2 } from '@upstroke/contracts';
import { memo } from 'react';
import { Alert, Button, Chip, Paper, Stack, Typography } from '@mui/material';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { type MonitorView, useMonitorLink } from '../hooks/use-monitor-link';
import { saveLinkUrl } from '../lib/link-url';
import { CapnogramCanvas } from './capnogram-canvas';
import { LinkSettings } from './link-settings';

export interface MonitorPanelProps {
  resuscitationId: string;
  arrestAt: string;
  /** The site's unit: readings and messages are written in it. */
  unit: Etco2DisplayUnit;
  onEtco2?: (mmHg: number, at: string) => void;
}

const statusText = {
  idle: 'Not connected',
  connecting: 'Connecting…',
  live: 'Live',
  lost: 'Link lost — reconnecting; keep recording by hand',
} as const;

/**
 * Monitor link inside Live: the live capnogram, per-breath EtCO2 and ventilation rate from
 * capno's LiveAnalyzer, gaps and link state. The link never blocks manual entry: losing it
 * shows here, and everything else on the screen keeps working.
 */
export const MonitorPanel = memo(function MonitorPanel(props: MonitorPanelProps) {
  const { view, ring, connect, disconnect } = useMonitorLink(props);
  const on = view.status !== 'idle';
  return (
    <Paper
      variant="outlined"
      sx={{ p: 1.5 }}
      aria-label="Monitor link"
      component="section"
      data-samples={view.samples}
      data-sec={view.dataSec}
    >
      <Stack spacing={1}>
        <Stack
          direction="row"
          spacing={1}
          sx={{ alignItems: 'center', justifyContent: 'space-between' }}
        >
          <Typography variant="subtitle1" component="h2">
            Monitor link
          </Typography>
          <Chip
            label={statusText[view.status]}
            color={
              view.status === 'live' ? 'success' : view.status === 'lost' ? 'error' : 'default'
            }
            role="status"
            aria-label="Link status"
          />
        </Stack>
        {view.status === 'lost' && (
          <Alert severity="error">
            The monitor link is lost{view.detail ? ` (${view.detail})` : ''}. It reconnects by
            itself; enter EtCO2 by hand meanwhile.
          </Alert>
        )}
        {on ? (
          <>
            <CapnogramCanvas ring={ring} />
            <Stack direction="row" spacing={3} sx={{ alignItems: 'baseline' }}>
              <Reading
                label="EtCO2"
                value={view.etco2MmHg === null ? null : etco2Number(view.etco2MmHg, props.unit)}
                unit={props.unit}
              />
              <Reading label="Ventilation rate" value={view.ratePerMin} unit="/min" />
              <Typography variant="body2" color="text.secondary" aria-label="Link gaps">
                {view.gaps === 0 ? 'No gaps' : `${view.gaps} frame(s) missed`}
              </Typography>
            </Stack>
            <ValueAge view={view} unit={props.unit} />
            {view.findings.map((f) => (
              <Alert
                key={f.kind}
                severity={f.severity === 'info' ? 'info' : 'warning'}
                data-finding={f.kind}
                data-start-sec={Math.round(f.startSec)}
              >
                {f.message}
              </Alert>
            ))}
            {view.findings.length > 0 && <ClinicalCaution dense />}
            <Button
              variant="outlined"
              onClick={disconnect}
              sx={{ minHeight: 56, alignSelf: 'flex-start' }}
            >
              Disconnect monitor
            </Button>
          </>
        ) : (
          <LinkSettings
            onConnect={(url, remember) => {
              if (remember) saveLinkUrl(url);
              connect(url);
            }}
          />
        )}
      </Stack>
    </Paper>
  );
});

/** How old the newest value is; once stale, the value is shown only as past. */
function ValueAge({ view, unit }: { view: MonitorView; unit: Etco2DisplayUnit }) {
  if (view.etco2AgeSec === null) return null;
  const text =
    view.staleEtco2MmHg !== null
      ? `No current value: the last, ${formatEtco2(view.staleEtco2MmHg, unit)}, is ${view.etco2AgeSec} s old`
      : `Last value ${view.etco2AgeSec} s ago`;
  return (
    <Typography
      variant="body2"
      color={view.staleEtco2MmHg !== null ? 'error' : 'text.secondary'}
      aria-label="Age of the last value"
    >
      {text}
    </Typography>
  );
}

function Reading(props: { label: string; value: number | string | null; unit: string }) {
  const { label, value, unit } = props;
  return (
    <Stack>
      <Typography variant="caption" color="text.secondary">
        {label}
      </Typography>
      <Typography variant="h4" component="p" aria-label={label}>
        {value ?? '—'}
        <Typography component="span" variant="body2" sx={{ ml: 0.5 }}>
          {unit}
        </Typography>
      </Typography>
    </Stack>
  );
}
