// Lint owns style and import order (see DEVELOPERS.md); Prettier owns layout.
const { defineConfig, globalIgnores } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');
const simpleImportSort = require('eslint-plugin-simple-import-sort');
const prettierConfig = require('eslint-config-prettier/flat');
const globals = require('globals');

module.exports = defineConfig([
  globalIgnores(['dist/', '.data/', '.expo/', 'coverage/', 'tests/e2e/artifacts/', 'node_modules/', 'expo-env.d.ts']),
  expoConfig,
  {
    plugins: { 'simple-import-sort': simpleImportSort },
    rules: {
      'simple-import-sort/imports': 'error',
      'simple-import-sort/exports': 'error',
      'import/first': 'error',
      'import/newline-after-import': 'error',
      'import/no-duplicates': 'error',
    },
  },
  {
    files: ['**/*.ts', '**/*.tsx'],
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', ignoreRestSiblings: true },
      ],
      '@typescript-eslint/consistent-type-imports': ['error', { prefer: 'type-imports', fixStyle: 'separate-type-imports' }],
    },
  },
  {
    files: ['server/**', 'scripts/**', 'migrations/**', 'seeders/**', 'tests/**', '*.config.js', 'babel.config.js'],
    languageOptions: { globals: globals.node },
  },
  { files: ['tests/**'], languageOptions: { globals: globals.jest } },
  prettierConfig,
]);
