/** Renders CHANGELOG.md (repository root) to HTML at build time, with Astro's own Markdown pipeline. */
import { readFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import { createMarkdownProcessor } from '@astrojs/markdown-remark';

export const CHANGELOG_PATH = resolve(process.cwd(), 'CHANGELOG.md');

export interface RenderedChangelog {
  html: string;
  /** Release headings (## level), e.g. "[0.1.0] — 2026-12-02", with their anchor ids. */
  releases: { id: string; text: string }[];
}

/** Renders Markdown text; the first # heading is dropped (the page supplies its own title). */
export async function renderChangelog(markdown: string): Promise<RenderedChangelog> {
  const processor = await createMarkdownProcessor({ syntaxHighlight: false });
  const body = markdown.replace(/^# .*\n/, '');
  const { code, metadata } = await processor.render(body);
  return {
    html: code,
    releases: metadata.headings.filter((h) => h.depth === 2).map((h) => ({ id: h.slug, text: h.text })),
  };
}

export async function readChangelog(): Promise<RenderedChangelog> {
  return renderChangelog(await readFile(CHANGELOG_PATH, 'utf8'));
}
