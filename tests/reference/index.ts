/** All reference-case groups: the test suite runs them and the Verification record page lists them. */
import type { ReferenceGroup } from './referenceCase';
import { formulaExampleCases, wavelengthCases } from './wavelength.cases';
import { reflectorCases } from './reflector.cases';
import { linkExposureCases } from './linkExposure.cases';
import { scanLossCases } from './scanLoss.cases';

export const referenceGroups: ReferenceGroup[] = [wavelengthCases, reflectorCases, scanLossCases, linkExposureCases, formulaExampleCases];
