/**
 * The Bench lists bows with their readiness, and on a cold load the zod schemas
 * it checks that list with are built while the page is starting (each schema
 * module runs its top level when first required). Those modules must not pull
 * in the schemas of one bow's full record or of the level check itself: that
 * work belongs to the screens that use them (shared/bow-detail.ts,
 * shared/level.ts). This follows the modules' runtime imports (type-only
 * imports and re-exports are erased in the build) from what the Bench's code
 * imports.
 */
import fs from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

const root = path.resolve(__dirname, '../..');

/** Files a module needs when it runs: its value imports and re-exports, resolved within the project. */
function runtimeImports(file: string): string[] {
  const source = ts.createSourceFile(file, fs.readFileSync(file, 'utf8'), ts.ScriptTarget.Latest, true);
  const out: string[] = [];
  for (const statement of source.statements) {
    let specifier: ts.Expression | undefined;
    if (ts.isImportDeclaration(statement)) {
      const clause = statement.importClause;
      if (clause?.isTypeOnly) continue;
      // `import { type A, type B } from` is erased as well.
      const named = clause?.namedBindings;
      if (clause && !clause.name && named && ts.isNamedImports(named) && named.elements.every((e) => e.isTypeOnly)) continue;
      specifier = statement.moduleSpecifier;
    } else if (ts.isExportDeclaration(statement) && statement.moduleSpecifier && !statement.isTypeOnly) {
      specifier = statement.moduleSpecifier;
    }
    if (!specifier || !ts.isStringLiteral(specifier)) continue;
    const name = specifier.text;
    const base = name.startsWith('@/')
      ? path.join(root, name.slice(2))
      : name.startsWith('.')
        ? path.resolve(path.dirname(file), name)
        : null;
    if (!base) continue; // a package
    const found = ['.ts', '.tsx', '/index.ts'].map((ext) => base + ext).find((candidate) => fs.existsSync(candidate));
    if (found) out.push(found);
  }
  return out;
}

/** Every project file that runs when `entry` runs (its runtime imports, followed). */
function closure(entry: string): Set<string> {
  const seen = new Set<string>();
  const queue = [path.join(root, entry)];
  while (queue.length) {
    const file = queue.pop()!;
    if (seen.has(file)) continue;
    seen.add(file);
    queue.push(...runtimeImports(file));
  }
  return new Set([...seen].map((file) => path.relative(root, file)));
}

const heavySchemas = [
  'shared/bow-detail.ts',
  'shared/build.ts',
  'shared/sight-in.ts',
  'shared/fit.ts',
  'shared/tape.ts',
  'shared/level.ts',
  'shared/setup-measures.ts',
];

describe("the Bench's schema modules", () => {
  it.each(['components/home/api.ts', 'components/home/bow-card.tsx', 'components/bows/readiness-words.ts'])(
    '%s does not bring in the full-record or level-check schemas',
    (entry) => {
      const needed = closure(entry);
      expect(needed.has('shared/bow.ts') || needed.has('shared/level-summary.ts')).toBe(true);
      expect(heavySchemas.filter((file) => needed.has(file))).toEqual([]);
    },
  );

  it('the walk sees a runtime import when there is one (the full record does need the sight-in schemas)', () => {
    const needed = closure('shared/bow-detail.ts');
    expect(needed.has('shared/sight-in.ts')).toBe(true);
    expect(needed.has('shared/build.ts')).toBe(true);
    expect(needed.has('shared/bow.ts')).toBe(true);
  });

  it('the level schemas still offer the summary (re-exported), and the same objects', () => {
    // eslint-disable-next-line @typescript-eslint/no-require-imports
    const level = require('@/shared/level');
    // eslint-disable-next-line @typescript-eslint/no-require-imports
    const summary = require('@/shared/level-summary');
    for (const name of ['levelSummarySchema', 'bowChangeSchema', 'bowChangeKindSchema', 'levelPlaceSchema']) {
      expect(level[name]).toBe(summary[name]);
    }
  });
});
