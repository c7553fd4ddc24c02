// Lint for the whole workspace: the recommended JavaScript and TypeScript sets, Svelte's for the viewer.
// Run by `npm run lint` and by the test command, so a warning-free tree stays that way.
import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['**/node_modules/**', '**/dist/**', 'fixtures/**', '.reports/**', 'coverage/**', 'test-artifacts/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...svelte.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' },
      ],
    },
  },
  // TypeScript itself reports undefined names, with the DOM and Node types; the core rule does not know them.
  { files: ['**/*.ts', '**/*.svelte'], rules: { 'no-undef': 'off' } },
  {
    files: ['**/*.svelte', '**/*.svelte.ts'],
    languageOptions: { parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.svelte'] } },
  },
);
