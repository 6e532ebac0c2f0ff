/**
 * How a calculator is listed on the site: its navigation entry, its safety note and whether it
 * can be embedded. These fields sit in each calculator definition (calc/calculators/*.ts) beside
 * its title, purpose and worked examples, so the navigation, the home page, the calculator page,
 * the embed route and the tests all read one registry (calc/calculators/index.ts) and repeat
 * nothing. The caution texts themselves are site copy and live in site/lib/cautions.ts; a
 * definition names which of them apply, in order.
 */

/** A caution shared by several calculators (texts in site/lib/cautions.ts). */
export type SharedCaution =
  /** Transmitting antennas and RF exposure. */
  | 'rfExposure'
  /** Masts, towers and roofs. */
  | 'workAtHeight'
  /** A dish pointed near the sun focuses sunlight on its feed. */
  | 'sunOnFeed';

/** A calculator's safety note: its own opening sentences, then the shared cautions in order. */
export interface SafetyNote {
  /** Sentences of this calculator's own, shown before the shared cautions; '' for none. */
  lead: string;
  /**
   * The shared cautions that apply, in the order shown. Every note then ends with the sentence
   * that defers to local regulations and qualified people.
   */
  cautions: SharedCaution[];
}

/** A calculator's place in the site navigation (the home page lists calculators in the same order). */
export interface NavPlacement {
  /** Position among the calculators: smaller comes first; unique across the registry. */
  order: number;
  /** Shorter name for the navigation, where the title is too long; the title otherwise. */
  label?: string;
}
