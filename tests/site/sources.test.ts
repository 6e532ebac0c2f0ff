import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// Citations in code, comments and test titles: one title and edition for IEEE Std 149, no document
// outside the repository, and every textbook section, chapter, table or equation number either
// verified or marked "(… number from memory)". None is verified against the book here, so all are marked.

const SELF = 'tests/site/sources.test.ts';
function files(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = join(dir, e.name);
    if (e.isDirectory()) return files(p);
    return /\.(ts|svelte|astro|mdx|py|mjs)$/.test(e.name) && p !== SELF ? [p] : [];
  });
}
const sources = ['calc', 'components', 'site', 'tests', 'verification', 'scripts', 'bench'].flatMap(files).map((f) => ({ f, text: readFileSync(f, 'utf8') }));

/** Citation numbers that need a "(… number from memory)" mark: §, ch., Table, eq., Fig. */
const NUMBERED = /(§\s?\d[\d.]*(?:[–-]\d[\d.]*)?(?:\s(?:and|\/)\s§\d[\d.]*)?|\bch\.\s\d+(?:[–-]\d+|\sand\s\d+)?|\b[Cc]hapter\s\d+|\bTable\s\d[\d.]*|\b[Ee]qs?\.\s?\(\d+[a-z]?\)|\b[Ee]qs?\.\s\d[\d.-]*\d|\bFig\.\s\d[\d.]*)/g;

describe('citations in the sources', () => {
  it('IEEE Std 149 is always "IEEE Std 149-2021, IEEE Recommended Practice for Antenna Measurements"', () => {
    const bad = sources.flatMap(({ f, text }) => [...text.matchAll(/IEEE Std 149\b.{0,70}/g)].filter((m) => !m[0].startsWith('IEEE Std 149-2021, IEEE Recommended Practice for Antenna Measurements')).map((m) => `${f}: ${m[0]}`));
    expect(bad).toEqual([]);
  });

  it('no file cites a document outside the repository (internal notes, style notes)', () => {
    const bad = sources.filter(({ text }) => /DOMAIN\.md|STYLE\.md|\/work\/shared|notes file/.test(text)).map(({ f }) => f);
    expect(bad).toEqual([]);
  });

  it('every section, chapter, table or equation number is marked "number from memory" (none verified here)', () => {
    const bad = sources.flatMap(({ f, text }) =>
      [...text.matchAll(NUMBERED)]
        .filter((m) => !/^§\s?1\.1310/.test(m[0])) // 47 CFR §1.1310 names the rule itself
        .filter((m) => !text.slice(m.index! + m[0].length, m.index! + m[0].length + 90).split('\n')[0].includes('number from memory'))
        .map((m) => `${f}: ${text.slice(Math.max(0, m.index! - 40), m.index! + m[0].length + 20)}`),
    );
    expect(bad).toEqual([]);
  });
});
