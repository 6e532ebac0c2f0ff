/** Test harness: architecture sizing at its defaults with some fields overridden (texts as typed). */
import { createArchitectureSizingCalculator, computeArchitectureSizing } from '../../../calc/calculators/architectureSizing';
import { defaultTexts, validateAll } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';

export const sizingDef = createArchitectureSizingCalculator(teamConventions);

/** Sizes every candidate for the default requirement with `over` (key → text) applied. */
export function runSizing(over: Record<string, string>) {
  const { inputs } = validateAll(sizingDef, { ...defaultTexts(sizingDef), ...over });
  if (!inputs) throw new Error('invalid test inputs');
  return computeArchitectureSizing(inputs);
}

/** One candidate of runSizing(over) by id. */
export const sizingCandidate = (over: Record<string, string>, id: string) => runSizing(over).data.candidates.find((c) => c.id === id)!;
