// One Jest run, four projects. `npm test` (server/tools/test-run.ts) provides the
// database and the web export that the api and browser projects need.
const swc = ['@swc/jest', { inputSourceMap: false, jsc: { parser: { syntax: 'typescript', tsx: true }, target: 'es2022', transform: { react: { runtime: 'automatic' } } }, module: { type: 'commonjs' } }];
const alias = { '^@/(.*)$': '<rootDir>/$1' };

module.exports = {
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
      // bcrypt at cost 12 and a real database: slower than unit tests, more so on 2 busy cores.
      testTimeout: 60_000,
      testMatch: ['<rootDir>/tests/api/**/*.test.ts'],
      transform: { '^.+\\.(t|j)sx?$': swc },
      moduleNameMapper: alias,
    },
    {
      displayName: 'components',
      preset: 'jest-expo/web',
      testTimeout: 30_000,
      testMatch: ['<rootDir>/tests/components/**/*.test.tsx'],
      moduleNameMapper: { ...alias, '^react-native$': 'react-native-web' },
    },
    {
      displayName: 'browser',
      testEnvironment: 'node',
      testTimeout: 120_000,
      testMatch: ['<rootDir>/tests/browser/**/*.test.ts'],
      transform: { '^.+\\.(t|j)sx?$': swc },
      moduleNameMapper: alias,
    },
  ],
};
