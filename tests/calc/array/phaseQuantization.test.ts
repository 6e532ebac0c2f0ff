import { describe, expect, it } from 'vitest';
import { buildArrayModel } from '../../../calc/array/buildArray';
import { elementTable } from '../../../calc/array/elementTable';
import { quantizePhaseDeg, wrapPhaseDeg } from '../../../calc/array/phaseQuantization';
import { phaseQuantizationEffect } from '../../../calc/array/quantizationEffect';
import { CalcInputError } from '../../../calc/errors';

describe('phase quantization', () => {
  it('B-bit phases in the element table are multiples of 360°/2^B in [0°, 360°) (definition of a B-bit shifter)', () => {
    for (const bits of [1, 2, 3, 4, 6]) {
      const model = buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 8, rows: 8, spacingXWavelengths: 0.5 }, steering: { thetaDeg: 23, phiDeg: 41 }, phaseBits: bits });
      const step = 360 / 2 ** bits;
      for (const phase of elementTable(model).phaseDeg) {
        expect(phase).toBeGreaterThanOrEqual(0);
        expect(phase).toBeLessThan(360);
        expect(Math.abs(phase / step - Math.round(phase / step))).toBeLessThan(1e-9);
      }
    }
  });
  it('continuous element-table phases equal −360°·(x u0 + y v0) modulo 360° (steering convention, calc/angleConvention)', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 9, spacingWavelengths: 0.7 }, steering: { thetaDeg: 35, phiDeg: 0 } });
    const table = elementTable(model);
    table.xWavelengths.forEach((x, n) => expect(table.phaseDeg[n]).toBeCloseTo(wrapPhaseDeg(-360 * x * Math.sin((35 * Math.PI) / 180)), 9));
  });
  it('quantizePhaseDeg rounds to the nearest state and wraps', () => {
    expect(quantizePhaseDeg(44, 3)).toBe(45);
    expect(quantizePhaseDeg(-10, 2)).toBe(0);
    expect(quantizePhaseDeg(350, 2)).toBe(0);
    expect(() => quantizePhaseDeg(10, 0)).toThrow(CalcInputError);
  });
  it('pointing error and quantization sidelobes shrink as bits increase (deterministic rounding; Mailloux, "Phased Array Antenna Handbook", 2nd ed., §7.1 (section number from memory) on quantization lobes)', () => {
    const spec = { geometry: { kind: 'linear' as const, count: 64, spacingWavelengths: 0.5 }, steering: { thetaDeg: 7.3, phiDeg: 0 } };
    const coarse = phaseQuantizationEffect(spec, 2);
    const fine = phaseQuantizationEffect(spec, 8);
    expect(coarse.phaseStepDeg).toBe(90);
    expect(fine.pointingErrorDeg).toBeLessThan(coarse.pointingErrorDeg);
    expect(fine.pointingErrorDeg).toBeLessThan(0.01);
    expect(coarse.quantizedPeakSidelobeDb!).toBeGreaterThan(coarse.peakSidelobeDb! - 0.01);
    expect(fine.quantizedPeakSidelobeDb! - fine.peakSidelobeDb!).toBeLessThan(0.2);
  });
});
