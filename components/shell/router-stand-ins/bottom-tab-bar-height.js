/**
 * Stands in for expo-router's bottom-tab navigator where the router's own
 * Toast and ErrorBoundary import it (metro.config.js). Those two read only
 * `BottomTabBarHeightContext`, so this hands them the very same context object
 * from the navigator's own file, without the tab bar, its animations and
 * react-native-screens, which Pinwright does not use.
 */
module.exports = {
  BottomTabBarHeightContext: require('expo-router/build/react-navigation/bottom-tabs/utils/BottomTabBarHeightContext')
    .BottomTabBarHeightContext,
};
