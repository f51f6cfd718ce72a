/**
 * Stands in for react-native-web's index where expo-router's compiled files
 * require 'react-native' (rewritten by babel.config.js). Those files are
 * CommonJS, so the bundler cannot see which names they read and would take
 * every component react-native-web has (touchables, switch, check box, modal,
 * picker, pan responder, …) into the first download. This file gives them
 * the names they do read, each loaded on first use from react-native-web's
 * own module. tests/unit/router-stand-ins.test.ts checks that the names below
 * are exactly react-native-web's and that every name an expo-router file reads
 * is kept. A name left out throws when read, naming itself.
 */
'use strict';

const kept = {
  ActivityIndicator: () => require('react-native-web/dist/exports/ActivityIndicator').default,
  Animated: () => require('react-native-web/dist/exports/Animated').default,
  Dimensions: () => require('react-native-web/dist/exports/Dimensions').default,
  Easing: () => require('react-native-web/dist/exports/Easing').default,
  I18nManager: () => require('react-native-web/dist/exports/I18nManager').default,
  Image: () => require('react-native-web/dist/exports/Image').default,
  InteractionManager: () => require('react-native-web/dist/exports/InteractionManager').default,
  Keyboard: () => require('react-native-web/dist/exports/Keyboard').default,
  PixelRatio: () => require('react-native-web/dist/exports/PixelRatio').default,
  Platform: () => require('react-native-web/dist/exports/Platform').default,
  Pressable: () => require('react-native-web/dist/exports/Pressable').default,
  ScrollView: () => require('react-native-web/dist/exports/ScrollView').default,
  StatusBar: () => require('react-native-web/dist/exports/StatusBar').default,
  StyleSheet: () => require('react-native-web/dist/exports/StyleSheet').default,
  Text: () => require('react-native-web/dist/exports/Text').default,
  TextInput: () => require('react-native-web/dist/exports/TextInput').default,
  UIManager: () => require('react-native-web/dist/exports/UIManager').default,
  View: () => require('react-native-web/dist/exports/View').default,
  useColorScheme: () => require('react-native-web/dist/exports/useColorScheme').default,
};

const leftOut = [
  'AccessibilityInfo',
  'Alert',
  'AppRegistry',
  'AppState',
  'Appearance',
  'AssetRegistry',
  'BackHandler',
  'Button',
  'CheckBox',
  'Clipboard',
  'DeviceEventEmitter',
  'FlatList',
  'ImageBackground',
  'InputAccessoryView',
  'KeyboardAvoidingView',
  'LayoutAnimation',
  'Linking',
  'LogBox',
  'Modal',
  'NativeEventEmitter',
  'NativeModules',
  'PanResponder',
  'Picker',
  'ProgressBar',
  'RefreshControl',
  'SafeAreaView',
  'SectionList',
  'Share',
  'Switch',
  'Touchable',
  'TouchableHighlight',
  'TouchableNativeFeedback',
  'TouchableOpacity',
  'TouchableWithoutFeedback',
  'Vibration',
  'VirtualizedList',
  'YellowBox',
  'findNodeHandle',
  'processColor',
  'render',
  'unmountComponentAtNode',
  'unstable_createElement',
  'useLocaleContext',
  'useWindowDimensions',
];

Object.defineProperty(exports, '__esModule', { value: true });
for (const [name, load] of Object.entries(kept)) {
  Object.defineProperty(exports, name, { enumerable: true, get: load });
}
for (const name of leftOut) {
  // Not enumerable, so spreading or listing the module never trips it.
  Object.defineProperty(exports, name, {
    enumerable: false,
    get() {
      throw new Error(
        `react-native's ${name} is left out of expo-router's view of react-native-web (see components/shell/router-stand-ins/react-native-web-used.js)`,
      );
    },
  });
}

module.exports.keptNames = Object.keys(kept);
module.exports.leftOutNames = leftOut;
