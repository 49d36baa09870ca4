import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['upstroke-source'] },
  ssr: { resolve: { conditions: ['upstroke-source'] } },
  // Python (SciPy) and CLI child processes start slowly on a busy machine.
  test: { name: 'capno', environment: 'node', include: ['src/**/*.spec.ts'], testTimeout: 60_000 },
});
