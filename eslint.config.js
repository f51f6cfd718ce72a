// ESLint (flat config): Expo's rules for the app, plus unused code and import
// cycles as errors. Prettier owns formatting (eslint-config-prettier turns the
// style rules off). `npm run lint` runs it with --max-warnings 0; `npm test`
// runs `npm run lint` first and fails on any finding.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');
const prettierConfig = require('eslint-config-prettier/flat');

module.exports = defineConfig([
  { ignores: ['dist/**', '.expo/**', '.data/**', 'node_modules/**', 'tests/artifacts/**', 'expo-env.d.ts', 'server/cli/pinwright.js'] },
  expoConfig,
  prettierConfig,
  {
    files: ['**/*.ts', '**/*.tsx', '**/*.js'],
    settings: {
      // `@/…` is the project root (tsconfig paths), so the import rules can follow it.
      'import/resolver': { typescript: { project: './tsconfig.json' }, node: true },
    },
    rules: {
      // No module may import itself back through others (server/, components/, math/, shared/).
      'import/no-cycle': ['error', { ignoreExternal: true }],
      'no-unreachable': 'error',
      'no-useless-catch': 'error',
      'no-useless-return': 'error',
    },
  },
  {
    files: ['**/*.ts', '**/*.tsx'],
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', ignoreRestSiblings: true },
      ],
      'no-unused-expressions': 'off',
      '@typescript-eslint/no-unused-expressions': ['error', { allowShortCircuit: true, allowTernary: true }],
    },
  },
  {
    // Expo inlines EXPO_PUBLIC_ variables into the app bundle, so the app may not read process.env by a
    // computed name; the server and the test tools run in Node and read their settings that way on purpose.
    files: ['server/**', 'tests/**'],
    rules: { 'expo/no-dynamic-env-var': 'off' },
  },
  {
    // Node-side scripts and config files are CommonJS.
    files: ['*.config.js', 'babel.config.js', 'metro.config.js', 'jest.config.js'],
    languageOptions: { globals: { module: 'writable', require: 'readonly', __dirname: 'readonly' } },
  },
]);
