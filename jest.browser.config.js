/** Chromium tests against the real server; started by scripts/browser-tests.js, which sets DILATO_BASE_URL. */
module.exports = {
  displayName: 'browser',
  testEnvironment: 'node',
  rootDir: __dirname,
  testMatch: ['<rootDir>/__tests__/browser/**/*.test.ts'],
  transform: { '^.+\\.ts$': ['@swc/jest', { jsc: { parser: { syntax: 'typescript' }, target: 'es2022' }, module: { type: 'commonjs' } }] },
  testTimeout: 60_000,
};
