import { describe, expect, it } from 'vitest';
import { calculatorFactories } from '../../calc/calculators/index';
import { teamConventions } from '../../site/conventions';
import { validateField } from '../../components/frame/calculatorModel';
import type { NumberParamSpec } from '../../calc/calculator';

// One convention for levels below the peak on every page: negative dB relative to the peak, dB only,
// the other sign accepted with a note (never flipped silently). Common practice, no source.
const defs = Object.values(calculatorFactories).map((make) => make(teamConventions));
const numberParams = defs.flatMap((def) => def.params.filter((p): p is NumberParamSpec => p.kind !== 'choice').map((p) => ({ def, p })));
const LEVEL_WORDS = /sidelobe|edge taper|edge level/i;

describe('levels below the peak: one convention on every calculator', () => {
  it('every input that is a sidelobe level, an edge taper or an edge level uses the levelBelowPeak field kind', () => {
    const levels = numberParams.filter(({ p }) => LEVEL_WORDS.test(p.label));
    expect(levels.map(({ def, p }) => `${def.id}:${p.key}`).sort()).toEqual(['architecture-sizing:sll', 'array-explorer:edge', 'array-explorer:sll', 'front-fed-reflector:et']);
    for (const { def, p } of levels) expect(p.kind, `${def.id}:${p.key}`).toBe('levelBelowPeak');
  });

  for (const { def, p } of numberParams.filter(({ p }) => p.kind === 'levelBelowPeak')) {
    it(`${def.id} ${p.key}: range ≤ 0 dB; −x dB and x dB are the same level, the second with a note; dBi rejected`, () => {
      expect(p.max).toBeLessThanOrEqual(0);
      const level = Math.max(p.min, Math.min(p.max, -20));
      const negative = validateField(p, `${level} dB`);
      const positive = validateField(p, `${-level} dB`);
      expect(negative.ok && negative.value).toBe(level);
      expect(positive.ok && positive.value).toBe(level);
      expect(negative.ok && negative.note).toBeUndefined();
      expect(positive.ok && positive.note).toMatch(/entered as a depth: read as −/);
      expect(validateField(p, `${-level} dBi`).ok).toBe(false);
    });
  }

  it('the explorer computes the same Taylor array from sll = 30 dB (a depth) and sll = −30 dB', () => {
    const def = calculatorFactories['array-explorer'](teamConventions);
    const base = Object.fromEntries(def.params.map((p) => [p.key, p.defaultText]));
    const run = (sll: string) => {
      const texts: Record<string, string> = { ...base, geo: 'linear', nx: '16', tap: 'taylor', sll, el: 'isotropic' };
      const inputs = Object.fromEntries(def.params.map((p) => {
        const s = validateField(p, texts[p.key], [10e9]);
        if (!s.ok) throw new Error(`${p.key}: ${s.message}`);
        return [p.name, s.value];
      }));
      return def.compute(inputs).values;
    };
    const a = run('-30 dB');
    const b = run('30 dB');
    expect(a.sidelobeDb).toBeCloseTo(-30, 1); // a 16-element Taylor n̄ = 5 line reaches about its design level
    expect(b).toEqual(a);
  });
});
