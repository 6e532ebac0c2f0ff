import { existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { importEdges, importSpecifiers, isUnder, reachableFiles, resolveSpecifier, sourceFiles, type ImportEdge } from './importGraph';

// The layers (DEVELOPERS.md, "The parts"): calc/ primitives and subjects → calc/calculators/ →
// components/ (frame and islands) → site/ (pages). Imports run down this list only, and the
// build never depends on tests/. Each failure names the file and the import.

const ROOT = process.cwd();
const files = sourceFiles(ROOT, ['calc', 'components', 'site', 'verification', 'tests', 'scripts', 'bench']);
const edges = importEdges(ROOT, files);
const show = (list: ImportEdge[]) => list.map((e) => `${e.from} imports '${e.specifier}'`);

describe('the import reader', () => {
  it('finds default, named (over several lines), type, namespace, re-export, side-effect and dynamic imports', () => {
    const text = [
      "import a from './a';",
      'import {\n  b,\n  type C,\n} from "../b";',
      "import type { D } from './d';",
      "import * as e from 'e-package';",
      "export { f } from './f';",
      "export * from './g';",
      "import './h.css';",
      "const i = await import('./i');",
      '<script lang="ts">\n  import J from \'../J.svelte\';\n</script>',
    ].join('\n');
    expect(importSpecifiers(text).sort()).toEqual(['../J.svelte', '../b', './a', './d', './f', './g', './h.css', './i', 'e-package'].sort());
  });
  it('resolves relative specifiers to repository paths and leaves packages alone', () => {
    expect(resolveSpecifier('site/pages/calculators/x.astro', '../../../calc/teamConventions')).toBe('calc/teamConventions');
    expect(resolveSpecifier('calc/sizing/a.ts', './b')).toBe('calc/sizing/b');
    expect(resolveSpecifier('calc/a.ts', 'svelte/store')).toBeNull();
  });
  it('reads the real tree: it sees imports we know are there (so an empty graph cannot pass)', () => {
    expect(files.length).toBeGreaterThan(100);
    const has = (from: string, target: string) => edges.some((e) => e.from === from && e.target === target);
    expect(has('site/pages/verification.astro', 'verification/reference/index')).toBe(true);
    expect(has('site/lib/islands.ts', 'components/calculators/islands')).toBe(true);
    expect(has('calc/calculators/index.ts', 'calc/calculators/reflector')).toBe(true);
  });
});

describe('layers: no import runs upwards', () => {
  // remove .fails when refactor/adapters lands (calc/sizing calls calc/calculators/reflector.ts until then)
  it.fails('no file in calc/ outside calc/calculators/ imports from calc/calculators/', () => {
    const bad = edges.filter((e) => isUnder(e.from, 'calc') && !isUnder(e.from, 'calc/calculators') && isUnder(e.target, 'calc/calculators'));
    expect(show(bad)).toEqual([]);
  });

  it('calc/ imports nothing from components/ or site/, and not Svelte', () => {
    const bad = edges.filter(
      (e) =>
        isUnder(e.from, 'calc') &&
        (isUnder(e.target, 'components') || isUnder(e.target, 'site') || /^svelte(\/|$)/.test(e.specifier) || e.specifier.endsWith('.svelte')),
    );
    expect(show(bad)).toEqual([]);
  });

  it('components/ imports nothing from site/', () => {
    const bad = edges.filter((e) => isUnder(e.from, 'components') && isUnder(e.target, 'site'));
    expect(show(bad)).toEqual([]);
  });

  it('site/ imports nothing from tests/', () => {
    const bad = edges.filter((e) => isUnder(e.from, 'site') && isUnder(e.target, 'tests'));
    expect(show(bad)).toEqual([]);
  });

  it('nothing the site is built from lives in tests/, directly or through other files (verification/, calc/, components/)', () => {
    const reached = reachableFiles(edges, files.filter((f) => isUnder(f, 'site')), existsSync);
    const bad = [...reached].filter(([path]) => isUnder(path, 'tests')).map(([path, e]) => `${path}, reached by ${e.from} importing '${e.specifier}'`);
    expect(bad).toEqual([]);
  });
});
