/**
 * The web build's answer to `import … from 'expo-router'` in app/ and
 * components/ (metro.config.js redirects it here). expo-router's index
 * re-exports everything it has — tabs, sitemap, link previews, toolbars,
 * native tabs — and, being compiled to CommonJS, Metro bundles all of it into
 * the entry script. This file names only what Pinwright uses, from the same
 * modules the index takes them from, so the rest stays out of the download.
 * tests/unit/expo-router-slim.test.ts fails if app/ or components/ import a
 * name from 'expo-router' that is missing here. Types still come from
 * 'expo-router' itself (TypeScript and Jest never see this redirect).
 */
export { useLocalSearchParams, usePathname, useRouter } from 'expo-router/build/hooks';
export { Slot } from 'expo-router/build/views/Navigator';
export { Stack } from 'expo-router/build/layouts/Stack';
export { Link, Redirect } from 'expo-router/build/link/Link';
export { useIsFocused } from 'expo-router/build/useIsFocused';
export { DefaultTheme } from 'expo-router/build/react-navigation/native/theming/DefaultTheme';
export { ThemeProvider } from 'expo-router/build/react-navigation/core/theming/ThemeProvider';
