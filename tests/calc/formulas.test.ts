import { describe, expect, it } from 'vitest';
import katex from 'katex';
import { formulaCatalog } from '../../calc/formulaCatalog';
import { calculatorFactories } from '../../calc/calculators';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { decodeState } from '../../components/frame/urlState';
import { teamConventions } from '../../site/conventions';

// Ties each displayed formula to the function it names: worked example per formula, and the
// calculators' outputs equal formula.evaluate on the same inputs.
describe('formula catalog', () => {
  it('each displayed relation has one home: no two catalog formulas share their LaTeX (spaces and braces ignored)', () => {
    const key = (latex: string) => latex.replace(/[\s{}]/g, '');
    const byLatex = new Map<string, string[]>();
    for (const f of formulaCatalog) byLatex.set(key(f.latex), [...(byLatex.get(key(f.latex)) ?? []), f.id]);
    expect([...byLatex.values()].filter((ids) => ids.length > 1)).toEqual([]);
  });
  it('holds formulas with unique ids', () => {
    expect(formulaCatalog.length).toBeGreaterThan(0);
    const ids = formulaCatalog.map((f) => f.id);
    expect(new Set(ids).size).toBe(ids.length);
  });
  for (const formula of formulaCatalog) {
    describe(formula.id, () => {
      it('renders with KaTeX without error, and every listed symbol appears in it', () => {
        expect(() => katex.renderToString(formula.latex, { displayMode: true, throwOnError: true })).not.toThrow();
        for (const s of formula.symbols) {
          expect(() => katex.renderToString(s.symbol, { throwOnError: true })).not.toThrow();
          expect(formula.latex.includes(s.symbol), `symbol ${s.symbol} in ${formula.latex}`).toBe(true);
        }
      });
      it(`evaluates its worked example (${formula.example.source})`, () => {
        expect(Object.keys(formula.example.args).sort()).toEqual([...formula.argNames].sort());
        const value = formula.evaluate(formula.example.args);
        expect(Math.abs(value - formula.example.expected)).toBeLessThanOrEqual(formula.example.tolerance);
      });
      it('names a source and a validity range', () => {
        expect(formula.source.length).toBeGreaterThan(10);
        expect(formula.validity.length).toBeGreaterThan(10);
      });
    });
  }
});

describe('calculators show formulas that give their outputs', () => {
  for (const [id, factory] of Object.entries(calculatorFactories)) {
    it(`${id}: every linked formula reproduces its output at the defaults and in every worked example`, () => {
      const def = factory(teamConventions);
      const states = [defaultTexts(def), ...def.examples.map((e) => {
        const decoded = decodeState(def, e.query);
        expect(decoded.notices, e.title).toEqual([]);
        return decoded.texts;
      })];
      const seen = new Set<string>();
      let checked = 0;
      for (const texts of states) {
      const { inputs } = validateAll(def, texts);
      expect(inputs).not.toBeNull();
      const result = def.compute(inputs!);
      for (const value of Object.values(result.values)) if (value !== null) expect(Number.isFinite(value)).toBe(true);
      for (const link of def.formulas) {
        const args = link.args(inputs!, result.values);
        if (!args) continue;
        const expected = result.values[link.output];
        expect(expected, `${link.formula.id} → ${link.output}`).not.toBeNull();
        const value = link.formula.evaluate(args);
        expect(Math.abs(value - (expected as number))).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected as number)));
        seen.add(link.formula.id);
        checked++;
      }
      }
      expect(checked).toBeGreaterThan(0);
      // every displayed formula is exercised by at least one state
      expect([...seen].sort()).toEqual([...new Set(def.formulas.map((l) => l.formula.id))].sort());
    });
    it(`${id}: every formula it shows is in the catalog (exported from calc/index.ts)`, () => {
      const def = factory(teamConventions);
      const ids = new Set(formulaCatalog.map((f) => f.id));
      for (const link of def.formulas) expect(ids.has(link.formula.id), link.formula.id).toBe(true);
    });
  }
});
