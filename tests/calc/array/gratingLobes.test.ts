import { describe, expect, it } from 'vitest';
import { buildArrayModel } from '../../../calc/array/buildArray';
import { distanceFromMainBeam, distanceToGratingLobe, gratingLobeDirections, latticeVectorsWavelengths, reciprocalVectors } from '../../../calc/array/gratingLobes';
import { patternPowerAt } from '../../../calc/array/patternPower';
import { directionCosines } from '../../../calc/array/steering';
import { reciprocalRadiusFactor } from '../../../calc/gratingLobeLimit';

describe('gratingLobeDirections(vectorsWavelengths, beam)', () => {
  it('square lattice d = 0.8 λ scanned 30° in φ = 0: lobe at u0 − λ/d only (analytic û0 + (λ/d)·g, Mailloux, "Phased Array Antenna Handbook", 2nd ed., §2.1 (section number from memory)), to 1e-12', () => {
    const lobes = gratingLobeDirections([[0.8, 0], [0, 0.8]], { thetaDeg: 30, phiDeg: 0 });
    expect(lobes.length).toBe(1);
    expect(lobes[0].order).toEqual([-1, 0]);
    expect(lobes[0].u).toBeCloseTo(0.5 - 1 / 0.8, 12);
    expect(lobes[0].v).toBeCloseTo(0, 12);
    expect(lobes[0].thetaDeg).toBeCloseTo((Math.asin(1 / 0.8 - 0.5) * 180) / Math.PI, 10);
    expect(lobes[0].phiDeg).toBeCloseTo(180, 10);
  });
  it('no grating lobe at λ/2 for any scan, and the lobe count grows with spacing', () => {
    for (const theta of [0, 45, 89]) expect(gratingLobeDirections([[0.5, 0], [0, 0.5]], { thetaDeg: theta, phiDeg: 17 }).length).toBe(0);
    expect(gratingLobeDirections([[2, 0], [0, 2]], { thetaDeg: 0, phiDeg: 0 }).length).toBeGreaterThan(8);
  });
  it('triangular lattice: nearest lobe sits reciprocalRadiusFactor/d from û0 (calc/gratingLobeLimit, Mailloux §2.1 (section number from memory))', () => {
    const d = 1.3;
    const vectors: Array<[number, number]> = [[d, 0], [d / 2, (d * Math.sqrt(3)) / 2]];
    const lobes = gratingLobeDirections(vectors, { thetaDeg: 0, phiDeg: 0 });
    const nearest = Math.min(...lobes.map((l) => Math.hypot(l.u, l.v)));
    expect(nearest).toBeCloseTo(reciprocalRadiusFactor('triangular') / d, 12);
    expect(lobes.length).toBe(6); // the six first-ring reciprocal points, all at 0.888 < 1
    const [b1, b2] = reciprocalVectors(vectors);
    expect(b1[0] * vectors[0][0] + b1[1] * vectors[0][1]).toBeCloseTo(1, 12);
    expect(b2[0] * vectors[0][0] + b2[1] * vectors[0][1]).toBeCloseTo(0, 12);
  });
  it('the computed pattern has a full-height lobe at every reported direction (direct summation), within 1e-9 relative', () => {
    const model = buildArrayModel({ geometry: { kind: 'planar', lattice: 'triangular', columns: 8, rows: 8, spacingXWavelengths: 1.1 }, steering: { thetaDeg: 20, phiDeg: 60 } });
    const lobes = gratingLobeDirections(model.lattice!.vectorsWavelengths, model.beam);
    expect(lobes.length).toBeGreaterThan(0);
    const main = patternPowerAt(model, 20, 60);
    for (const lobe of lobes) expect(Math.abs(patternPowerAt(model, lobe.thetaDeg, lobe.phiDeg) / main - 1)).toBeLessThan(1e-9);
    expect(directionCosines(20, 60)[0]).toBeCloseTo(Math.sin(20 * Math.PI / 180) * 0.5, 12);
  });
  it('converts metres to wavelengths at the given frequency (λ = c/f)', () => {
    const [[x]] = latticeVectorsWavelengths([[0.015, 0]], 10e9);
    expect(x).toBeCloseTo(0.015 / (299_792_458 / 10e9), 12);
  });
});

describe('distanceToGratingLobe / distanceFromMainBeam (direction cosines)', () => {
  it('line along x, d = 1 λ at broadside: replicas at u = ±1, ±2 …; only the component along the line counts', () => {
    const line: Array<[number, number]> = [[1, 0]];
    expect(distanceToGratingLobe(line, [0, 0], [0.9, 0.3])).toBeCloseTo(0.1, 12);
    expect(distanceToGratingLobe(line, [0, 0], [-1, 0])).toBeCloseTo(0, 12);
    expect(distanceFromMainBeam(line, [0, 0], [0.2, 0.5])).toBeCloseTo(0.2, 12);
    expect(distanceToGratingLobe(line, [0, 0], [0.2, 0])).toBeCloseTo(0.8, 12); // nearest replica u = 1, not the main beam
  });
  it('square lattice 0.8 λ steered to u0 = 0.5: nearest replica of (−0.7, 0.1) is (0.5 − 1.25, 0), at distance √(0.05² + 0.1²)', () => {
    const square: Array<[number, number]> = [[0.8, 0], [0, 0.8]];
    expect(distanceToGratingLobe(square, [0.5, 0], [-0.7, 0.1])).toBeCloseTo(Math.hypot(0.05, 0.1), 12);
    expect(distanceFromMainBeam(square, [0.5, 0], [0.4, 0])).toBeCloseTo(0.1, 12);
  });
  it('lobes exactly on the horizon (u² + v² = 1) are listed: the 1 λ line at broadside has two, a 1 λ square lattice four (Mailloux §2.1 (section number from memory))', () => {
    expect(gratingLobeDirections([[1, 0]], { thetaDeg: 0, phiDeg: 0 }).map((l) => l.u).sort()).toEqual([-1, 1]);
    expect(gratingLobeDirections([[1, 0], [0, 1]], { thetaDeg: 0, phiDeg: 0 })).toHaveLength(4);
    expect(gratingLobeDirections([[0.98, 0]], { thetaDeg: 0, phiDeg: 0 })).toHaveLength(0);
  });
});
