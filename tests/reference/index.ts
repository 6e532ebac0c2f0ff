/** All reference-case groups: the test suite runs them and the Verification record page lists them. */
import type { ReferenceGroup } from './referenceCase';
import { formulaExampleCases, wavelengthCases } from './wavelength.cases';
import { endFireCases } from './endFire.cases';
import { backplaneCases } from './backplane.cases';

export const referenceGroups: ReferenceGroup[] = [wavelengthCases, endFireCases, backplaneCases, formulaExampleCases];
