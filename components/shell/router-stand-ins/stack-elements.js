/**
 * Stands in for react-navigation's header elements (expo-router's copy) where
 * expo-router's web stack view imports them (metro.config.js). The stack
 * draws its own header only on screens whose `headerShown` is not false.
 * Pinwright draws its own (components/shell/app-shell.tsx) and both of its
 * stacks set `headerShown: false` (tests/unit/router-stand-ins.test.ts checks
 * that), so the header, its back button, search bar and colour maths are left
 * out. The rest is react-navigation's own code. Should a header ever be
 * drawn, it throws, saying why, rather than leave a blank.
 */
const leftOut = require('./left-out');

// Each read on first use, so this file loads without react-native (as in the unit test).
const kept = {
  HeaderBackContext: () => require('expo-router/build/react-navigation/elements/Header/HeaderBackContext').HeaderBackContext,
  SafeAreaProviderCompat: () => require('expo-router/build/react-navigation/elements/SafeAreaProviderCompat').SafeAreaProviderCompat,
  Screen: () => require('expo-router/build/react-navigation/elements/Screen').Screen,
  getHeaderTitle: () => require('expo-router/build/react-navigation/elements/Header/getHeaderTitle').getHeaderTitle,
  useHeaderHeight: () => require('expo-router/build/react-navigation/elements/Header/useHeaderHeight').useHeaderHeight,
};
for (const [name, load] of Object.entries(kept)) Object.defineProperty(exports, name, { enumerable: true, get: load });
exports.Header = leftOut('Header', 'stack-elements.js', 'set headerShown: false');
exports.HeaderBackButton = leftOut('HeaderBackButton', 'stack-elements.js', 'set headerShown: false');
