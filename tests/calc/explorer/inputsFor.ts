/** Test helper: validated explorer inputs from field texts over the defaults (as the frame makes them). */
import type { CalcInputs } from '../../../calc/calculator';
import { createArrayExplorerCalculator } from '../../../calc/calculators/arrayExplorer';
import { defaultTexts, validateAll } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';

export const explorerDef = createArrayExplorerCalculator(teamConventions);

export function inputsFor(texts: Record<string, string>): CalcInputs {
  const { inputs, fields } = validateAll(explorerDef as never, { ...defaultTexts(explorerDef as never), ...texts });
  if (!inputs) throw new Error(`invalid test inputs: ${JSON.stringify(Object.entries(fields).filter(([, s]) => !s.ok))}`);
  return inputs;
}
