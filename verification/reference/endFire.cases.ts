import type { ReferenceGroup } from './referenceCase';
import { endFireDirectivity, endFireHpbwDeg } from '../../calc/endFire/index';
import fixture from '../fixtures/end-fire.json';

const scipy = (kind: string, count: number, d: number) => fixture.cases.find((c) => c.kind === kind && c.count === count && c.spacingWavelengths === d)!;

// The Yagi–Uda table (calc/endFire/yagiGain.ts) is transcribed, not checked here: see transcribed.ts.
export const endFireCases: ReferenceGroup = {
  topic: 'End-fire arrays',
  modules: ['calc/endFire/endFireArray.ts'],
  cases: [
    { id: 'ef-ordinary-n10-quarter', title: 'Ordinary end-fire, N = 10, d = λ/4: D = N = 10', source: 'Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory; D0 = 4N d/λ, exact at d = λ/4), hand-derived', expected: 10, tolerance: 1e-9, quantity: 'ratio', reads: 'endFireDirectivity', compute: () => endFireDirectivity('ordinary', 10, 0.25) },
    { id: 'ef-ordinary-n17-0.3', title: 'Ordinary end-fire, N = 17, d = 0.3 λ: directivity by sphere quadrature', source: 'SciPy quad (scripts/fixtures/end_fire.py)', expected: scipy('ordinary', 17, 0.3).directivity, tolerance: 1e-6, quantity: 'ratio', reads: 'endFireDirectivity', compute: () => endFireDirectivity('ordinary', 17, 0.3) },
    { id: 'ef-hw-n40', title: 'Hansen–Woodyard, N = 40, d = λ/4: directivity by sphere quadrature', source: 'SciPy quad (scripts/fixtures/end_fire.py)', expected: scipy('hansenWoodyard', 40, 0.25).directivity, tolerance: 1e-6, quantity: 'ratio', reads: 'endFireDirectivity', compute: () => endFireDirectivity('hansenWoodyard', 40, 0.25) },
    { id: 'ef-hw-long-factor', title: 'Hansen–Woodyard over 4N d/λ for a long array (N = 400, d = λ/4): ≈ 1.805', source: 'Balanis, Antenna Theory, 4th ed., §6.4 (section number from memory)', expected: 1.805, tolerance: 0.005, quantity: 'ratio', reads: 'endFireDirectivity', compute: () => endFireDirectivity('hansenWoodyard', 400, 0.25) / (4 * 400 * 0.25) },
    { id: 'ef-ordinary-hpbw-n40', title: 'Ordinary end-fire, N = 40, d = λ/4: HPBW', source: 'SciPy brentq on |AF|² (scripts/fixtures/end_fire.py)', expected: scipy('ordinary', 40, 0.25).hpbwDeg, tolerance: 1e-6, quantity: 'angleDeg', reads: 'endFireHpbwDeg', compute: () => endFireHpbwDeg('ordinary', 40, 0.25)! },
    { id: 'ef-ordinary-hpbw-approx', title: 'Ordinary end-fire, N = 100, d = λ/4: HPBW ≈ 2 acos(1 − 1.391λ/(πNd))', source: 'Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory; Table 6.2 (table number from memory)), from memory', expected: 2 * Math.acos(1 - 1.391 / (Math.PI * 25)) * (180 / Math.PI), tolerance: 0.1, quantity: 'angleDeg', reads: 'endFireHpbwDeg', compute: () => endFireHpbwDeg('ordinary', 100, 0.25)! },
  ],
};
