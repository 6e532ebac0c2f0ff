/** All reference-case groups: the test suite runs them and the Verification record page lists them. */
import type { ReferenceGroup } from './referenceCase';
import { formulaExampleCases, wavelengthCases } from './wavelength.cases';
import { arrayEngineCases } from './arrayEngine.cases';
import { reflectorCases } from './reflector.cases';
import { endFireCases } from './endFire.cases';
import { backplaneCases } from './backplane.cases';
import { linkExposureCases } from './linkExposure.cases';
import { linkBudgetCases } from './linkBudget.cases';
import { scanLossCases } from './scanLoss.cases';
import { sizingCases } from './sizing.cases';

export const referenceGroups: ReferenceGroup[] = [
  wavelengthCases,
  arrayEngineCases,
  reflectorCases,
  endFireCases,
  backplaneCases,
  scanLossCases,
  linkExposureCases,
  linkBudgetCases,
  sizingCases,
  formulaExampleCases,
];
