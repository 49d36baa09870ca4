import { type SimulatorScenario, simulatorScenarioSchema } from '@upstroke/contracts';

const KEY = 'upstroke.monitorLinkUrl';

export const scenarios: readonly SimulatorScenario[] = simulatorScenarioSchema.options;

/** The built-in simulator on this server (training data, no bedside device needed). */
export function simulatorUrl(scenario: SimulatorScenario, origin = window.location): string {
  const proto = origin.protocol === 'https:' ? 'wss:' : 'ws:';
  return `${proto}//${origin.host}/api/link/simulator?scenario=${scenario}`;
}

/** The link URL entered once on this device. */
export function savedLinkUrl(): string | null {
  try {
    return localStorage.getItem(KEY);
  } catch {
    return null;
  }
}

export function saveLinkUrl(url: string): void {
  try {
    localStorage.setItem(KEY, url);
  } catch {
    // Private mode: the URL is simply asked again next time.
  }
}

/** A usable WebSocket URL, or a message saying what is wrong with it. */
export function checkLinkUrl(url: string): string | null {
  try {
    const u = new URL(url);
    return u.protocol === 'ws:' || u.protocol === 'wss:'
      ? null
      : 'The link address starts with ws:// or wss://';
  } catch {
    return 'Not an address (example: ws://10.0.0.5:8765)';
  }
}
