/**
 * Reference cases: checks of calc/ against something outside the project (a book, a standard, a
 * SciPy fixture, a hand-worked example), kept as data so that one list feeds both the test suite
 * (tests/reference/referenceCases.test.ts) and the Verification record page, which shows each
 * case's source, expected value, tolerance and the value the code computes at build time.
 *
 * A value copied into calc/ from a source (a table entry) is not checked by comparing the code with
 * itself: it is a `TranscribedValue` (verification/reference/transcribed.ts), listed apart and never counted
 * as a passed check.
 */
import { QUANTITY_UNITS, type Quantity } from './quantity';

export interface ReferenceCase {
  /** Stable id, unique across all cases. */
  id: string;
  /** Short statement of what is checked. */
  title: string;
  /** Where the expected value comes from (book + edition + section, standard, script, "common practice, no source"). */
  source: string;
  expected: number;
  /** Absolute tolerance, in the quantity's unit. */
  tolerance: number;
  /** What is compared; its unit (QUANTITY_UNITS) is the unit of expected, tolerance and computed value. */
  quantity: Quantity;
  /**
   * Where the compared value comes from: the calc/ function or result property that compute reads
   * (its unit suffix must agree with `quantity`), or `<calculator-id>#<output key>` for a formula's
   * worked example (the output's OutputSpec gives the quantity). Checked by tests/reference/quantity.test.ts.
   */
  reads: string;
  /** Computes the value with calc/. */
  compute: () => number;
}

export interface ReferenceGroup {
  /** Topic heading, e.g. 'Wavelength and grating lobes'. */
  topic: string;
  /** calc/ module(s) the cases exercise. */
  modules: string[];
  cases: ReferenceCase[];
}

/** Unit of a case's expected, tolerance and computed values ('' for a pure number). */
export function caseUnit(c: Pick<ReferenceCase, 'quantity'>): string {
  return QUANTITY_UNITS[c.quantity];
}

/** Outcome of one case. */
export interface ReferenceOutcome {
  computed: number;
  error: number;
  pass: boolean;
}

export function runReferenceCase(c: ReferenceCase): ReferenceOutcome {
  const computed = c.compute();
  const error = Math.abs(computed - c.expected);
  return { computed, error, pass: Number.isFinite(computed) && error <= c.tolerance };
}
