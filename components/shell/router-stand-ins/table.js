/**
 * Which expo-router internals the web build answers with a stand-in from this
 * folder (read by metro.config.js, checked by tests/unit/router-stand-ins.test.ts):
 * [file inside expo-router/build that makes the request, the request, stand-in file here].
 */
module.exports = [
  ['views/Toast.js', '../react-navigation/bottom-tabs', 'bottom-tab-bar-height.js'],
  ['views/ErrorBoundary.js', '../react-navigation/bottom-tabs', 'bottom-tab-bar-height.js'],
  ['ExpoRoot.js', './views/Sitemap', 'sitemap.js'],
  ['getRoutes.js', './views/Sitemap', 'sitemap.js'],
  ['ExpoRoot.js', './screensFeatureFlags', 'screens-feature-flags.js'],
  ['react-navigation/native-stack/views/NativeStackView.js', '../../elements', 'stack-elements.js'],
  ['head/ExpoHead.js', '../../vendor/react-helmet-async/lib', 'head-title.js'],
  ['layouts/stack-utils/index.js', './toolbar', 'stack-toolbar.js'],
  ['layouts/stack-utils/StackScreen.js', './toolbar', 'stack-toolbar.js'],
  ['layouts/stack-utils/StackTitle.js', './toolbar/shared', 'stack-toolbar.js'],
  ['layouts/withLayoutContext.js', '../native-tabs/NativeTabTrigger', 'native-tab-trigger.js'],
  ['link/elements.js', './preview/HrefPreview', 'href-preview.js'],
  ['getRoutes.js', './views/Unmatched', 'unmatched.js'],
  ['views/RootUnmatched.js', './Unmatched', 'unmatched.js'],
  ['link/linking.js', '../fork/getStateFromPath', 'route-lookup-memo.js'],
  ['fork/useLinking.js', './createMemoryHistory', 'same-entry-history.js'],
];
