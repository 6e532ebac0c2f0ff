import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { calculatorIslands } from '../../site/lib/islands';
import { islandsById } from '../../components/calculators/islands';
import { calculatorCautions, RF_EXPOSURE_CAUTION } from '../../site/lib/cautions';
import { EXPOSURE_CAUTION } from '../../calc/calculators/rangeExposure';
import { calculatorFactories, calculatorsInNavOrder } from '../../calc/calculators';
import { teamConventions } from '../../calc/teamConventions';
import { calculators } from '../../site/nav';
import { embedPath, embedSnippet } from '../../site/lib/embed';
import { calculatorPagePath } from '../../site/lib/formulaReference';

const defs = calculatorsInNavOrder(teamConventions);

describe('calculator islands mapping (components/calculators/islands.ts)', () => {
  it('has an island for every registered calculator, and none for an unknown id', () => {
    expect(Object.keys(islandsById).sort()).toEqual(Object.keys(calculatorFactories).sort());
  });
  it('site/lib/islands.ts keeps exactly the calculators whose definition sets embed (the embed routes)', () => {
    expect(Object.keys(calculatorIslands).sort()).toEqual(defs.filter((d) => d.embed).map((d) => d.id).sort());
    for (const [id, island] of Object.entries(calculatorIslands)) expect(island, id).toBe(islandsById[id]);
  });
  it('has an island (so an embed route) for every calculator page in the navigation', () => {
    const withIsland = Object.keys(calculatorIslands).map(calculatorPagePath);
    for (const c of calculators) expect(withIsland, c.path).toContain(c.path);
  });
});

describe('navigation (site/nav.ts) comes from the registry', () => {
  it('lists every calculator in nav order with its label (or title) and summary', () => {
    expect(calculators).toEqual(defs.map((d) => ({ path: calculatorPagePath(d.id), title: d.nav.label ?? d.title, summary: d.summary })));
  });
  it('each listed calculator has its page', () => {
    for (const d of defs) expect(() => readFileSync(`site/pages/calculators/${d.id}.astro`, 'utf8'), d.id).not.toThrow();
  });
});

describe('calculator pages take their listing from the definition', () => {
  it('the page layout renders the worked examples of every calculator, and no page adds its own list', () => {
    const layout = readFileSync('site/layouts/CalculatorPage.astro', 'utf8');
    expect(layout).toMatch(/def\.examples\.map\(/);
    for (const d of defs) expect(readFileSync(`site/pages/calculators/${d.id}.astro`, 'utf8'), d.id).not.toMatch(/id="examples"|\.examples\b/);
  });
  it('no calculator page passes its own safety note, so the page and the embed route show the same one', () => {
    for (const d of defs) expect(readFileSync(`site/pages/calculators/${d.id}.astro`, 'utf8'), d.id).not.toMatch(/\bsafety=\{/);
  });
  it('the exposure page shows the shared RF-exposure caution, and its results repeat the calc/ caution, which also defers to regulations', () => {
    expect(calculatorCautions['range-exposure']).toContain(RF_EXPOSURE_CAUTION);
    expect(EXPOSURE_CAUTION).toMatch(/local regulations/);
  });
});

describe('embed snippet (site/lib/embed.ts)', () => {
  it('is an iframe on the embed route with the state query, a title, and escaped attributes', () => {
    const url = `https://rf.example/rf/${embedPath('wavelength-spacing')}?v=1&f=9GHz`;
    const html = embedSnippet(url, 'Wavelength & "spacing"');
    expect(html).toContain('src="https://rf.example/rf/embed/wavelength-spacing/?v=1&amp;f=9GHz"');
    expect(html).toContain('title="Wavelength &amp; &quot;spacing&quot; (Dirigo)"');
    expect(html).toMatch(/^<iframe [^>]*><\/iframe>$/);
  });
});
