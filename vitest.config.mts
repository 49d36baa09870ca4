import { defineConfig } from 'vitest/config';

// One vitest run for every workspace that has unit tests (see each project's own config).
export default defineConfig({
  test: { projects: ['packages/contracts', 'packages/capno', 'web'] },
});
