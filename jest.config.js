// One Jest run, four projects. `npm test` (server/tools/test-run.ts) provides the
// database and the web export that the api and browser projects need.
const swc = [
  '@swc/jest',
  {
    inputSourceMap: false,
    jsc: { parser: { syntax: 'typescript', tsx: true }, target: 'es2022', transform: { react: { runtime: 'automatic' } } },
    module: { type: 'commonjs' },
  },
];
const alias = { '^@/(.*)$': '<rootDir>/$1' };

module.exports = {
  // bcrypt at cost 12, a real database and a real browser on 2 cores: far slower than
  // Jest's 5 s default allows. (Jest 29 takes testTimeout only at the top level.)
  testTimeout: 60_000,
  projects: [
    {
      displayName: 'unit',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/tests/math/**/*.test.ts', '<rootDir>/tests/shared/**/*.test.ts', '<rootDir>/tests/unit/**/*.test.ts'],
      transform: { '^.+\\.(t|j)sx?$': swc },
      transformIgnorePatterns: ['/node_modules/(?!(ode45-cash-karp|odex)/)'],
      moduleNameMapper: alias,
    },
    {
      displayName: 'api',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/tests/api/**/*.test.ts'],
      transform: { '^.+\\.(t|j)sx?$': swc },
      moduleNameMapper: alias,
    },
    {
      displayName: 'components',
      preset: 'jest-expo/web',
      testMatch: ['<rootDir>/tests/components/**/*.test.tsx'],
      moduleNameMapper: { ...alias, '^react-native$': 'react-native-web' },
    },
    {
      displayName: 'browser',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/tests/browser/**/*.test.ts'],
      setupFilesAfterEnv: ['<rootDir>/tests/helpers/browser-retry.ts'],
      transform: { '^.+\\.(t|j)sx?$': swc },
      moduleNameMapper: alias,
    },
  ],
};
