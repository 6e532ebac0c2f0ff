import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { checkBuiltSite, tagsOf } from '../../scripts/checkLinks';

// A tiny built site with one good and several broken references, served under /rf/.
const root = mkdtempSync(join(tmpdir(), 'dirigo-links-'));
mkdirSync(join(root, 'guide', 'reflectors'), { recursive: true });
mkdirSync(join(root, '_astro'));
writeFileSync(join(root, '_astro', 'app.js'), '');
writeFileSync(join(root, 'guide', 'reflectors', 'index.html'), '<h2 id="feeds">Feeds</h2>');
writeFileSync(
  join(root, 'index.html'),
  `<!-- <a href="/rf/commented-out/">x</a> -->
  <a href="/rf/guide/reflectors/#feeds">ok</a>
  <a href="guide/reflectors/">ok, relative</a>
  <a href="/rf/guide/reflectors/?v=1&amp;f=9GHz">ok, query</a>
  <a href="https://example.org/">outside link, allowed</a>
  <astro-island component-url="/rf/_astro/app.js"></astro-island>
  <a href="/rf/guide/reflector/">typo</a>
  <a href="/rf/guide/reflectors/#feed">missing fragment</a>
  <a href="#top">missing fragment on this page</a>
  <a href="/guide/">escapes the base</a>
  <script src="https://cdn.example.org/x.js"></script>
  <astro-island component-url="/rf/_astro/gone.js"></astro-island>
  <script>const s = '<a href="/rf/inside-script/">';</script>`,
);
afterAll(() => rmSync(root, { recursive: true, force: true }));

describe('link checker (scripts/checkLinks.ts)', () => {
  it('reports each broken internal link, missing fragment, off-base path and outside resource, and nothing else', () => {
    const { problems, pages } = checkBuiltSite(root, '/rf/');
    expect(pages).toBe(2);
    expect(problems.map((p) => `${p.value} — ${p.reason}`).sort()).toEqual(
      [
        '#top — no element with id "top" on the target page',
        '/guide/ — outside the base path /rf/',
        '/rf/_astro/gone.js — no built file at this path',
        '/rf/guide/reflector/ — no built file at this path',
        '/rf/guide/reflectors/#feed — no element with id "feed" on the target page',
        'https://cdn.example.org/x.js — resource from outside the site’s origin',
      ].sort(),
    );
  });

  it('reads attributes in either quote style and decodes entities', () => {
    const [tag] = tagsOf(`<a href='/rf/a/?x=1&amp;y=2' id="k">`);
    expect(tag.attrs.get('href')).toBe('/rf/a/?x=1&y=2');
    expect(tag.attrs.get('id')).toBe('k');
  });
});
