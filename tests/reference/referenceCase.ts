/**
 * Reference cases: checks of calc/ against something outside the project (a book, a standard, a
 * SciPy fixture, a hand-worked example), kept as data so that one list feeds both the test suite
 * (tests/reference/referenceCases.test.ts) and the Verification record page, which shows each
 * case's source, expected value, tolerance and the value the code computes at build time.
 */
export interface ReferenceCase {
  /** Stable id, unique across all cases. */
  id: string;
  /** Short statement of what is checked. */
  title: string;
  /** Where the expected value comes from (book + edition + section, standard, script, "common practice, no source"). */
  source: string;
  expected: number;
  /** Absolute tolerance, in `unit`. */
  tolerance: number;
  /** Unit of expected/computed ('' for a pure number). */
  unit: string;
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
