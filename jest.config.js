/** One jest run, two projects: node code (server, shared calculator, seed data) and the client. */
const swcNode = [
  '@swc/jest',
  {
    jsc: {
      parser: { syntax: 'typescript', decorators: true },
      transform: { legacyDecorator: true, decoratorMetadata: true },
      target: 'es2022',
    },
    module: { type: 'commonjs' },
  },
];

module.exports = {
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      rootDir: __dirname,
      testMatch: ['<rootDir>/__tests__/{server,shared,seed}/**/*.test.ts'],
      transform: { '^.+\\.(t|j)sx?$': swcNode, '^.+\\.mjs$': swcNode },
      // lucia and its helpers ship ESM only; jest runs CommonJS, so they are compiled too.
      transformIgnorePatterns: ['/node_modules/(?!(lucia|oslo|@oslojs|@lucia-auth)/)'],
      moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
    },
    {
      displayName: 'client',
      preset: 'jest-expo',
      rootDir: __dirname,
      testMatch: ['<rootDir>/__tests__/client/**/*.test.{ts,tsx}'],
      transformIgnorePatterns: [
        'node_modules/(?!((jest-)?react-native|@react-native(-community)?|expo(nent)?|@expo(nent)?/.*|@expo-google-fonts/.*|react-navigation|@react-navigation/.*|react-native-svg|victory.*|@tanstack/.*))',
      ],
    },
  ],
};
