import { describe, expect, it } from 'vitest';
import * as formulas from '../../../calc/reflectorFormulas';
import { isFormulaDef } from '../../../calc/formula';

const all = Object.values(formulas).filter(isFormulaDef);

describe('reflector formulas reproduce their own worked examples (sources in each example)', () => {
  it('exports at least the eleven reflector formulas the page shows (the far-field distance lives in calc/aperture/formulas.ts), with unique ids', () => {
    expect(all.length).toBeGreaterThanOrEqual(11);
    expect(new Set(all.map((f) => f.id)).size).toBe(all.length);
  });
  for (const f of all) {
    it(`${f.id}: ${f.example.source}`, () => {
      expect(Object.keys(f.example.args).sort()).toEqual([...f.argNames].sort());
      expect(Math.abs(f.evaluate(f.example.args) - f.example.expected)).toBeLessThanOrEqual(f.example.tolerance);
    });
  }
});
