// Expo's flat config (typescript-eslint, React, hooks, import rules) for the whole project.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');

module.exports = defineConfig([
  expoConfig,
  {
    ignores: ['dist/*', 'node_modules/*', '.expo/*', 'test-output/*', 'server/build/*'],
  },
  {
    files: ['server/**/*.ts', 'scripts/**/*.{js,ts}', '__tests__/server/**/*.ts', '__tests__/seed/**/*.ts', '__tests__/browser/**/*.ts', '*.config.js'],
    languageOptions: { globals: { require: 'readonly', module: 'writable', __dirname: 'readonly', process: 'readonly' } },
  },
  {
    // fast-check is used as `fc.assert(fc.property(…))`, as its own documentation does.
    files: ['__tests__/**/*.ts'],
    rules: { 'import/no-named-as-default-member': 'off' },
  },
]);
