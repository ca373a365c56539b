// Lint with the import boundaries of DEVELOPERS.md: shared/ imports nothing from src/ or
// server/; server/ never imports src/; the client never imports server/.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';

const noImport = (patterns, message) => ['error', { patterns: [{ group: patterns, message }] }];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'var/**', 'test-results/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-namespace': 'off',
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: { 'no-restricted-imports': noImport(['**/src/**', '**/server/**', 'express', 'sequelize', 'react', 'node:*'], 'shared/ is pure: it may not import the client, the server or I/O.') },
  },
  {
    files: ['server/**/*.ts'],
    rules: { 'no-restricted-imports': noImport(['**/src/**'], 'The server never imports client code.') },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': noImport(['**/server/**'], 'The client talks to the server over HTTP only.') },
  },
);
