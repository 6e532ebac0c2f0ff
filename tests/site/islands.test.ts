import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { calculatorIslands } from '../../site/lib/islands';
import { calculatorCautions, RF_EXPOSURE_CAUTION } from '../../site/lib/cautions';
import { EXPOSURE_CAUTION } from '../../calc/calculators/rangeExposure';
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

describe('safety notes (site/lib/cautions.ts)', () => {
  it('a calculator page passes its own safety note only when it is the shared one, so the embed shows the same', () => {
    for (const id of Object.keys(calculatorIslands)) {
      const page = readFileSync(`site/pages/calculators/${id}.astro`, 'utf8');
      if (/\bsafety=\{/.test(page)) expect(id in calculatorCautions, `${id} passes a safety note missing from cautions.ts`).toBe(true);
    }
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
