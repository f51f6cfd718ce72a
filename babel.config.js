// Expo's own Babel preset: needed by Metro for the web export and by jest-expo for component tests.

// In Metro's web builds only (not jest's), expo-router's own compiled files get
// components/shell/router-stand-ins/react-native-web-used.js for `require("react-native")`:
// the react-native names they read, without every component react-native-web has.
// Metro's resolver cannot do this, because Expo answers 'react-native' with react-native-web's
// index before any project resolver runs, so the request is renamed in the file to
// REACT_NATIVE_USED, which metro.config.js resolves to that stand-in. (A name, not the file's
// absolute path: Metro's transform cache is shared by every checkout on a machine, and would
// hand one checkout's path to another.) The plugin lives here rather than in its own file
// because Metro's transform cache follows this file.
const REACT_NATIVE_USED = 'pinwright-router-stand-in/react-native-web-used';
const reactNativeRequests = new Set(['react-native', 'react-native-web', 'react-native-web/dist/index']);
const routerFile = /[\\/]node_modules[\\/]expo-router[\\/]build[\\/]/;

function routerReactNativeUsed({ types: t }) {
  return {
    name: 'pinwright-router-react-native-used',
    visitor: {
      CallExpression(callPath, state) {
        // Expo's Metro transformer names the project root; jest-expo, which also calls itself
        // 'metro', does not.
        const caller = state.file.opts.caller;
        if (!caller || caller.name !== 'metro' || caller.platform !== 'web' || !caller.projectRoot) return;
        if (!routerFile.test(state.filename || '')) return;
        const { callee, arguments: args } = callPath.node;
        if (!t.isIdentifier(callee, { name: 'require' }) || args.length !== 1) return;
        // babel-preset-expo may already have renamed the request to react-native-web's index.
        if (!t.isStringLiteral(args[0]) || !reactNativeRequests.has(args[0].value)) return;
        callPath.node.arguments = [t.stringLiteral(REACT_NATIVE_USED)];
      },
    },
  };
}

// Also in Metro's web builds only: expo-router's path lookup (fork/getStateFromPath.js, its
// findInitialRoute) tells whether two route names are the same with
// `a.localeCompare(b) !== 0`. Both names come from the same route table (the app's file
// names), so that is an equality test, but a page's first localeCompare sets up the
// locale's collation (ICU): 13–37 ms in Chromium, unthrottled, inside the render of the
// first screen, and nothing else on the first screens compares strings by locale.
// `a.localeCompare(b) !== 0` becomes `a !== b` there (and `=== 0` becomes `===`); a
// localeCompare used for ordering is left alone. tests/components/router-name-equality.test.tsx
// compares the lookup before and after on every route of the app.
const routerLookupFile = /[\\/]node_modules[\\/]expo-router[\\/]build[\\/]fork[\\/]getStateFromPath\.js$/;

function routerNameEquality({ types: t }) {
  return {
    name: 'pinwright-router-name-equality',
    visitor: {
      BinaryExpression(binaryPath, state) {
        const caller = state.file.opts.caller;
        if (!caller || caller.name !== 'metro' || caller.platform !== 'web' || !caller.projectRoot) return;
        if (!routerLookupFile.test(state.filename || '')) return;
        const { operator, left, right } = binaryPath.node;
        if (operator !== '!==' && operator !== '===') return;
        if (!t.isNumericLiteral(right, { value: 0 }) || !t.isCallExpression(left) || left.arguments.length !== 1) return;
        const callee = left.callee;
        if (!t.isMemberExpression(callee) || callee.computed || !t.isIdentifier(callee.property, { name: 'localeCompare' })) return;
        if (!t.isExpression(left.arguments[0])) return;
        binaryPath.replaceWith(t.binaryExpression(operator, callee.object, left.arguments[0]));
      },
    },
  };
}

module.exports = function (api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'], plugins: [routerReactNativeUsed, routerNameEquality] };
};
module.exports.REACT_NATIVE_USED = REACT_NATIVE_USED;
module.exports.routerNameEquality = routerNameEquality;
