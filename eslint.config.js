// Expo's lint rules plus the import fences between layers (see DEVELOPERS.md).
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');

const fence = (message, group) => ({ 'no-restricted-imports': ['error', { patterns: [{ group, message }] }] });

module.exports = defineConfig([
  expoConfig,
  { ignores: ['dist/*', '.data/*', '.tmp/*', '.expo/*', 'node_modules/*', 'modules/api/ui/graphql-types.ts', 'modules/api/ui/table-fragments.ts'] },
  {
    files: ['modules/*/core/**'],
    rules: fence('core is pure: it imports only other core code.', ['@/modules/*/server/**', '@/modules/*/ui/**', '@/server/**', '@/app/**', 'react', 'react-native', 'objection', 'knex', 'express']),
  },
  {
    files: ['modules/*/ui/**', 'app/**'],
    rules: fence('ui code never imports server code.', ['@/modules/*/server/**', '@/server/**', 'objection', 'knex', 'express', 'pg']),
  },
  {
    files: ['modules/*/server/**', 'server/**'],
    rules: fence('server code never imports ui code.', ['@/modules/*/ui/**', '@/app/**', 'react', 'react-native']),
  },
  {
    // Build-time env inlining only matters in the web bundle; node code reads its environment freely.
    files: ['server/**', 'modules/*/server/**', 'tests/**', 'scripts/**', 'storage-fake/**', 'stripe-fake/**', 'seeds/**'],
    rules: { 'expo/no-dynamic-env-var': 'off' },
  },
  { files: ['**/*.js'], languageOptions: { sourceType: 'commonjs' } },
]);
