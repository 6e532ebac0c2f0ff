/**
 * The contract between calc/ and the calculator frame.
 *
 * A calculator is a pure function from validated inputs (SI units inside: Hz, m, and degrees
 * at the boundary for angles) to numeric outputs plus warnings, described by metadata: its
 * parameters (name, unit, default, allowed range, description), its outputs (unit kind and
 * precision) and its formulas. The frame builds fields, URL state and Markdown from this
 * metadata; nothing else about a calculator is known to the frame.
 */
import type { CalcWarning } from './warnings';
import type { FormulaDef } from './formula';
import type { NavPlacement, SafetyNote } from './calculatorListing';

/** Physical kinds that the frame knows how to parse and format. */
export type QuantityKind =
  | 'frequency' // Hz
  | 'length' // m (a field may also accept wavelengths)
  | 'angle' // degrees
  | 'decibel' // dB (gain, loss, a signed change…)
  | 'levelBelowPeak' // dB relative to a peak, ≤ 0 (sidelobe level, edge taper): −30 dB is 30 dB below the peak
  | 'power' // W (accepts dBm, dBW)
  | 'powerDensity' // W/m²
  | 'number' // a pure number (ratio, permittivity, exponent…)
  | 'count'; // a whole number

export interface NumberParamSpec {
  kind: QuantityKind;
  /** URL query key: short, lower-case, stable across versions. */
  key: string;
  /** Name of the input in calc/, with its unit (e.g. frequencyHz). */
  name: string;
  /** Visible label (the unit is shown beside it by the frame). */
  label: string;
  /** Default as text with unit, as a user would type it (e.g. '10 GHz'); '' when optional and empty. */
  defaultText: string;
  /** Inclusive limits in internal units (Hz, m, deg, dB, W…). */
  min: number;
  max: number;
  /** Whether min itself is excluded (e.g. frequency > 0). */
  minExclusive?: boolean;
  /** May be left empty. */
  optional?: boolean;
  /** Length given in wavelengths ("0.5 λ") is allowed; names the input whose wavelength is meant. */
  wavelengthFrom?: 'design' | 'highest';
  /** Used only when a choice field has one of these values (the frame says "Not used" otherwise). */
  usedWhen?: UsedWhen;
  description: string;
}

/** The choice field (by URL key) and its values under which a parameter is read by compute. */
export interface UsedWhen {
  key: string;
  values: string[];
}

export interface ChoiceParamSpec {
  kind: 'choice';
  key: string;
  name: string;
  label: string;
  options: { value: string; label: string }[];
  defaultText: string;
  usedWhen?: UsedWhen;
  description: string;
}

export type ParamSpec = NumberParamSpec | ChoiceParamSpec;

/** Validated inputs: numbers in internal units (null for an empty optional field), choices as strings. */
export type CalcInputs = Record<string, number | string | null>;

export interface OutputSpec {
  key: string;
  label: string;
  kind: QuantityKind | 'percent' | 'ratio';
  /** Significant digits for display (decibels show two decimals unless `decimals` says otherwise). */
  digits: number;
  /**
   * Decimals of a decibel output, where the model supports fewer than the usual two (a
   * rule-of-thumb figure or a value transcribed from a published table: 1).
   */
  decimals?: number;
  /** Display unit where the kind alone does not say it: 'dBi', 'dBd', 'λ₀', 'm²'… */
  unit?: string;
  /** Short note on how the value is found, shown as a tooltip/description. */
  description?: string;
  /**
   * Smallest magnitude the model resolves, in the output's internal unit (e.g. 1e-3 for an
   * angle in degrees found by root-finding to 1e-6 rad). Smaller values are numerical noise and
   * are shown as 0; the value calc/ returns is not changed.
   */
  resolution?: number;
}

export interface CalcResult<Data = unknown> {
  /** Output values by OutputSpec key; null when an output does not apply to these inputs. */
  values: Record<string, number | null>;
  warnings: CalcWarning[];
  /** Series for plots and tables, calculator-specific. */
  data: Data;
}

/** How a displayed formula ties to a calculator output (checked by tests). */
export interface FormulaLink {
  formula: FormulaDef;
  /** Output key whose value the formula gives. */
  output: string;
  /** Arguments for formula.evaluate taken from the inputs and outputs. */
  args: (inputs: CalcInputs, values: Record<string, number | null>) => Record<string, number> | null;
}

export interface CalculatorDef<Data = unknown> {
  /** Route slug, e.g. 'wavelength-spacing'. */
  id: string;
  title: string;
  /** One sentence: what question the calculator answers. */
  purpose: string;
  /** One line for the navigation and the home page: what the page covers. */
  summary: string;
  /** Place in the site navigation. */
  nav: NavPlacement;
  /** Safety note shown above the calculator on its page and on its embed route. */
  safety: SafetyNote;
  /** Whether the calculator has an embed route and an "Embed this" snippet (its island must be in components/calculators/islands.ts). */
  embed: boolean;
  /** Current URL schema version (the `v` key). */
  schemaVersion: number;
  /**
   * Upgraders for links made with older versions: migrations[n] turns a version-n query
   * (key → text) into a version-(n+1) query. Version 1 links must keep opening.
   */
  migrations: Record<number, (query: Record<string, string>) => Record<string, string>>;
  params: ParamSpec[];
  outputs: OutputSpec[];
  formulas: FormulaLink[];
  /** Assumptions and validity limits, one sentence each. */
  assumptions: string[];
  /** Published references for the page. */
  references: string[];
  /**
   * Worked examples from the team's own scenarios (demo data): a title and a query string.
   * Tests run each one (formula links, finiteness); every calculator page lists them (CalculatorPage.astro)
   * and guide pages may preset a calculator to one.
   */
  examples: { title: string; query: string }[];
  /** Path of the calc/ module, shown on the page. */
  sourcePath: string;
  compute: (inputs: CalcInputs) => CalcResult<Data>;
}
