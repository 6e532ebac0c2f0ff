import { describe, expect, it } from 'vitest';
import { formulaCatalog } from '../../calc/formulaCatalog';
import { calculatorFactories } from '../../calc/calculators';
import { teamConventions } from '../../site/conventions';
import { calculators } from '../../site/nav';
import { buildFormulaReference, calculatorPagePath } from '../../site/lib/formulaReference';
import { defineFormula } from '../../calc/formula';
import type { CalculatorDef } from '../../calc/calculator';

const reference = buildFormulaReference(formulaCatalog, calculatorFactories, teamConventions, calculators.map((c) => c.path));

describe('formula reference data (site/lib/formulaReference.ts)', () => {
  it('lists exactly the catalog formulas, once each, in catalog order', () => {
    expect(reference.entries.map((e) => e.formula.id)).toEqual(formulaCatalog.map((f) => f.id));
  });

  it('every formula a calculator shows is in the catalog (exported through calc/index.ts)', () => {
    expect(reference.notInCatalog).toEqual([]);
  });

  it('links each formula to every calculator that shows it, with the outputs it gives', () => {
    for (const [id, factory] of Object.entries(calculatorFactories)) {
      const def = factory(teamConventions);
      for (const link of def.formulas) {
        const entry = reference.entries.find((e) => e.formula.id === link.formula.id)!;
        const use = entry.usedBy.find((u) => u.calculatorId === id);
        expect(use, `${link.formula.id} used by ${id}`).toBeDefined();
        expect(use!.outputs).toContain(link.output);
      }
    }
  });

  it('links only calculators whose page is published in the navigation', () => {
    for (const e of reference.entries) {
      for (const u of e.usedBy) {
        const published = calculators.some((c) => c.path === calculatorPagePath(u.calculatorId));
        expect(u.pagePath !== null, `${u.calculatorId}`).toBe(published);
      }
    }
  });

  it('reports a formula a calculator shows but the catalog lacks', () => {
    const stray = defineFormula({ ...formulaCatalog[0], id: 'stray-formula' });
    const fake = (): CalculatorDef<unknown> => ({ ...calculatorFactories['wavelength-spacing'](teamConventions), id: 'fake', formulas: [{ formula: stray, output: 'x', args: () => null }] });
    const r = buildFormulaReference(formulaCatalog, { fake }, teamConventions, []);
    expect(r.notInCatalog).toEqual(['stray-formula']);
    expect(r.entries.every((e) => e.usedBy.length === 0)).toBe(true);
  });
});
