import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['upstroke-source'] },
  ssr: { resolve: { conditions: ['upstroke-source'] } },
  // Property tests run many cases: a generous limit so only a hang fails on a busy machine.
  test: {
    name: 'contracts',
    environment: 'node',
    include: ['src/**/*.spec.ts'],
    testTimeout: 60_000,
  },
});
