import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import pluginQuery from '@tanstack/eslint-plugin-query';
import globals from 'globals';
import { existsSync, readdirSync } from 'node:fs';

// One block per feature folder: a feature may import itself and shared code, never another
// feature (STYLE.md). Route components in src/app compose features and are not limited.
const featuresDir = 'apps/frontend/src/features';
const features = existsSync(featuresDir) ? readdirSync(featuresDir) : [];
const featureBlocks = features.map((name) => ({
  files: [`${featuresDir}/${name}/**/*.{ts,tsx}`],
  rules: {
    'no-restricted-imports': [
      'error',
      {
        patterns: [
          {
            group: [
              '@/features/*',
              `!@/features/${name}`,
              `!@/features/${name}/**`,
              '../../*/**',
              '!../../' + name + '/**',
            ],
            message:
              'A feature does not import another feature; move shared code to src/components or src/lib.',
          },
        ],
      },
    ],
  },
}));

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
    plugins: { 'react-hooks': reactHooks, '@tanstack/query': pluginQuery },
    rules: {
      ...reactHooks.configs.recommended.rules,
      // Query keys, stable clients, no rest-destructured results (TanStack Query's own rules).
      ...pluginQuery.configs['flat/recommended'][0].rules,
    },
  },
  ...featureBlocks,
  {
    files: ['libs/standards/src/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['node:*', 'fs', 'path', 'http'],
              message: 'The standards library does no I/O.',
            },
          ],
        },
      ],
    },
  },
);
