/** All reference-case groups: the test suite runs them and the Verification record page lists them. */
import type { ReferenceGroup } from './referenceCase';
import { formulaExampleCases, wavelengthCases } from './wavelength.cases';
import { linkExposureCases } from './linkExposure.cases';
import { scanLossCases } from './scanLoss.cases';

export const referenceGroups: ReferenceGroup[] = [wavelengthCases, scanLossCases, linkExposureCases, formulaExampleCases];
