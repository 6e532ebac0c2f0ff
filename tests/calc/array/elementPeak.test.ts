import { describe, expect, it } from 'vitest';
import { ELEMENT_NULL_FLOOR_DB, elementLevelDb, elementPowerPeak } from '../../../calc/array/elementPeak';

describe('elementPowerPeak(element) and elementLevelDb(element, direction)', () => {
  it('peaks: isotropic 1, cos θ 1 at broadside, half-wave dipole 1 broadside to its axis, cos θ over a ground plane at λ/4: |2 sin(π/2)|² = 4 (image theory, Balanis, "Antenna Theory", 4th ed., §4.7 (section number from memory)), to 1e-9', () => {
    expect(elementPowerPeak({ kind: 'isotropic' })).toBe(1);
    expect(elementPowerPeak({ kind: 'cosine', powerExponent: 2.6 })).toBeCloseTo(1, 9);
    expect(elementPowerPeak({ kind: 'halfWaveDipole', axis: 'x' })).toBeCloseTo(1, 9);
    expect(elementPowerPeak({ kind: 'cosine', powerExponent: 2, groundPlaneHeightWavelengths: 0.25 })).toBeCloseTo(4, 9);
  });
  it('a horizontal element λ/2 over ground peaks off broadside, where 2 sin(π cos θ)·cos θ is largest (found here by golden-section search on the formula), to 1e-9 relative', () => {
    const formula = (t: number) => (2 * Math.sin(Math.PI * Math.cos(t)) * Math.cos(t)) ** 2;
    let best = 0;
    for (let i = 0; i <= 90000; i++) best = Math.max(best, formula((i / 90000) * (Math.PI / 2)));
    expect(elementPowerPeak({ kind: 'cosine', powerExponent: 2, groundPlaneHeightWavelengths: 0.5 }) / best).toBeCloseTo(1, 9);
  });
  it('levels: cos θ field at 60° is 20 log10(0.5) = −6.02 dB; at θ = 90° and along a dipole\'s axis it is a null (floor −300 dB)', () => {
    expect(elementLevelDb({ kind: 'cosine', powerExponent: 2 }, { thetaDeg: 60, phiDeg: 0 })).toBeCloseTo(20 * Math.log10(0.5), 9);
    expect(elementLevelDb({ kind: 'cosine', powerExponent: 2 }, { thetaDeg: 90, phiDeg: 0 })).toBe(ELEMENT_NULL_FLOOR_DB);
    expect(elementLevelDb({ kind: 'halfWaveDipole', axis: 'x' }, { thetaDeg: 90, phiDeg: 0 })).toBe(ELEMENT_NULL_FLOOR_DB);
    expect(elementLevelDb({ kind: 'isotropic' }, { thetaDeg: 90, phiDeg: 0 })).toBe(0);
  });
});
