import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { glossary } from '../../site/lib/glossary';
import { calculatorFactories } from '../../calc/calculators';
import { calculators, docs } from '../../site/nav';
import { guideSections } from '../../site/guide';

describe('glossary data (site/lib/glossary.ts)', () => {
  it('has unique ids and terms', () => {
    expect(new Set(glossary.map((t) => t.id)).size).toBe(glossary.length);
    expect(new Set(glossary.map((t) => t.term.toLowerCase())).size).toBe(glossary.length);
  });
  it('names only registered calculators', () => {
    for (const t of glossary) for (const id of t.calculators ?? []) expect(Object.keys(calculatorFactories), `${t.id} → ${id}`).toContain(id);
  });
  it('points "see" links at pages that exist in the navigation or the guide (fragments are checked on the built site)', () => {
    const pages = new Set([...calculators, ...docs, ...guideSections].map((e) => e.path));
    for (const t of glossary) for (const s of t.see ?? []) expect(pages.has(s.path.split('#')[0]), `${t.id} → ${s.path}`).toBe(true);
  });
});

describe('guide sections (site/guide.ts)', () => {
  it('lists exactly the MDX pages under site/pages/guide/', () => {
    const files = readdirSync('site/pages/guide').filter((f) => f.endsWith('.mdx')).map((f) => `guide/${f.replace(/\.mdx$/, '')}/`).sort();
    expect(guideSections.map((s) => s.path).sort()).toEqual(files);
  });
});
