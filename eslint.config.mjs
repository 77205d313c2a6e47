import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '**/test-output/**',
      'data/**',
      '**/coverage/**',
      'apps/backend/src/migrations/Migration*.ts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['apps/frontend/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
  {
    files: ['apps/frontend/src/**/*.{ts,tsx}'],
    rules: {
      // Features never import from each other's folders (STYLE.md).
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['../../features/*', '@/features/*/*'], message: 'Import from another feature through shared code, not directly.' }] },
      ],
    },
  },
  {
    files: ['libs/standards/src/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['node:*', 'fs', 'path', 'http'], message: 'The standards library does no I/O.' }] },
      ],
    },
  },
);
