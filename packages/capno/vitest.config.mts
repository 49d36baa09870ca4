import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['upstroke-source'] },
  ssr: { resolve: { conditions: ['upstroke-source'] } },
  test: { name: 'capno', environment: 'node', include: ['src/**/*.spec.ts'] },
});
