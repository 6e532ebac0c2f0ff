import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { gratingLobeOnsetScanDeg, maxGratingFreeSpacingWavelengths, latticeCellAreaPerSpacingSquared } from '../../calc/gratingLobeLimit';
import { elementCountEstimate } from '../../calc/elementCount';

// Source for the limits: Mailloux, Phased Array Antenna Handbook, 2nd ed. (2005), §2.1 (section number from memory):
// rectangular grid d/λ ≤ 1/(1 + sin θmax); equilateral triangular grid (nearest-neighbour d)
// d/λ ≤ (2/√3)/(1 + sin θmax) in the worst scan plane.
describe('maxGratingFreeSpacingWavelengths(scanMaxDeg, lattice)', () => {
  it('rectangular: λ at broadside, λ/2 for scan to 90°, 2/3 λ at 30° (Mailloux §2.1 (section number from memory))', () => {
    expect(maxGratingFreeSpacingWavelengths(0, 'rectangular')).toBeCloseTo(1, 12);
    expect(maxGratingFreeSpacingWavelengths(90, 'rectangular')).toBeCloseTo(0.5, 12);
    expect(maxGratingFreeSpacingWavelengths(30, 'rectangular')).toBeCloseTo(2 / 3, 12);
  });
  it('rectangular at 45°: 1/(1 + 0.7071) = 0.5858 λ (Mailloux §2.1 (section number from memory), hand-worked)', () => {
    expect(maxGratingFreeSpacingWavelengths(45, 'rectangular')).toBeCloseTo(0.585786, 6);
  });
  it('triangular allows 2/√3 ≈ 1.1547 times the rectangular spacing (Mailloux §2.1 (section number from memory))', () => {
    for (const scan of [0, 15, 30, 45, 60, 75, 90]) {
      const ratio = maxGratingFreeSpacingWavelengths(scan, 'triangular') / maxGratingFreeSpacingWavelengths(scan, 'rectangular');
      expect(ratio).toBeCloseTo(2 / Math.sqrt(3), 12);
    }
  });
  it('triangular at 60°: (2/√3)/(1 + 0.8660) = 0.6188 λ (hand-worked)', () => {
    expect(maxGratingFreeSpacingWavelengths(60, 'triangular')).toBeCloseTo(0.618802, 6);
  });
  it('rejects a scan outside 0…90°', () => {
    expect(() => maxGratingFreeSpacingWavelengths(-1, 'rectangular')).toThrow(/scanMaxDeg/);
    expect(() => maxGratingFreeSpacingWavelengths(91, 'triangular')).toThrow(/scanMaxDeg/);
    expect(() => maxGratingFreeSpacingWavelengths(Number.NaN, 'triangular')).toThrow(/scanMaxDeg/);
  });
});

describe('gratingLobeOnsetScanDeg(spacingWavelengths, lattice)', () => {
  it('inverts the limit: onset at the limit spacing equals the scan angle (property, 0…89°)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 89, noNaN: true }), fc.constantFrom('rectangular' as const, 'triangular' as const), (scan, lattice) => {
        const d = maxGratingFreeSpacingWavelengths(scan, lattice);
        expect(gratingLobeOnsetScanDeg(d, lattice)).toBeCloseTo(scan, 8);
      }),
    );
  });
  it('is 90° (never) at λ/2 or closer on a rectangular lattice and 0° (already visible) at λ or wider', () => {
    expect(gratingLobeOnsetScanDeg(0.5, 'rectangular')).toBe(90);
    expect(gratingLobeOnsetScanDeg(0.3, 'rectangular')).toBe(90);
    expect(gratingLobeOnsetScanDeg(1, 'rectangular')).toBe(0);
    expect(gratingLobeOnsetScanDeg(1.4, 'rectangular')).toBe(0);
  });
  it('0.6 λ rectangular: asin(1/0.6 − 1) = 41.81° (hand-worked)', () => {
    expect(gratingLobeOnsetScanDeg(0.6, 'rectangular')).toBeCloseTo(41.8103, 3);
  });
  it('decreases as spacing grows (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 2, noNaN: true }), fc.double({ min: 0.001, max: 0.5, noNaN: true }), (d, step) => {
        expect(gratingLobeOnsetScanDeg(d + step, 'rectangular')).toBeLessThanOrEqual(gratingLobeOnsetScanDeg(d, 'rectangular'));
      }),
    );
  });
});

describe('elementCountEstimate(areaM2, spacingM, lattice)', () => {
  it('1 m² at 0.1 m square spacing is 100 elements', () => {
    expect(elementCountEstimate(1, 0.1, 'rectangular')).toBe(100);
  });
  it('triangular cell is √3/2 d² (plane geometry)', () => {
    expect(latticeCellAreaPerSpacingSquared('triangular')).toBeCloseTo(Math.sqrt(3) / 2, 15);
  });
  it('each lattice at its own limit: triangular needs 13.4 % fewer elements (Sharp 1961)', () => {
    const area = 4;
    const lambda = 0.03;
    const rect = elementCountEstimate(area, maxGratingFreeSpacingWavelengths(45, 'rectangular') * lambda, 'rectangular');
    const tri = elementCountEstimate(area, maxGratingFreeSpacingWavelengths(45, 'triangular') * lambda, 'triangular');
    expect(1 - tri / rect).toBeCloseTo(1 - Math.sqrt(3) / 2, 3);
  });
});
