/**
 * Data for the Formula reference page: every formula in the catalog, with the calculators that
 * show it. Pure (no Astro), so tests/site/formulaReference.test.ts checks it lists exactly the
 * catalog.
 */
import type { CalculatorDef } from '../../calc/calculator';
import type { FormulaDef } from '../../calc/formula';
import type { TeamConventions } from '../../calc/teamConventions';

export interface FormulaUse {
  calculatorId: string;
  calculatorTitle: string;
  /** Site path of the calculator page, or null when the calculator has no published page yet. */
  pagePath: string | null;
  /** Output keys of the calculator that the formula gives. */
  outputs: string[];
}

export interface FormulaReferenceEntry {
  formula: FormulaDef;
  usedBy: FormulaUse[];
}

export interface FormulaReference {
  entries: FormulaReferenceEntry[];
  /** Formula ids a calculator shows that are missing from the catalog (should be empty). */
  notInCatalog: string[];
}

/** Site path of a calculator's page by id. */
export function calculatorPagePath(id: string): string {
  return `calculators/${id}/`;
}

/**
 * Joins the catalog with the calculators that display each formula.
 * `publishedPaths`: site paths that exist (from site/nav.ts), so unpublished calculators are not linked.
 */
export function buildFormulaReference(
  catalog: FormulaDef[],
  factories: Record<string, (c: TeamConventions) => CalculatorDef<unknown>>,
  conventions: TeamConventions,
  publishedPaths: string[],
): FormulaReference {
  const published = new Set(publishedPaths);
  const catalogIds = new Set(catalog.map((f) => f.id));
  const uses = new Map<string, FormulaUse[]>();
  const notInCatalog = new Set<string>();
  for (const [id, factory] of Object.entries(factories)) {
    const def = factory(conventions);
    const outputsByFormula = new Map<string, string[]>();
    for (const link of def.formulas) {
      if (!catalogIds.has(link.formula.id)) notInCatalog.add(link.formula.id);
      outputsByFormula.set(link.formula.id, [...(outputsByFormula.get(link.formula.id) ?? []), link.output]);
    }
    const path = calculatorPagePath(id);
    for (const [formulaId, outputs] of outputsByFormula) {
      const use: FormulaUse = { calculatorId: id, calculatorTitle: def.title, pagePath: published.has(path) ? path : null, outputs };
      uses.set(formulaId, [...(uses.get(formulaId) ?? []), use]);
    }
  }
  return {
    entries: catalog.map((formula) => ({ formula, usedBy: uses.get(formula.id) ?? [] })),
    notInCatalog: [...notInCatalog].sort(),
  };
}
