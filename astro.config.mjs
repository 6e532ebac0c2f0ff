// Static build. BASE sets the sub-path the site is served under (e.g. BASE=/rf/ npm run build).
import { defineConfig } from 'astro/config';
import svelte from '@astrojs/svelte';
import mdx from '@astrojs/mdx';
import { searchIndex } from './scripts/searchIndexIntegration.ts';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';
import { KATEX_OPTIONS, rehypeFailOnKatexError } from './components/astro/mathRendering.ts';

const base = process.env.BASE || '/';

export default defineConfig({
  srcDir: './site',
  publicDir: './public',
  outDir: process.env.OUT_DIR || './dist',
  base,
  trailingSlash: 'ignore',
  output: 'static',
  integrations: [svelte(), mdx(), searchIndex()],
  // Inline $…$ and display $$…$$ maths in Markdown/MDX, rendered to HTML by KaTeX at build time;
  // any KaTeX error (strict mode included) fails the build (components/astro/mathRendering.ts).
  markdown: { remarkPlugins: [remarkMath], rehypePlugins: [[rehypeKatex, KATEX_OPTIONS], rehypeFailOnKatexError] },
  build: { format: 'directory', inlineStylesheets: 'never' },
  devToolbar: { enabled: false },
  prefetch: false,
});
