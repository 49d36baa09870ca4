// @ts-check
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX, { createNodeResolver } from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';

const root = import.meta.dirname;
const foldersIn = (dir) =>
  readdirSync(join(root, dir), { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => d.name);

/**
 * One-way imports on the tablet app (shared code → features → app): a feature never imports
 * another feature (the app shell composes them), shared code never imports a feature or the app.
 */
const webZones = [
  ...foldersIn('web/src/features').map((name) => ({
    target: `web/src/features/${name}`,
    from: 'web/src/features',
    except: [`./${name}`],
    message:
      'Features never import one another: move shared code to web/src/{components,hooks,lib} or compose in web/src/app.',
  })),
  {
    target: ['web/src/components', 'web/src/hooks', 'web/src/lib', 'web/src/config'],
    from: ['web/src/features', 'web/src/app'],
    message: 'Shared code never imports a feature or the app shell.',
  },
  {
    target: 'web/src/features',
    from: 'web/src/app',
    message: 'Features never import the app shell.',
  },
];

/**
 * An API module reaches another module only through what that module exports to Nest: its
 * module, its services and its guards; never its repositories, controllers or helpers.
 */
const apiZones = foldersIn('api/src/modules').map((name) => ({
  target: `api/src/modules/${name}`,
  from: [join(root, 'api/src/modules/**')],
  except: [
    join(root, `api/src/modules/${name}/**`),
    join(root, 'api/src/modules/*/*.module.ts'),
    join(root, 'api/src/modules/*/*.service.ts'),
    join(root, 'api/src/modules/*/*.guard.ts'),
    // The worker pool renders PDFs in worker threads, where no Nest container runs: it calls
    // the exports module's pure renderer directly (no database, no state).
    ...(name === 'work-pool' ? [join(root, 'api/src/modules/exports/pdf/**')] : []),
  ],
  message: 'Reach another module through its exported service, never its repository or helpers.',
}));

export default tseslint.config(
  {
    ignores: [
      '**/dist/**',
      '**/node_modules/**',
      '.local/**',
      'bench/out/**',
      '**/*.config.mts',
      '**/*.config.ts',
      '**/*.config.js',
      '**/*.config.mjs',
      'eslint.config.mjs',
      'web/dev-dist/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
      globals: { ...globals.node },
    },
    plugins: { 'import-x': importX },
    settings: {
      // TypeScript sources import without extensions; without this, import rules see nothing.
      'import-x/resolver-next': [
        createNodeResolver({ extensions: ['.ts', '.tsx', '.d.ts', '.js', '.mjs', '.json'] }),
      ],
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-floating-promises': [
        'error',
        {
          // node:test's describe/it return promises that the runner itself awaits.
          allowForKnownSafeCalls: [
            { from: 'package', name: ['describe', 'it', 'test', 'suite'], package: 'node:test' },
          ],
        },
      ],
      '@typescript-eslint/switch-exhaustiveness-check': [
        'error',
        { considerDefaultExhaustiveForUnions: true },
      ],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
      'import-x/no-cycle': ['error', { maxDepth: 10 }],
      'import-x/no-restricted-paths': [
        'error',
        { basePath: root, zones: [...webZones, ...apiZones] },
      ],
    },
  },
  {
    files: ['web/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    files: ['**/*.mjs', '**/*.js'],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    files: ['scripts/**/*.cjs'],
    languageOptions: { sourceType: 'commonjs', globals: { ...globals.node } },
  },
);
