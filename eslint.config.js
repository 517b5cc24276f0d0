// Lint: TypeScript rules plus the one-way import flow ui → state → worker → run → io → core.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';

const noImportsFrom = (patterns, message) => ({
  'no-restricted-imports': ['error', { patterns: [{ group: patterns, message }] }],
});

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'coverage/**', 'test-results/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['src/core/**/*.ts'],
    rules: noImportsFrom(
      ['node:*', 'fs', 'path', 'os', 'react', 'react-dom', 'react-dom/*', 'plotly.js*', 'zustand', 'papaparse',
        '**/io/**', '**/run/**', '**/worker/**', '**/state/**', '**/ui/**', '**/cli/**'],
      'src/core is pure numerics: no DOM, React, Node, I/O or app layers.',
    ),
  },
  {
    files: ['src/io/**/*.ts'],
    rules: noImportsFrom(['node:*', 'fs', 'path', 'react', 'react-dom', '**/run/**', '**/worker/**', '**/state/**', '**/ui/**', '**/cli/**'],
      'src/io may import only src/core and parsing libraries.'),
  },
  {
    files: ['src/run/**/*.ts'],
    rules: noImportsFrom(['node:*', 'fs', 'path', 'react', 'react-dom', 'zustand', '**/worker/**', '**/state/**', '**/ui/**', '**/cli/**'],
      'src/run (settings, series cells and the run input built from them) may import only io and core.'),
  },
  {
    files: ['src/worker/**/*.ts'],
    rules: noImportsFrom(['node:*', 'fs', 'react', 'react-dom', '**/state/**', '**/ui/**', '**/cli/**'],
      'src/worker may import run, io and core only.'),
  },
  {
    files: ['src/state/**/*.ts'],
    rules: noImportsFrom(['node:*', 'fs', '**/ui/**', '**/cli/**'], 'src/state may not import UI or CLI.'),
  },
  {
    files: ['src/ui/**/*.{ts,tsx}'],
    rules: {
      ...noImportsFrom(['node:*', 'fs', '**/cli/**', '**/io/**', '**/worker/**'], 'src/ui acts through src/state; core only as types.'),
      // The core's values reach the screen through the store: the UI may name core types, never call core code.
      '@typescript-eslint/no-restricted-imports': ['error', {
        patterns: [{ group: ['**/core/**', '**/core'], allowTypeImports: true, message: 'src/ui imports the core only as types (import type …); call it through src/state.' }],
      }],
    },
  },
);
