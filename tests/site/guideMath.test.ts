import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import katex from 'katex';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';
import { createMarkdownProcessor } from '@astrojs/markdown-remark';
import { describe, expect, it } from 'vitest';
import { CONTROL_CHARACTER, KATEX_OPTIONS, rehypeFailOnKatexError, renderFormulaLatex } from '../../components/astro/mathRendering';
import { formulaCatalog } from '../../calc/formulaCatalog';

const GUIDE = 'site/pages/guide';
const guideFiles = readdirSync(GUIDE).filter((f) => f.endsWith('.mdx'));

/** Every $$…$$ and $…$ in an MDX text (display first, so its dollars are not read as inline ones). */
export function extractMaths(text: string): { tex: string; display: boolean }[] {
  const out: { tex: string; display: boolean }[] = [];
  const rest = text.replace(/\$\$([\s\S]+?)\$\$/g, (_, tex: string) => {
    out.push({ tex: tex.trim(), display: true });
    return ' ';
  });
  for (const m of rest.matchAll(/\$([^$\n]+?)\$/g)) out.push({ tex: m[1], display: false });
  return out;
}

/** Source files under these folders that may hold LaTeX (in MDX or in JS/TS strings). */
function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(p);
    return /\.(ts|mdx|astro|svelte|md)$/.test(e.name) ? [p] : [];
  });
}

describe('maths in the guide (site/pages/guide/*.mdx) renders with KaTeX in strict mode', () => {
  for (const file of guideFiles) {
    it(`${file}: every $…$ and $$…$$ renders without a KaTeX error`, () => {
      const maths = extractMaths(readFileSync(join(GUIDE, file), 'utf8'));
      for (const { tex, display } of maths) {
        expect(() => katex.renderToString(tex, { ...KATEX_OPTIONS, displayMode: display }), tex).not.toThrow();
      }
    });
  }

  it('every formula of the catalog (rendered by components/astro/Formula.astro) passes the same strict options', () => {
    for (const f of formulaCatalog) {
      expect(() => katex.renderToString(f.latex, { ...KATEX_OPTIONS, displayMode: true }), f.id).not.toThrow();
      for (const s of f.symbols) expect(() => katex.renderToString(s.symbol, KATEX_OPTIONS), `${f.id}: ${s.symbol}`).not.toThrow();
    }
  });

  it('no source file holds a control character (a lost backslash, e.g. "\\a" in a JS string, becomes BEL)', () => {
    const files = ['site', 'components', 'calc', 'tests', 'verification', 'scripts'].flatMap(sourceFiles);
    const bad = files.filter((f) => CONTROL_CHARACTER.test(readFileSync(f, 'utf8')));
    expect(bad).toEqual([]);
  });

  it('no formula LaTeX holds a character a lost backslash makes in a JS string (\\t, \\n, \\r, \\v, \\f, \\b, \\a)', () => {
    // '\theta' in a plain string is TAB + 'heta' and renders without a KaTeX error, so look for the characters.
    for (const f of formulaCatalog) {
      for (const tex of [f.latex, ...f.symbols.map((s) => s.symbol)]) expect(/[\t\n\r\v\f\b\u0007]/.test(tex), `${f.id}: ${JSON.stringify(tex)}`).toBe(false);
    }
  });

  it('renderFormulaLatex (components/astro/Formula.astro) throws on a lost backslash and on a KaTeX error', () => {
    expect(renderFormulaLatex('\\theta_0 \\approx 1', true)).toContain('class="katex');
    expect(() => renderFormulaLatex('\theta_0', true)).toThrow(/control character U\+0009/); // '\t' + "heta_0": KaTeX alone renders it
    expect(() => katex.renderToString('\theta_0', KATEX_OPTIONS)).not.toThrow();
    expect(() => renderFormulaLatex('D \u0007pprox 1', false)).toThrow(/U\+0007/);
    expect(() => renderFormulaLatex('\\notacommand', false)).toThrow();
  });

  it('the extractor finds the maths it should (inline and display)', () => {
    expect(extractMaths('a $x$ b\n$$\ny = 2\n$$\n')).toEqual([{ tex: 'y = 2', display: true }, { tex: 'x', display: false }]);
  });
});

describe('the build’s Markdown pipeline fails on a KaTeX error (astro.config.mjs plugins)', () => {
  const processor = () => createMarkdownProcessor({ remarkPlugins: [remarkMath], rehypePlugins: [[rehypeKatex, KATEX_OPTIONS], rehypeFailOnKatexError], syntaxHighlight: false });

  it('renders a good formula', async () => {
    const { code } = await (await processor()).render('Gain $D \\approx 4L/\\lambda$.');
    expect(code).toContain('class="katex"');
    expect(code).not.toContain('katex-error');
  });

  it('throws on a control character where a backslash was lost (BEL + "pprox")', async () => {
    await expect((await processor()).render('Gain $D \u0007pprox 4L/\\lambda$.')).rejects.toThrow(/KaTeX/);
  });

  it('throws on an unknown command', async () => {
    await expect((await processor()).render('$$\n\\notacommand{x}\n$$')).rejects.toThrow(/KaTeX/);
  });

  it('throws on a strict-mode complaint (Unicode text in maths)', async () => {
    await expect((await processor()).render('$x = é$')).rejects.toThrow(/KaTeX/);
  });
});
