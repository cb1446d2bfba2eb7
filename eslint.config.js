// Lint rules: the recommended sets, plus the few that guard this project's own promises.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist/**', 'dist-*/**', 'node_modules/**', 'test/output/**', 'test/fixtures/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
      // Imported text must never become markup (rule 5 of the guide).
      'no-restricted-properties': [
        'error',
        { property: 'innerHTML', message: 'Build DOM from text nodes; never assign HTML strings.' },
        { property: 'outerHTML', message: 'Build DOM from text nodes; never assign HTML strings.' },
        {
          property: 'insertAdjacentHTML',
          message: 'Build DOM from text nodes; never insert HTML strings.',
        },
      ],
      'no-eval': 'error',
      'no-implied-eval': 'error',
      'no-new-func': 'error',
    },
  },
  {
    files: ['calc/**/*.ts'],
    rules: {
      // calc/ must run unchanged in Node, workers and other harnesses: relative imports only.
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^(?!\\.{1,2}/)',
              message: 'calc/ uses relative imports only and no packages.',
            },
          ],
        },
      ],
    },
  },
);
