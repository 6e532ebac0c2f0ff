/**
 * Formula definitions: the LaTeX a page shows and the function calc/ evaluates, in one object.
 * A page renders `latex` with KaTeX at build time; calculators evaluate through `evaluate`
 * (which calls the same exported function the library uses), and tests/calc/formulas.test.ts
 * checks every formula against its own worked example and against the calculators that show it.
 */
export interface FormulaSymbol {
  /** LaTeX of the symbol as it appears in `latex`. */
  symbol: string;
  meaning: string;
  /** Unit, or '' for a pure number. */
  unit: string;
}

export interface FormulaExample {
  args: Record<string, number>;
  expected: number;
  /** Absolute tolerance on `expected`. */
  tolerance: number;
  /** Where `expected` comes from (book, standard, worked example…). */
  source: string;
}

export interface FormulaDef {
  kind: 'formula';
  /** Stable id, kebab-case; anchors on the formula reference page use it. */
  id: string;
  title: string;
  /** Display-mode LaTeX. */
  latex: string;
  symbols: FormulaSymbol[];
  /** When the relation holds (in words). */
  validity: string;
  /** Published source of the relation. */
  source: string;
  /** Argument names of `evaluate`, with units in the names (e.g. frequencyHz). */
  argNames: string[];
  /** Evaluates the formula's left-hand side from named arguments. */
  evaluate: (args: Record<string, number>) => number;
  example: FormulaExample;
}

/** Declares a formula (identity, typed). */
export function defineFormula(def: Omit<FormulaDef, 'kind'>): FormulaDef {
  return { kind: 'formula', ...def };
}

/** True when a value is a FormulaDef (used to collect every formula exported by calc/). */
export function isFormulaDef(value: unknown): value is FormulaDef {
  return typeof value === 'object' && value !== null && (value as { kind?: unknown }).kind === 'formula';
}
