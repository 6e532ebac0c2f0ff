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

export const calculatorFactories: Record<string, (conventions: TeamConventions) => CalculatorDef<unknown>> = {
  'wavelength-spacing': createWavelengthSpacingCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'front-fed-reflector': createReflectorCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'range-exposure': createRangeExposureCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
  'scan-loss': createScanLossCalculator as (c: TeamConventions) => CalculatorDef<unknown>,
};
