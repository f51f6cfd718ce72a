// Expo's default Metro config, plus redirects that keep the web bundle small:
// @hookform/resolvers' zod resolver imports `zod/v4/core` for zod 4 schemas; ours
// are zod 3, so that import is answered by a stub (components/shell/zod-v4-core-stub.js);
// our own imports of 'expo-router' get only the names we use (expo-router-slim.ts);
// and expo-router internals a web build of this app never runs get small
// stand-ins (components/shell/router-stand-ins/, each file says why; babel.config.js
// does the same for expo-router's view of react-native, which no resolver can reach).
const fs = require('node:fs');
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
const zodV4CoreStub = path.resolve(__dirname, 'components/shell/zod-v4-core-stub.js');
const resolversDir = `${path.sep}@hookform${path.sep}resolvers${path.sep}`;
const expoRouterSlim = path.resolve(__dirname, 'components/shell/expo-router-slim.ts');
const ownCode = ['app', 'components', 'shared', 'math'].map((dir) => path.resolve(__dirname, dir) + path.sep);
const upstream = config.resolver.resolveRequest;

const { REACT_NATIVE_USED } = require('./babel.config');
const routerBuild = path.join('node_modules', 'expo-router', 'build') + path.sep;
const standInsDir = path.resolve(__dirname, 'components/shell/router-stand-ins');
const styleValidator = path.join('node_modules', 'react-native-web', 'dist', 'exports', 'StyleSheet', 'validate.js');
const routerStandIns = require('./components/shell/router-stand-ins/table').map(([from, request, to]) => ({
  from: routerBuild + path.normalize(from),
  request,
  to: path.join(standInsDir, to),
}));

config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (moduleName === 'zod/v4/core' && context.originModulePath.includes(resolversDir)) {
    return { type: 'sourceFile', filePath: zodV4CoreStub };
  }
  if (platform === 'web') {
    // expo-router's `require("react-native")`, renamed by babel.config.js.
    if (moduleName === REACT_NATIVE_USED) return { type: 'sourceFile', filePath: path.join(standInsDir, 'react-native-web-used.js') };
    const standIn = routerStandIns.find(({ from, request }) => request === moduleName && context.originModulePath.endsWith(from));
    if (standIn) return { type: 'sourceFile', filePath: standIn.to };
    // react-native-web checks styles in development only; production never calls this parser.
    if (!context.dev && moduleName === 'postcss-value-parser' && context.originModulePath.endsWith(styleValidator)) {
      return { type: 'sourceFile', filePath: path.join(standInsDir, 'style-validation.js') };
    }
  }
  // Our own imports of 'expo-router' take only the names we use (see expo-router-slim.ts).
  if (
    moduleName === 'expo-router' &&
    platform === 'web' &&
    context.originModulePath !== expoRouterSlim &&
    ownCode.some((dir) => context.originModulePath.startsWith(dir))
  ) {
    return { type: 'sourceFile', filePath: expoRouterSlim };
  }
  return (upstream ?? context.resolveRequest)(context, moduleName, platform);
};

// Modules run when first used, not all at start-up: less work before the first screen
// (the React Native default; Expo's config turns it off).
const upstreamTransformOptions = config.transformer.getTransformOptions;
config.transformer.getTransformOptions = async (...args) => {
  const options = await upstreamTransformOptions(...args);
  return { ...options, transform: { ...options.transform, inlineRequires: true } };
};

// With PINWRIGHT_MODULE_IDS=<file>, the export writes which module id each source file got,
// so server/tools/start-up-modules.ts can name the start-up modules in the built entry script.
const upstreamModuleIdFactory = config.serializer.createModuleIdFactory;
config.serializer.createModuleIdFactory = () => {
  const idOf = upstreamModuleIdFactory();
  const out = process.env.PINWRIGHT_MODULE_IDS;
  if (!out) return idOf;
  const ids = new Map();
  process.once('exit', () => fs.writeFileSync(out, JSON.stringify(Object.fromEntries(ids))));
  return (modulePath) => {
    const id = idOf(modulePath);
    ids.set(modulePath, id);
    return id;
  };
};

module.exports = config;
