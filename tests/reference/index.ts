/** All reference-case groups: the test suite runs them and the Verification record page lists them. */
import type { ReferenceGroup } from './referenceCase';
import { formulaExampleCases, wavelengthCases } from './wavelength.cases';
import { reflectorCases } from './reflector.cases';
import { endFireCases } from './endFire.cases';
import { backplaneCases } from './backplane.cases';
import { linkExposureCases } from './linkExposure.cases';
import { scanLossCases } from './scanLoss.cases';
import { sizingCases } from './sizing.cases';

export const referenceGroups: ReferenceGroup[] = [
  wavelengthCases,
  reflectorCases,
  endFireCases,
  backplaneCases,
  scanLossCases,
  linkExposureCases,
  sizingCases,
  formulaExampleCases,
];
