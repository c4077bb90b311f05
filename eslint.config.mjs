import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/', 'build/', 'node_modules/', 'coverage/', 'test-output/', 'assets/templates/*.xlsx'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.ts'],
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-eval': 'error',
      'no-new-func': 'error',
    },
  },
  {
    // functions/, taskpane/ and cli/ reach the engine only through its index (docs/design.md, "Layers")
    files: ['src/functions/**/*.ts', 'src/taskpane/**/*.ts', 'src/cli/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/engine/*', '!**/engine/index'],
              message: 'Import the engine only through src/engine/index.ts.',
            },
          ],
        },
      ],
    },
  },
  {
    // the engine is pure: it imports nothing outside itself (docs/design.md, "Layers")
    files: ['src/engine/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/functions/**', '**/taskpane/**', '**/cli/**'],
              message: 'The engine imports nothing outside src/engine.',
            },
            {
              regex: '^(?!\\.)',
              message: 'The engine is pure: no packages, no Node or Office modules.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['**/*.js', '**/*.mjs', '**/*.cjs'],
    languageOptions: {
      globals: { require: 'readonly', module: 'writable', __dirname: 'readonly', process: 'readonly', console: 'readonly' },
    },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
);
