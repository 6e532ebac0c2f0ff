import { describe, expect, it } from 'vitest';
import { calculatorIslands } from '../../site/lib/islands';
import { calculatorFactories } from '../../calc/calculators';
import { calculators } from '../../site/nav';
import { embedPath, embedSnippet } from '../../site/lib/embed';
import { calculatorPagePath } from '../../site/lib/formulaReference';

describe('calculator islands mapping (site/lib/islands.ts)', () => {
  it('lists only registered calculators', () => {
    for (const id of Object.keys(calculatorIslands)) expect(Object.keys(calculatorFactories), id).toContain(id);
  });
  it('has an island (so an embed route) for every calculator page in the navigation', () => {
    const withIsland = Object.keys(calculatorIslands).map(calculatorPagePath);
    for (const c of calculators) expect(withIsland, c.path).toContain(c.path);
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
