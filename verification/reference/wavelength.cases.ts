import type { ReferenceGroup } from './referenceCase';
import { freeSpaceWavelengthM } from '../../calc/wavelength';
import { gratingLobeOnsetScanDeg, maxGratingFreeSpacingWavelengths } from '../../calc/gratingLobeLimit';
import { elementCountEstimate } from '../../calc/elementCount';
import { formulaCatalog } from '../../calc/formulaCatalog';
import { calculatorFactories } from '../../calc/calculators/index';
import { teamConventions } from '../../calc/teamConventions';
import { quantityOfOutput, type Quantity } from './quantity';

export const wavelengthCases: ReferenceGroup = {
  topic: 'Wavelength, grating lobes and lattices',
  modules: ['calc/wavelength.ts', 'calc/gratingLobeLimit.ts', 'calc/elementCount.ts'],
  cases: [
    { id: 'wl-1ghz', title: 'λ₀ at 1 GHz', source: 'c = 299 792 458 m/s exact (SI Brochure, 9th ed., BIPM 2019)', expected: 0.299792458, tolerance: 1e-15, quantity: 'lengthM', reads: 'freeSpaceWavelengthM', compute: () => freeSpaceWavelengthM(1e9) },
    { id: 'wl-10ghz', title: 'λ₀ at 10 GHz', source: 'c = 299 792 458 m/s exact (SI Brochure, 9th ed., BIPM 2019)', expected: 0.0299792458, tolerance: 1e-15, quantity: 'lengthM', reads: 'freeSpaceWavelengthM', compute: () => freeSpaceWavelengthM(10e9) },
    { id: 'gl-rect-30', title: 'Rectangular lattice, 30° scan: d/λ limit 1/(1 + sin 30°)', source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory)', expected: 2 / 3, tolerance: 1e-12, quantity: 'lengthWavelengths', reads: 'maxGratingFreeSpacingWavelengths', compute: () => maxGratingFreeSpacingWavelengths(30, 'rectangular') },
    { id: 'gl-rect-90', title: 'Rectangular lattice, scan to the horizon: λ/2', source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory)', expected: 0.5, tolerance: 1e-12, quantity: 'lengthWavelengths', reads: 'maxGratingFreeSpacingWavelengths', compute: () => maxGratingFreeSpacingWavelengths(90, 'rectangular') },
    { id: 'gl-tri-60', title: 'Equilateral triangular lattice, 60° scan: (2/√3)/(1 + sin 60°)', source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory)', expected: 0.6188021535, tolerance: 1e-9, quantity: 'lengthWavelengths', reads: 'maxGratingFreeSpacingWavelengths', compute: () => maxGratingFreeSpacingWavelengths(60, 'triangular') },
    { id: 'gl-onset-0.6', title: 'Grating-lobe onset for 0.6 λ square spacing: asin(1/0.6 − 1)', source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory; hand-worked)', expected: 41.8103149, tolerance: 1e-6, quantity: 'angleDeg', reads: 'gratingLobeOnsetScanDeg', compute: () => gratingLobeOnsetScanDeg(0.6, 'rectangular') },
    {
      id: 'lattice-saving',
      title: 'Triangular lattice needs 1 − √3/2 fewer elements than square at each one’s limit (large aperture)',
      source: 'Sharp, IRE Trans. Antennas Propag. AP-9 (1961)',
      expected: 1 - Math.sqrt(3) / 2,
      tolerance: 2e-4,
      quantity: 'ratio',
      reads: 'elementCountEstimate',
      compute: () => {
        const lambda = 0.03;
        const rect = elementCountEstimate(100, maxGratingFreeSpacingWavelengths(45, 'rectangular') * lambda, 'rectangular');
        const tri = elementCountEstimate(100, maxGratingFreeSpacingWavelengths(45, 'triangular') * lambda, 'triangular');
        return 1 - tri / rect;
      },
    },
  ],
};

/** The calculator output each formula is linked to: its OutputSpec gives the unit of `evaluate`. */
function linkedOutput(formulaId: string): { reads: string; quantity: Quantity } {
  for (const [id, make] of Object.entries(calculatorFactories)) {
    const def = make(teamConventions);
    const link = def.formulas.find((l) => l.formula.id === formulaId);
    const spec = link && def.outputs.find((o) => o.key === link.output);
    if (spec) return { reads: `${id}#${spec.key}`, quantity: quantityOfOutput(spec) };
  }
  throw new Error(`formula ${formulaId} is shown by no calculator: its worked example has no output to take a unit from`);
}

/** Every formula's own worked example is a reference case too; its unit is the linked output's. */
export const formulaExampleCases: ReferenceGroup = {
  topic: 'Formula worked examples',
  modules: ['calc/formulaCatalog.ts'],
  cases: formulaCatalog.map((f) => ({
    id: `formula-${f.id}`,
    title: `${f.title}: worked example`,
    source: f.example.source,
    expected: f.example.expected,
    tolerance: f.example.tolerance,
    ...linkedOutput(f.id),
    compute: () => f.evaluate(f.example.args),
  })),
};
