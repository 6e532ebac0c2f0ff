/**
 * A small reader of the project's import graph for the layer test (importGraph.test.ts): every
 * `import … from '…'`, side-effect `import '…'`, `export … from '…'` and `import('…')` of a
 * .ts/.svelte/.astro/.mjs/.mdx file, with relative specifiers resolved to repository paths.
 * A regular expression is enough here: the files are our own, and the test checks the reader on
 * known imports so a reader that finds nothing cannot pass silently.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, normalize, relative, sep } from 'node:path';

export interface ImportEdge {
  /** Importing file, repository-relative with forward slashes (e.g. 'site/lib/islands.ts'). */
  from: string;
  /** The specifier as written. */
  specifier: string;
  /** Repository-relative target for a relative specifier; null for a package ('svelte', 'd3-scale'). */
  target: string | null;
}

const SOURCE_FILE = /\.(ts|svelte|astro|mjs|mdx)$/;

/** `import x from 'a'`, `import { a, b } from "a"` (over several lines), `export * from 'a'`, `import 'a'`, `import('a')`. */
const IMPORT_PATTERNS = [
  /\b(?:import|export)\s+(?:type\s+)?[\w*${}\s,]*?\bfrom\s*['"]([^'"]+)['"]/g,
  /\bimport\s*['"]([^'"]+)['"]/g,
  /\bimport\s*\(\s*['"]([^'"]+)['"]\s*\)/g,
];

/** The module specifiers a source text imports or re-exports, in order of the patterns. */
export function importSpecifiers(text: string): string[] {
  const found: string[] = [];
  for (const pattern of IMPORT_PATTERNS) for (const m of text.matchAll(pattern)) found.push(m[1]);
  return found;
}

/** Repository-relative path of a relative specifier seen from a file; null for a package name. */
export function resolveSpecifier(fromFile: string, specifier: string): string | null {
  if (!specifier.startsWith('.')) return null;
  return normalize(join(dirname(fromFile), specifier)).split(sep).join('/');
}

/** Every source file under the given top-level folders (repository-relative, forward slashes). */
export function sourceFiles(root: string, folders: string[]): string[] {
  const walk = (dir: string): string[] =>
    readdirSync(join(root, dir), { withFileTypes: true }).flatMap((e) => {
      const path = `${dir}/${e.name}`;
      if (e.isDirectory()) return e.name === 'node_modules' ? [] : walk(path);
      return SOURCE_FILE.test(e.name) ? [path] : [];
    });
  return folders.flatMap(walk).map((f) => relative(root, join(root, f)).split(sep).join('/'));
}

/** All import edges of the given files. */
export function importEdges(root: string, files: string[]): ImportEdge[] {
  return files.flatMap((from) =>
    importSpecifiers(readFileSync(join(root, from), 'utf8')).map((specifier) => ({ from, specifier, target: resolveSpecifier(from, specifier) })),
  );
}

/** True when a repository path lies in the folder (given without a trailing slash). */
export function isUnder(path: string | null, folder: string): boolean {
  return path !== null && (path === folder || path.startsWith(`${folder}/`));
}

/** The files reachable from `starts` by relative imports (extension-less targets tried as .ts, .svelte, /index.ts). */
export function reachableFiles(edges: ImportEdge[], starts: string[], exists: (path: string) => boolean): Map<string, ImportEdge> {
  const byFile = new Map<string, ImportEdge[]>();
  for (const e of edges) byFile.set(e.from, [...(byFile.get(e.from) ?? []), e]);
  const reachedBy = new Map<string, ImportEdge>();
  const queue = [...starts];
  while (queue.length) {
    const file = queue.pop()!;
    for (const e of byFile.get(file) ?? []) {
      if (e.target === null) continue;
      const target = [e.target, `${e.target}.ts`, `${e.target}/index.ts`].find(exists) ?? e.target;
      if (reachedBy.has(target) || starts.includes(target)) continue;
      reachedBy.set(target, e);
      queue.push(target);
    }
  }
  return reachedBy;
}
