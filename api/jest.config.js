/** API tests: unit specs beside the code and integration specs in test/, on real PostgreSQL. */
module.exports = {
  testEnvironment: 'node',
  roots: ['<rootDir>/src', '<rootDir>/test'],
  testMatch: ['**/*.spec.ts', '**/*.e2e-spec.ts'],
  transform: {
    '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.jest.json', diagnostics: false }],
  },
  // Workspace packages are tested from their TypeScript sources (relative `.js` imports there).
  testEnvironmentOptions: {
    customExportConditions: ['upstroke-source', 'node', 'require', 'default'],
  },
  moduleNameMapper: { '^(\\.{1,2}/(?!.*node_modules).*)\\.js$': '$1' },
  globalSetup: '<rootDir>/test/global-setup.ts',
  setupFiles: ['<rootDir>/test/setup-env.ts'],
  // Generous: a suite beside another test run on two cores can be slow; only a hang fails.
  testTimeout: 60000,
  maxWorkers: 1,
};
