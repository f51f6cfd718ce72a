/**
 * The web build answers our own `import … from 'expo-router'` with
 * components/shell/expo-router-slim.ts (metro.config.js), which names only
 * what Pinwright uses. A name imported from 'expo-router' that the slim file
 * lacks would be undefined in the web app, so every one must be there, and
 * each must come from a module of expo-router's build that defines it.
 */
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const slimFile = path.join(root, 'components/shell/expo-router-slim.ts');

function sources(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? sources(full) : /\.tsx?$/.test(entry.name) ? [full] : [];
  });
}

/** Value names in `import { … } from 'expo-router'` and `export { … } from 'expo-router'` (type-only ones left out). */
function importedNames(text: string): string[] {
  const names: string[] = [];
  for (const m of text.matchAll(/(?:import|export)\s+(type\s+)?\{([^}]*)\}\s*from\s*'expo-router'/g)) {
    if (m[1]) continue;
    for (const part of m[2].split(',')) {
      const name = part.trim();
      if (name && !name.startsWith('type ')) names.push(name.split(/\s+as\s+/)[0]);
    }
  }
  return names;
}

const slim = fs.readFileSync(slimFile, 'utf8');
const slimExports = new Map<string, string>();
for (const m of slim.matchAll(/export\s*\{([^}]*)\}\s*from\s*'([^']+)'/g))
  for (const name of m[1]
    .split(',')
    .map((part) => part.trim())
    .filter(Boolean))
    slimExports.set(name, m[2]);

it('names every value app/ and components/ import from expo-router', () => {
  const used = new Set(
    ['app', 'components', 'shared', 'math']
      .flatMap((dir) => sources(path.join(root, dir)))
      .flatMap((file) => importedNames(fs.readFileSync(file, 'utf8'))),
  );
  expect(used.size).toBeGreaterThan(5); // the scan finds the imports at all
  expect([...used].filter((name) => !slimExports.has(name))).toEqual([]);
});

it('takes each name from a module of expo-router that defines it', () => {
  for (const [name, from] of slimExports) {
    const base = path.join(root, 'node_modules', from);
    const file = [`${base}.web.js`, `${base}.js`, path.join(base, 'index.js')].find((candidate) => fs.existsSync(candidate));
    expect([
      name,
      file &&
        /exports\.\w+ = /.test(fs.readFileSync(file, 'utf8')) &&
        new RegExp(`exports\\.${name}\\b|"${name}"`).test(fs.readFileSync(file, 'utf8')),
    ]).toEqual([name, true]);
  }
});
