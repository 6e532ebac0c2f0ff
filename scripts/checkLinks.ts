/**
 * Link checker for a built site: reads every HTML file under `rootDir` (served under `basePath`),
 * collects each internal reference (href, src, action, and the island loader URLs Astro writes),
 * and reports those that do not resolve to a built file (a directory resolves to its index.html)
 * and fragments (#id) that name no element id on the target page. Resources (src, stylesheets,
 * island scripts) must not leave the site's origin; plain links to other sites are allowed.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

export interface LinkProblem {
  /** Page (path relative to rootDir) holding the reference. */
  page: string;
  attribute: string;
  value: string;
  reason: string;
}

const ORIGIN = 'http://site.invalid';
const TAG = /<([a-zA-Z][\w-]*)\b((?:[^>"']|"[^"]*"|'[^']*')*)>/g;
const ATTR = /([\w:-]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g;
const LINK_ATTRS = new Set(['href', 'src', 'action', 'component-url', 'renderer-url', 'before-hydration-url', 'poster']);

function decodeEntities(value: string): string {
  return value
    .replace(/&#x([0-9a-f]+);/gi, (_, h) => String.fromCodePoint(parseInt(h, 16)))
    .replace(/&#(\d+);/g, (_, d) => String.fromCodePoint(Number(d)))
    .replace(/&quot;/g, '"')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

/** Every tag's attributes in an HTML document, outside comments, scripts' bodies and styles. */
export function tagsOf(html: string): { tag: string; attrs: Map<string, string> }[] {
  const stripped = html.replace(/<!--[\s\S]*?-->/g, '').replace(/(<(script|style)\b[^>]*>)[\s\S]*?(<\/\2>)/gi, '$1$3');
  const out: { tag: string; attrs: Map<string, string> }[] = [];
  for (const m of stripped.matchAll(TAG)) {
    const attrs = new Map<string, string>();
    for (const a of m[2].matchAll(ATTR)) attrs.set(a[1].toLowerCase(), decodeEntities(a[2] ?? a[3] ?? ''));
    out.push({ tag: m[1].toLowerCase(), attrs });
  }
  return out;
}

function htmlFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = join(dir, e.name);
    if (e.isDirectory()) return htmlFiles(full);
    return e.name.endsWith('.html') ? [full] : [];
  });
}

/** URL path under which a built file is served (directory index pages end with '/'). */
function pageUrl(rootDir: string, file: string, base: string): string {
  const rel = relative(rootDir, file).split(sep).join('/');
  return `${ORIGIN}${base}${rel.replace(/(^|\/)index\.html$/, '$1')}`;
}

/** The built file a URL path resolves to, or null. */
function resolveFile(rootDir: string, pathname: string, base: string): string | null {
  const rel = decodeURIComponent(pathname.slice(base.length));
  const candidate = join(rootDir, rel);
  try {
    const info = statSync(candidate);
    if (info.isFile()) return candidate;
    if (info.isDirectory()) {
      const index = join(candidate, 'index.html');
      return statSync(index).isFile() ? index : null;
    }
  } catch {
    return null;
  }
  return null;
}

export function checkBuiltSite(rootDir: string, basePath: string): { problems: LinkProblem[]; pages: number; references: number } {
  const base = basePath.endsWith('/') ? basePath : `${basePath}/`;
  const files = htmlFiles(rootDir);
  const idCache = new Map<string, Set<string>>();
  const idsOf = (file: string) => {
    let ids = idCache.get(file);
    if (!ids) {
      ids = new Set(tagsOf(readFileSync(file, 'utf8')).flatMap((t) => [t.attrs.get('id'), t.tag === 'a' ? t.attrs.get('name') : undefined]).filter((v): v is string => !!v));
      idCache.set(file, ids);
    }
    return ids;
  };
  const problems: LinkProblem[] = [];
  let references = 0;
  for (const file of files) {
    const page = relative(rootDir, file).split(sep).join('/');
    const here = pageUrl(rootDir, file, base);
    for (const { tag, attrs } of tagsOf(readFileSync(file, 'utf8'))) {
      for (const [attribute, raw] of attrs) {
        if (!LINK_ATTRS.has(attribute)) continue;
        if (tag === 'link' && attrs.get('rel') === 'icon' && raw.startsWith('data:')) continue;
        const value = raw.trim();
        if (!value || /^(data|blob|mailto|tel|javascript):/i.test(value)) continue;
        references++;
        const report = (reason: string) => problems.push({ page, attribute: `${tag}[${attribute}]`, value, reason });
        let url: URL;
        try {
          url = new URL(value, here);
        } catch {
          report('not a valid URL');
          continue;
        }
        if (url.origin !== ORIGIN) {
          if (tag !== 'a' || attribute !== 'href') report('resource from outside the site’s origin');
          continue;
        }
        if (!url.pathname.startsWith(base)) {
          report(`outside the base path ${base}`);
          continue;
        }
        const target = resolveFile(rootDir, url.pathname, base);
        if (!target) {
          report('no built file at this path');
          continue;
        }
        const fragment = decodeURIComponent(url.hash.slice(1));
        if (fragment && target.endsWith('.html') && !idsOf(target).has(fragment)) report(`no element with id "${fragment}" on the target page`);
      }
    }
  }
  return { problems, pages: files.length, references };
}
