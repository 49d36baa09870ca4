import { describe, expect, it } from 'vitest';
import { screens } from './screens';

describe('screens loaded on first use', () => {
  // Each loader imports a whole screen (the data grid, Chart.js): real work, a generous limit.
  it('resolves every screen to its component, the same one on a second call', async () => {
    for (const [name, load] of Object.entries(screens)) {
      const first = await load();
      expect(typeof first, name).toBe('function');
      expect(await load(), name).toBe(first);
    }
  }, 120_000);
});
