/**
 * The web build gives expo-router's own files small stand-ins for parts of
 * themselves and of react-native that Pinwright never runs
 * (components/shell/router-stand-ins/, metro.config.js, babel.config.js).
 * A stand-in that lacks something its importer reads would break the web app
 * only at run time, so these checks read expo-router's installed files: each
 * redirect must still match a real request, each importer may read only what
 * the stand-in gives, and every react-native name any expo-router file reads
 * must be kept.
 */
import { transformFileSync } from '@babel/core';
import fs from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
// The stand-ins are plain CommonJS files, loaded the way Metro's bundle loads them.
const load = createRequire(__filename);
const routerBuild = path.join(root, 'node_modules/expo-router/build');
const standIns = path.join(root, 'components/shell/router-stand-ins');
const table: [string, string, string][] = load(path.join(standIns, 'table.js'));
const reactNativeUsed: { keptNames: string[]; leftOutNames: string[] } & Record<string, unknown> = load(
  path.join(standIns, 'react-native-web-used.js'),
);

function files(dir: string, name = /\.js$/): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? files(full, name) : name.test(entry.name) ? [full] : [];
  });
}

/** Names read as `<binding>.<name>` where the file binds `require(request)` to a variable, destructured from it, or read straight off it. */
function namesRead(text: string, request: string): string[] {
  const quoted = request.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
  const destructured = [...text.matchAll(new RegExp(`\\{([\\w\\s,]+)\\} = require\\(["']${quoted}["']\\)`, 'g'))].flatMap((m) =>
    m[1].split(',').map((name) => name.trim()),
  );
  const bindings = [
    ...text.matchAll(new RegExp(`(?:const|var|let) (\\w+) = (?:__importStar\\(|__importDefault\\()?require\\(["']${quoted}["']\\)`, 'g')),
  ].map((m) => m[1]);
  const direct = [...text.matchAll(new RegExp(`require\\(["']${quoted}["']\\)\\.(\\w+)`, 'g'))].map((m) => m[1]);
  return [
    ...destructured,
    ...direct,
    ...bindings.flatMap((binding) => [...text.matchAll(new RegExp(`\\b${binding}\\.(\\w+)`, 'g'))].map((m) => m[1])),
  ];
}

/** Names a compiled CommonJS file exports (`exports.X =` or `Object.defineProperty(exports, "X"`). */
function namesExported(file: string): string[] {
  const text = fs.readFileSync(file, 'utf8');
  const names = [...text.matchAll(/exports\.(\w+) = (?!void 0)/g), ...text.matchAll(/Object\.defineProperty\(exports, "(\w+)"/g)].map(
    (m) => m[1],
  );
  return [...new Set(names)].filter((name) => name !== '__esModule');
}

/** What a file reads of `require(request)`: the names it uses, or, where it re-exports the lot (`__exportStar`), every name the request exports. */
function namesReadOf(from: string, request: string): string[] {
  const text = fs.readFileSync(path.join(routerBuild, from), 'utf8');
  const quoted = request.replace(/[./]/g, '\\$&');
  if (new RegExp(`__exportStar\\(require\\(["']${quoted}["']\\), exports\\)`).test(text)) {
    const target = path.join(routerBuild, path.dirname(from), request);
    return namesExported(fs.existsSync(`${target}.js`) ? `${target}.js` : path.join(target, 'index.js'));
  }
  return namesRead(text, request);
}

describe('stand-ins for expo-router internals', () => {
  it.each(table)('%s still requires %s, and reads only what %s gives', (from, request, to) => {
    const text = fs.readFileSync(path.join(routerBuild, from), 'utf8');
    expect(text).toMatch(new RegExp(`require\\(["']${request.replace(/[./]/g, '\\$&')}["']\\)`));
    const standIn = load(path.join(standIns, to));
    const read = new Set(namesReadOf(from, request));
    expect(read.size).toBeGreaterThan(0); // the scan finds the use at all
    expect([...read].filter((name) => !(name in standIn))).toEqual([]);
  });

  it('hands Toast and ErrorBoundary the tab navigator’s own height context, not a copy', () => {
    const real = load(path.join(routerBuild, 'react-navigation/bottom-tabs/utils/BottomTabBarHeightContext.js'));
    expect(load(path.join(standIns, 'bottom-tab-bar-height.js')).BottomTabBarHeightContext).toBe(real.BottomTabBarHeightContext);
  });

  it('leaves the stack header out only while every stack of the app hides it', () => {
    const layouts = files(path.join(root, 'app'), /_layout\.tsx$/);
    const stacks = layouts.flatMap((file) => [...fs.readFileSync(file, 'utf8').matchAll(/<Stack\b[^>]*>/g)].map((m) => [file, m[0]]));
    expect(stacks.length).toBeGreaterThan(0); // the scan finds the stacks at all
    for (const [file, stack] of stacks)
      expect([path.relative(root, file), stack]).toEqual([path.relative(root, file), expect.stringContaining('headerShown: false')]);
    const { Header, HeaderBackButton } = load(path.join(standIns, 'stack-elements.js'));
    expect(() => Header({})).toThrow(/headerShown: false/);
    expect(() => HeaderBackButton({})).toThrow(/HeaderBackButton is left out/);
  });

  it('turns the generated sitemap route off, since its stand-in refuses to render', () => {
    const appJson = JSON.parse(fs.readFileSync(path.join(root, 'app.json'), 'utf8'));
    expect(appJson.expo.plugins).toContainEqual(['expo-router', { sitemap: false }]);
    expect(() => load(path.join(standIns, 'sitemap.js')).Sitemap()).toThrow(/turned off/);
  });
});

describe('parts of expo-router the app never uses', () => {
  const ownFiles = ['app', 'components'].flatMap((dir) => files(path.join(root, dir), /\.tsx?$/));
  const uses = (pattern: RegExp) =>
    ownFiles.filter((file) => pattern.test(fs.readFileSync(file, 'utf8'))).map((file) => path.relative(root, file));

  it('finds the app’s own files at all', () => {
    expect(ownFiles.length).toBeGreaterThan(100);
    expect(uses(/\bStack\.Screen\b/).length).toBeGreaterThan(0);
  });

  it('leaves out the stack toolbar and Stack.Title while no screen uses them', () => {
    expect(uses(/\bStack\.(Toolbar|Title)\b|StackToolbar/)).toEqual([]);
    const toolbar = load(path.join(standIns, 'stack-toolbar.js'));
    expect(() => toolbar.StackToolbar({})).toThrow(/StackToolbar is left out .*stack-toolbar\.js/);
    expect(() => toolbar.convertChildrenToString('x')).toThrow(/left out/);
  });

  it('answers "not a native tab trigger" while the app imports no native tabs', () => {
    expect(uses(/native-tabs|NativeTabs/)).toEqual([]);
    const trigger = load(path.join(standIns, 'native-tab-trigger.js'));
    expect(trigger.isNativeTabTrigger({ type: 'div', props: {} }, '/')).toBe(false);
    expect(() => trigger.convertTabPropsToOptions({})).toThrow(/left out/);
  });

  it('leaves out the link preview while no link has one', () => {
    expect(uses(/\bLink\.(Preview|Menu|Trigger)\b/)).toEqual([]);
    expect(() => load(path.join(standIns, 'href-preview.js')).HrefPreview({ href: '/' })).toThrow(/no Link\.Preview/);
  });
});

describe('the not-found view and the style checker', () => {
  it('shows the app’s own not-found screen where the router would show its built-in one', () => {
    const standIn = fs.readFileSync(path.join(standIns, 'unmatched.js'), 'utf8');
    expect(standIn).toContain("require('../../ui/not-found-screen').NotFoundScreen");
    expect(fs.readFileSync(path.join(root, 'components/ui/not-found-screen.tsx'), 'utf8')).toContain('export function NotFoundScreen()');
    expect(fs.readFileSync(path.join(root, 'app/+not-found.tsx'), 'utf8')).toContain('<NotFoundScreen />');
    expect(typeof load(path.join(standIns, 'unmatched.js')).Unmatched).toBe('function');
  });

  it('leaves react-native-web’s CSS value parser out of production builds only, where its checker never runs', () => {
    const styleSheet = fs.readFileSync(path.join(root, 'node_modules/react-native-web/dist/exports/StyleSheet/index.js'), 'utf8');
    expect(styleSheet).toMatch(/if \(process\.env\.NODE_ENV !== 'production'\) \{\s*validate\(styleObj\);/);
    expect(styleSheet.match(/\bvalidate\(/g)).toHaveLength(1); // called nowhere else
    const validator = fs.readFileSync(path.join(root, 'node_modules/react-native-web/dist/exports/StyleSheet/validate.js'), 'utf8');
    expect(validator).toContain("import valueParser from 'postcss-value-parser'");
    expect(fs.readFileSync(path.join(root, 'metro.config.js'), 'utf8')).toContain(
      "if (!context.dev && moduleName === 'postcss-value-parser' && context.originModulePath.endsWith(styleValidator))",
    );
    expect(() => load(path.join(standIns, 'style-validation.js'))('a b')).toThrow(/development only/);
  });
});

describe("expo-router's view of react-native", () => {
  const index = fs.readFileSync(path.join(root, 'node_modules/react-native-web/dist/index.js'), 'utf8');
  const exported = [...index.matchAll(/export \{ default as (\w+) \} from '\.\/exports\/\w+'/g)].map((m) => m[1]);

  it('sorts every name react-native-web exports into kept or left out, once', () => {
    expect(exported.length).toBeGreaterThan(50); // the scan reads the index at all
    const sorted = [...reactNativeUsed.keptNames, ...reactNativeUsed.leftOutNames];
    expect(new Set(sorted).size).toBe(sorted.length);
    expect([...sorted].sort()).toEqual([...exported].sort());
  });

  it('keeps every react-native name any expo-router file reads on the web', () => {
    const routerFiles = files(routerBuild).filter((file) => !/\.(ios|android|native)\.js$/.test(file));
    const read = new Set(routerFiles.flatMap((file) => namesRead(fs.readFileSync(file, 'utf8'), 'react-native')));
    expect(read.has('Platform') && read.has('Animated')).toBe(true); // the scan finds the uses at all
    // PlatformColor is read on native paths only; react-native-web has none, so it stays undefined.
    expect([...read].filter((name) => !reactNativeUsed.keptNames.includes(name) && name !== 'PlatformColor')).toEqual([]);
  });

  it("loads each kept name from react-native-web's own module of that name", () => {
    const text = fs.readFileSync(path.join(standIns, 'react-native-web-used.js'), 'utf8');
    for (const name of reactNativeUsed.keptNames) {
      expect(text).toContain(`${name}: () => require('react-native-web/dist/exports/${name}').default`);
      expect(fs.existsSync(path.join(root, `node_modules/react-native-web/dist/exports/${name}/index.js`))).toBe(true);
    }
  });

  it('throws, naming the name, when something reads one left out, and never lists those', () => {
    expect(() => reactNativeUsed.Switch).toThrow(/Switch is left out/);
    expect(Object.keys(reactNativeUsed)).not.toContain('Switch');
    expect(Object.keys(reactNativeUsed)).toContain('View');
  });

  const transform = (file: string, caller: Record<string, unknown>) =>
    transformFileSync(file, { cwd: root, configFile: path.join(root, 'babel.config.js'), babelrc: false, caller: caller as never })?.code ??
    '';
  const expoRoot = path.join(routerBuild, 'ExpoRoot.js');
  const metroWeb = { name: 'metro', bundler: 'metro', platform: 'web', projectRoot: root, isDev: false };

  it("points expo-router's require of react-native at the stand-in in Metro's web build only", () => {
    // A name metro.config.js resolves, not this checkout's path: Metro's transform cache is shared between checkouts.
    expect(transform(expoRoot, metroWeb)).toContain('require("pinwright-router-stand-in/react-native-web-used")');
    expect(transform(expoRoot, metroWeb)).not.toContain(root);
    expect(fs.readFileSync(path.join(root, 'metro.config.js'), 'utf8')).toContain(
      "if (moduleName === REACT_NATIVE_USED) return { type: 'sourceFile', filePath: path.join(standInsDir, 'react-native-web-used.js') }",
    );
    // jest-expo also calls itself 'metro' but names no project root; native builds keep react-native.
    expect(transform(expoRoot, { name: 'metro', bundler: 'metro', platform: 'web' })).not.toContain('pinwright-router-stand-in');
    expect(transform(expoRoot, { ...metroWeb, platform: 'ios' })).not.toContain('pinwright-router-stand-in');
  });

  it('leaves files outside expo-router alone', () => {
    const other = path.join(root, 'node_modules/react-native-safe-area-context/lib/commonjs/index.js');
    const file = fs.existsSync(other) ? other : path.join(root, 'components/shell/mark.tsx');
    expect(transform(file, metroWeb)).not.toContain('pinwright-router-stand-in');
  });
});
