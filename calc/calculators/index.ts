/**
 * Every calculator, by id: the formula reference, the embed routes and the tests iterate this.
 * Add a calculator here when you add its page.
 */
import type { CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { createWavelengthSpacingCalculator } from './wavelengthSpacing';
import { createReflectorCalculator } from './reflector';
import { createRangeExposureCalculator } from './rangeExposure';
import { createScanLossCalculator } from './scanLoss';
import { createArchitectureSizingCalculator } from './architectureSizing';
import { createEndFireLengthCalculator } from './endFireLength';
import { createBackplaneSpacingCalculator } from './backplaneSpacing';
import { createArrayExplorerCalculator } from './arrayExplorer';
import { createLinkBudgetCalculator } from './linkBudget';
import { createUnitConverterCalculator } from './unitConverter';

export const calculatorFactories: Record<string, (conventions: TeamConventions) => CalculatorDef<unknown>> = {
  'wavelength-spacing': createWavelengthSpacingCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'front-fed-reflector': createReflectorCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'range-exposure': createRangeExposureCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'scan-loss': createScanLossCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'architecture-sizing': createArchitectureSizingCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'end-fire-length': createEndFireLengthCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'backplane-spacing': createBackplaneSpacingCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'array-explorer': createArrayExplorerCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'link-budget': createLinkBudgetCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'unit-converter': createUnitConverterCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
};

/**
 * Every calculator's definition, in navigation order (`nav.order`): the navigation, the home page,
 * the safety notes and the embed routes read their entries from this one list.
 */
export function calculatorsInNavOrder(conventions: TeamConventions): CalculatorDef<unknown>[] {
  return Object.values(calculatorFactories)
    .map((make) => make(conventions))
    .sort((a, b) => a.nav.order - b.nav.order);
}
