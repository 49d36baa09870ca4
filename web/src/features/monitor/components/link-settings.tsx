import { Button, MenuItem, Stack, TextField } from '@mui/material';
import { type SimulatorScenario, simulatorScenarioLabels } from '@upstroke/contracts';
import { useState } from 'react';
import { checkLinkUrl, savedLinkUrl, scenarios, simulatorUrl } from '../lib/link-url';

const SIMULATOR = 'simulator';

/**
 * Where the link is: the built-in simulator (with a scenario) or a bedside link address
 * entered once on this device.
 */
export function LinkSettings({
  onConnect,
}: {
  onConnect: (url: string, remember: boolean) => void;
}) {
  const saved = savedLinkUrl();
  const [kind, setKind] = useState<string>(
    saved && !saved.includes('/api/link/simulator') ? 'bedside' : SIMULATOR,
  );
  const [scenario, setScenario] = useState<SimulatorScenario>('rosc');
  const [url, setUrl] = useState(saved && kind === 'bedside' ? saved : '');
  const problem = kind === 'bedside' ? checkLinkUrl(url) : null;
  const connect = () => {
    if (kind === SIMULATOR) onConnect(simulatorUrl(scenario), false);
    else if (!problem) onConnect(url, true);
  };
  return (
    <Stack
      direction="row"
      spacing={1}
      useFlexGap
      sx={{ flexWrap: 'wrap', alignItems: 'flex-start' }}
    >
      <TextField
        select
        label="Link"
        value={kind}
        onChange={(e) => setKind(e.target.value)}
        sx={{ minWidth: 150 }}
      >
        <MenuItem value={SIMULATOR}>Simulator</MenuItem>
        <MenuItem value="bedside">Bedside link</MenuItem>
      </TextField>
      {kind === SIMULATOR ? (
        <TextField
          select
          label="Scenario"
          value={scenario}
          onChange={(e) => setScenario(e.target.value as SimulatorScenario)}
          sx={{ minWidth: 170 }}
        >
          {scenarios.map((s) => (
            <MenuItem key={s} value={s}>
              {simulatorScenarioLabels[s]}
            </MenuItem>
          ))}
        </TextField>
      ) : (
        <TextField
          label="Link address"
          value={url}
          onChange={(e) => setUrl(e.target.value)}
          error={url !== '' && problem !== null}
          helperText={url !== '' ? problem : 'Entered once on this tablet'}
          placeholder="ws://10.0.0.5:8765"
          sx={{ minWidth: 240 }}
        />
      )}
      <Button
        variant="contained"
        onClick={connect}
        disabled={problem !== null}
        sx={{ minHeight: 56 }}
      >
        Connect monitor
      </Button>
    </Stack>
  );
}
