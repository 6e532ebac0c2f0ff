/** All reference-case groups: the test suite runs them and the Verification record page lists them. */
import type { ReferenceGroup } from './referenceCase';
import { formulaExampleCases, wavelengthCases } from './wavelength.cases';
import { arrayEngineCases } from './arrayEngine.cases';

export const referenceGroups: ReferenceGroup[] = [wavelengthCases, arrayEngineCases, formulaExampleCases];
