import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';

/**
 * House rules (../shared/STYLE.md): no `any`, no import cycles, dependencies point one way
 * (client, server and seed use shared; shared uses none of them; client features do not import each other).
 */
export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', 'data/**', 'server/drizzle/**', 'e2e/artefacts/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [
        createTypeScriptImportResolver({
          project: ['shared/tsconfig.json', 'server/tsconfig.json', 'client/tsconfig.json', 'seed/tsconfig.json'],
          noWarnOnMultipleProjects: true,
        }),
      ],
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import-x/no-cycle': 'error',
    },
  },
  {
    // Plain Node scripts (start, dev, the solver's worker) run outside any bundler.
    files: ['scripts/**/*.mjs', 'server/workers/**/*.mjs'],
    languageOptions: { globals: globals.node },
  },
  {
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.test.ts', 'shared/bench/**'],
    rules: {
      // shared/ is pure computation: no I/O (tests and benches may read their fixture files).
      'no-restricted-imports': [
        'error',
        { patterns: ['@gramwatt/server*', '@gramwatt/client*', '@gramwatt/seed*', 'node:*', 'fs', 'path'] },
      ],
    },
  },
  {
    files: ['shared/**/*.test.ts', 'shared/bench/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['@gramwatt/server*', '@gramwatt/client*', '@gramwatt/seed*'] }],
    },
  },
  {
    files: ['client/src/features/*/**/*.{ts,tsx}'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: ['auth', 'locker', 'trips', 'plan', 'plans', 'party', 'admin', 'outbox'].map((feature) => ({
            target: `./client/src/features/${feature}`,
            from: './client/src/features',
            except: [`./${feature}`],
          })),
        },
      ],
    },
  },
);
