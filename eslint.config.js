// One set of rules for every workspace: typescript-eslint, React hooks in the web, Prettier's formatting
// left to Prettier, and the import boundaries that keep dependencies pointing one way (DEVELOPERS.md).
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const dirs = (path) =>
  readdirSync(new URL(path, import.meta.url), { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => d.name);

const webFeatures = dirs('./web/src/features/');

/** Frameworks, I/O and the clock stay out of the shared domain code. */
const sharedForbidden = [
  { group: ['react', 'react-*', '@fluentui/*', '@tanstack/*'], message: 'shared/ holds no UI framework code.' },
  { group: ['@nestjs/*', 'typeorm', 'express', 'better-sqlite3'], message: 'shared/ holds no server framework code.' },
  { group: ['node:*', 'fs', 'path', 'http'], message: 'shared/ does no I/O: the caller passes data in.' },
  { group: ['@homeground/*'], message: 'shared/ is the bottom layer: it imports no other workspace.' },
];

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      'data/**',
      'coverage/**',
      'test-results/**',
      'bench-results/**',
      'web/public/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    plugins: { 'import-x': importX },
    languageOptions: { globals: { ...globals.node } },
    settings: {
      // Parse .ts/.tsx dependencies too, or rules that follow imports (no-cycle) see no further than one file.
      'import-x/extensions': ['.ts', '.tsx', '.js', '.mjs'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/resolver-next': [
        createTypeScriptImportResolver({
          project: [
            'shared/tsconfig.json',
            'species-data/tsconfig.json',
            'api/tsconfig.json',
            'web/tsconfig.json',
            'tsconfig.json',
          ],
          noWarnOnMultipleProjects: true,
        }),
      ],
    },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': [
        'error',
        { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false },
      ],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-self-import': 'error',
      'import-x/no-duplicates': ['error', { 'prefer-inline': true }],
    },
  },
  {
    // Nest injects constructor parameters by their runtime class, so those imports must stay value imports.
    files: ['api/**/*.ts'],
    rules: { '@typescript-eslint/consistent-type-imports': 'off' },
  },
  {
    files: ['shared/src/**/*.ts'],
    ignores: ['shared/src/**/*.test.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: sharedForbidden }] },
  },
  {
    files: ['web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      // The two classic hook rules; the React Compiler's rules (refs, set-state-in-effect…) assume a compiler we do not use.
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            // Features never import each other: routes compose them.
            ...webFeatures.map((f) => ({
              target: `./web/src/features/${f}`,
              from: './web/src/features',
              except: [`./${f}`],
              message:
                'Features never import each other; share through components/, lib/ or api/, or compose in a route.',
            })),
            // Common code imports no feature and no route.
            ...['components', 'lib', 'api', 'config', 'theme'].map((common) => ({
              target: `./web/src/${common}`,
              from: ['./web/src/features', './web/src/routes'],
              message: 'Common code imports no feature or route.',
            })),
            {
              target: './web/src/features',
              from: './web/src/routes',
              message: 'Features never import routes; routes compose features.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['api/src/**/*.ts'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './api/src/common',
              from: './api/src',
              except: ['./common', './config', './auth/authenticated-user.ts'],
              message: 'common/ holds guards, filters and decorators every feature uses; it imports no feature.',
            },
          ],
        },
      ],
    },
  },
  {
    files: [
      '**/*.test.{ts,tsx}',
      '**/*.spec.ts',
      '**/*.e2e-spec.ts',
      '**/test/**/*.ts',
      '**/testing/**/*.{ts,tsx}',
      '**/bench/**/*.ts',
    ],
    rules: { '@typescript-eslint/no-non-null-assertion': 'off' },
  },
  prettier,
);
