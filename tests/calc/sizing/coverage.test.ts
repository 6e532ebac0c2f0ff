import { describe, expect, it } from 'vitest';
import { runSizing, sizingCandidate } from './runSizing';
import { coverageCornerPlaneDeg, coverageCornerScanDeg, coverageSpacingLimitWavelengths } from '../../../calc/sizing/coverage';

const run = runSizing;
const candidate = sizingCandidate;

/** Is any grating lobe of the lattice (reciprocal vectors g, in units of λ/d) inside visible space when the beam is at (u0, v0)? */
function gratingLobeVisible(u0: number, v0: number, spacingWavelengths: number, reciprocal: [number, number][]): boolean {
  for (const [gx, gy] of reciprocal) {
    for (const sign of [1, -1]) {
      const u = u0 + (sign * gx) / spacingWavelengths;
      const v = v0 + (sign * gy) / spacingWavelengths;
      if (u * u + v * v < 1 - 1e-12) return true;
    }
  }
  return false;
}
const SQUARE: [number, number][] = [[1, 0], [0, 1], [1, 1], [1, -1]];
// Equilateral triangular lattice with rows along x, nearest-neighbour spacing d: reciprocal vectors 2/(√3 d) at ±30°, 90°.
const TRIANGULAR: [number, number][] = [30, 90, 150].map((a) => [(2 / Math.sqrt(3)) * Math.cos((a * Math.PI) / 180), (2 / Math.sqrt(3)) * Math.sin((a * Math.PI) / 180)]);
/** Worst case of gratingLobeVisible over a fine grid of the region ±az × ±el (direction cosines u = sin az cos el, v = sin el). */
function anyLobeInRegion(azDeg: number, elDeg: number, spacingWavelengths: number, reciprocal: [number, number][]): boolean {
  const steps = 60;
  for (let i = 0; i <= steps; i++) {
    for (let j = 0; j <= steps; j++) {
      const az = ((-1 + (2 * i) / steps) * azDeg * Math.PI) / 180;
      const el = ((-1 + (2 * j) / steps) * elDeg * Math.PI) / 180;
      if (gratingLobeVisible(Math.sin(az) * Math.cos(el), Math.sin(el), spacingWavelengths, reciprocal)) return true;
    }
  }
  return false;
}

describe('coverage corner: θ = acos(cos az · cos el) from the face normal', () => {
  it('±45° az × ±45° el: cos θ = cos 45° · cos 45° = 0.5, so the corner is 60° (hand-worked)', () => {
    expect(coverageCornerScanDeg(45, 45)).toBeCloseTo(60, 12);
    expect(coverageCornerScanDeg(45, 0)).toBeCloseTo(45, 12);
    expect(coverageCornerScanDeg(0, 0)).toBe(0);
  });
  it('the plane of scan through the corner: φ = atan2(sin el, sin az · cos el) = atan2(0.7071, 0.5) = 54.7° at 45°/45° (hand-worked)', () => {
    expect(coverageCornerPlaneDeg(45, 45)).toBeCloseTo((Math.atan2(Math.SQRT1_2, 0.5) * 180) / Math.PI, 12);
    expect(coverageCornerPlaneDeg(30, 0)).toBe(0);
  });
  it('scan loss of the planar face at ±45°/±45° is cos^1.3(60°): 1.3 · 10·log10(0.5) = −3.913 dB, not the −1.957 dB of ±45° alone (hand-worked)', () => {
    const both = run({ saz: '45 deg', sel: '45 deg', nexp: '1.3' }).values.planarScanLossDb as number;
    const azOnly = run({ saz: '45 deg', sel: '0 deg', nexp: '1.3' }).values.planarScanLossDb as number;
    expect(both).toBeCloseTo(1.3 * 10 * Math.log10(0.5), 9);
    expect(azOnly).toBeCloseTo(1.3 * 10 * Math.log10(Math.SQRT1_2), 9);
    expect(run({ saz: '45 deg', sel: '45 deg' }).values.cornerScanDeg).toBeCloseTo(60, 9);
  });
  it('the planar face at ±45°/±45° is sized for the corner gain and its corner beam is about twice its broadside beam (1/cos 60°)', () => {
    const c = candidate({ g: '30 dBi', saz: '45 deg', sel: '45 deg' }, 'planarArray');
    expect(c.gainEdgeDbi).toBeCloseTo(30, 9);
    expect(c.gainBroadsideDbi - c.gainEdgeDbi).toBeCloseTo(-1.3 * 10 * Math.log10(0.5), 9);
    const ratio = c.hpbwEdgeDeg! / c.hpbwBroadsideDeg[0]!;
    expect(ratio).toBeGreaterThan(1.9);
    expect(ratio).toBeLessThan(2.1);
  });
});

describe('grating-lobe spacing over the region (Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory): lobes at û0 + (λ/d)·g)', () => {
  /*
   * Hand-worked, rectangular lattice, ±45° az × ±45° el. Direction cosines u = sin az · cos el, v = sin el.
   * A lobe at (u0 − λ/d, v0) stays invisible while (λ/d − |u0|)² + v0² ≥ 1, i.e. λ/d ≥ cos el (1 + sin|az|),
   * largest at el = 0, az = 45°: λ/d ≥ 1.7071, d/λ ≤ 0.5858. The corner (u, v) = (0.5, 0.7071) only needs
   * λ/d ≥ 0.5 + √(1 − 0.5) = 1.2071 in u and 0.7071 + √(1 − 0.25) = 1.5731 in v: the plane edges decide,
   * and the corner cone 1/(1 + sin 60°) = 0.5359 would waste 9 % of the spacing.
   */
  it('rectangular: 1/(1 + sin 45°) = 0.5858 at ±45°/±45°, and a brute-force search over the region agrees', () => {
    const d = coverageSpacingLimitWavelengths(45, 45, 'rectangular');
    expect(d).toBeCloseTo(1 / (1 + Math.SQRT1_2), 12);
    expect(anyLobeInRegion(45, 45, d * (1 - 1e-6), SQUARE)).toBe(false);
    expect(anyLobeInRegion(45, 45, d * 1.01, SQUARE)).toBe(true);
  });
  it('rectangular with unequal planes: the larger plane edge decides (±60° az × ±20° el → 1/(1 + sin 60°))', () => {
    const d = coverageSpacingLimitWavelengths(60, 20, 'rectangular');
    expect(d).toBeCloseTo(1 / (1 + Math.sin(Math.PI / 3)), 12);
    expect(anyLobeInRegion(60, 20, d * (1 - 1e-6), SQUARE)).toBe(false);
    expect(anyLobeInRegion(60, 20, d * 1.01, SQUARE)).toBe(true);
  });
  it('triangular: the cone through the corner, (2/√3)/(1 + sin θc), keeps every lobe out of the region (brute force; conservative)', () => {
    for (const [az, el] of [[45, 45], [60, 0], [30, 50], [0, 0]]) {
      const d = coverageSpacingLimitWavelengths(az, el, 'triangular');
      expect(d).toBeCloseTo((2 / Math.sqrt(3)) / (1 + Math.sin((coverageCornerScanDeg(az, el) * Math.PI) / 180)), 12);
      expect(anyLobeInRegion(az, el, d * (1 - 1e-6), TRIANGULAR), `${az}/${el}`).toBe(false);
    }
  });
});
