import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/.turbo/**', '**/coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['packages/core/src/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@demandscape/*', '../../apps/*', '../../packages/*'],
              message:
                'packages/core is the pure domain library: it must not import other workspace packages (apps and ui depend on core, never the reverse).',
            },
          ],
          paths: [
            { name: 'fs', message: 'packages/core does no I/O: read files in the CLI or the server and pass arrays in.' },
            { name: 'node:fs', message: 'packages/core does no I/O: read files in the CLI or the server and pass arrays in.' },
          ],
        },
      ],
    },
  },
  {
    files: ['packages/core/src/cli/**/*.ts', 'packages/core/**/*.bench.ts', 'packages/core/**/*.test.ts'],
    rules: { 'no-restricted-imports': 'off' },
  },
);
