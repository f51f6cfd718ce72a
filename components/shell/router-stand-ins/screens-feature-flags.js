/**
 * Stands in for expo-router's `screensFeatureFlags` in the web bundle
 * (metro.config.js). The flags it sets switch behaviour of
 * react-native-screens' native iOS and Android views; a web build has none,
 * so setting them only cost the download of react-native-screens.
 */
module.exports = { initScreensFeatureFlags() {} };
