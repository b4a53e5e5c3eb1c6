// Lint rules that guard the project's conventions (DEVELOPERS.md "Conventions"): typescript-eslint's
// recommended set, bounded line length, and the import boundaries — shared/ imports nothing from src/
// or server/; the server calls downward only (routes → services → models); client features do not
// import each other; no runtime import cycles. `npm run lint` runs it; `npm test` fails on it.
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';

const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);

/** One zone per client feature: it may not import another feature. */
const featureZones = features.map((f) => ({
  target: `./src/features/${f}`,
  from: './src/features',
  except: [`./${f}`],
  message: 'Client features do not import each other; move shared client code to src/components, src/hooks or src/lib.',
}));

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', 'uploads/', 'test-output/', '.data/', 'tests/fixtures/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { ecmaVersion: 2023, sourceType: 'module', globals: { ...globals.node, ...globals.browser } },
    plugins: { 'import-x': importX },
    settings: {
      ...importX.flatConfigs.typescript.settings,
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })],
    },
    rules: {
      'max-len': ['error', { code: 200, ignoreUrls: true, ignoreRegExpLiterals: true }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      '@typescript-eslint/no-explicit-any': 'error',
      'no-console': ['error', { allow: ['warn', 'error'] }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './shared',
              from: ['./src', './server', './scripts', './tests'],
              message: 'shared/ is pure: it imports nothing from src/, server/, scripts/ or tests/.',
            },
            { target: './src', from: ['./server', './scripts'], message: 'The client talks to the server over HTTP only.' },
            { target: './server', from: ['./src'], message: 'The server does not import client code.' },
            {
              target: './server/models',
              from: ['./server/services', './server/routes', './server/presenters', './server/middleware'],
              message: 'Models are the bottom layer.',
            },
            {
              target: './server/presenters',
              from: ['./server/services', './server/routes'],
              message: 'Presenters turn rows into DTOs; they do not call services.',
            },
            { target: './server/services', from: ['./server/routes'], message: 'Services do not call routes.' },
            {
              target: './server/routes',
              from: ['./server/models', './server/db'],
              message: 'Routes call services, not models or the database.',
            },
            {
              target: './src/components',
              from: ['./src/features', './src/app'],
              message: 'Shared client components do not import features or pages.',
            },
            { target: './src/lib', from: ['./src/features', './src/app'], message: 'Client libraries do not import features or pages.' },
            { target: './src/hooks', from: ['./src/features', './src/app'], message: 'Client hooks do not import features or pages.' },
            { target: './src/features', from: ['./src/app'], message: 'Features do not import pages.' },
            ...featureZones,
          ],
        },
      ],
    },
  },
  {
    files: ['src/**'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          // Sign-out and leaving a page cancel reads; only a read that was handed the signal is really stopped.
          selector: "Property[key.name='queryFn'] > ArrowFunctionExpression[params.length=0]",
          message: 'Take the query context and pass its signal to the API client: queryFn: ({ signal }) => api.get(path, { signal }).',
        },
      ],
    },
  },
  {
    files: ['scripts/**', 'server/cli/**', 'server/index.ts', 'server/dev/**'],
    rules: { 'no-console': 'off' },
  },
  {
    files: ['tests/**'],
    rules: { 'no-console': 'off', '@typescript-eslint/no-non-null-assertion': 'off' },
  },
);
