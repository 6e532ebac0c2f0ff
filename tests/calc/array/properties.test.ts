import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { principalPlaneMetrics } from '../../../calc/array/beamMetrics';
import { buildArrayModel } from '../../../calc/array/buildArray';
import { directivity } from '../../../calc/array/directivity';
import { MAX_ARRAY_ELEMENTS } from '../../../calc/array/limits';
import { patternPowerAt } from '../../../calc/array/patternPower';
import type { Taper } from '../../../calc/array/taper';
import { CalcInputError } from '../../../calc/errors';

const taperArb: fc.Arbitrary<Taper> = fc.oneof(
  fc.constant<Taper>({ kind: 'uniform' }),
  fc.record({ kind: fc.constant('cosineOnPedestal' as const), pedestal: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constant('taylor' as const), nbar: fc.integer({ min: 2, max: 6 }), sidelobeDb: fc.double({ min: 20, max: 45, noNaN: true }) }),
  fc.record({ kind: fc.constant('chebyshev' as const), sidelobeDb: fc.double({ min: 20, max: 45, noNaN: true }) }),
);

describe('property-based checks (fast-check)', () => {
  it('directivity is finite and positive for every valid linear, planar, circular and random array', () => {
    const geometryArb = fc.oneof(
      fc.record({ kind: fc.constant('linear' as const), count: fc.integer({ min: 1, max: 64 }), spacingWavelengths: fc.double({ min: 0.05, max: 3, noNaN: true }) }),
      fc.record({ kind: fc.constant('planar' as const), lattice: fc.constantFrom('rectangular' as const, 'triangular' as const), columns: fc.integer({ min: 1, max: 12 }), rows: fc.integer({ min: 1, max: 12 }), spacingXWavelengths: fc.double({ min: 0.1, max: 2, noNaN: true }), outline: fc.constantFrom('rectangle' as const, 'circle' as const, 'ellipse' as const) }),
      fc.record({ kind: fc.constant('circular' as const), count: fc.integer({ min: 1, max: 40 }), radiusWavelengths: fc.double({ min: 0.1, max: 5, noNaN: true }) }),
      fc.record({ kind: fc.constant('random' as const), count: fc.integer({ min: 1, max: 40 }), extentXWavelengths: fc.double({ min: 0.5, max: 10, noNaN: true }), extentYWavelengths: fc.double({ min: 0.5, max: 10, noNaN: true }), extentZWavelengths: fc.double({ min: 0, max: 3, noNaN: true }), seed: fc.integer({ min: 0, max: 1000 }) }),
    );
    fc.assert(fc.property(geometryArb, taperArb, fc.double({ min: 0, max: 85, noNaN: true }), fc.double({ min: 0, max: 360, noNaN: true }), (geometry, taper, thetaDeg, phiDeg) => {
      const model = buildArrayModel({ geometry, taper, steering: { thetaDeg, phiDeg } });
      const d = directivity(model);
      return Number.isFinite(d.directivity) && d.directivity > 0 && Number.isFinite(d.directivityDbi);
    }), { numRuns: 150, seed: 20260101 });
  });

  it('a planar array at λ/2 spacing or closer with a cos²θ power-pattern element (field cos θ) does not exceed 4πA/λ² (Balanis, "Antenna Theory", 4th ed., ch. 12 (chapter number from memory)) by more than the edge-effect tolerance 10·log10(1 + 0.5 λ/L_min) (common practice, no source: small apertures exceed 4πA/λ² by a term that shrinks as 1/L), A = columns·rows·dx·dy', () => {
    fc.assert(fc.property(fc.integer({ min: 3, max: 12 }), fc.integer({ min: 3, max: 12 }), fc.double({ min: 0.25, max: 0.5, noNaN: true }), taperArb, (columns, rows, spacing, taper) => {
      const model = buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns, rows, spacingXWavelengths: spacing }, taper, element: { kind: 'cosine', powerExponent: 2 } });
      const bound = 4 * Math.PI * columns * rows * spacing * spacing;
      const toleranceDb = 10 * Math.log10(1 + 0.5 / (Math.min(columns, rows) * spacing));
      const d = directivity(model).directivity;
      return d > 0 && 10 * Math.log10(d / bound) < toleranceDb;
    }), { numRuns: 25, seed: 7 });
  });

  it('steering puts the peak at θ0: the peak offset found by golden-section search is below 1e-5° (root-finding tolerance)', () => {
    fc.assert(fc.property(fc.integer({ min: 4, max: 64 }), fc.double({ min: 0.25, max: 0.5, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), taperArb, (count, spacing, thetaDeg, taper) => {
      const model = buildArrayModel({ geometry: { kind: 'linear', count, spacingWavelengths: spacing }, taper, steering: { thetaDeg, phiDeg: 0 } });
      return Math.abs(principalPlaneMetrics(model).theta.peakOffsetDeg) < 1e-5;
    }), { numRuns: 60, seed: 11 });
  });

  it('mirror symmetry: a broadside planar array symmetric in x and y has P(θ, φ) = P(θ, −φ) = P(θ, 180° − φ) to 1e-9 relative (geometry)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 10 }), fc.integer({ min: 1, max: 10 }), taperArb, fc.double({ min: 0, max: 180, noNaN: true }), fc.double({ min: 0, max: 360, noNaN: true }), (columns, rows, taper, thetaDeg, phiDeg) => {
      const model = buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns, rows, spacingXWavelengths: 0.6, spacingYWavelengths: 0.45 }, taper });
      const p = patternPowerAt(model, thetaDeg, phiDeg);
      const scale = patternPowerAt(model, 0, 0);
      return Math.abs(p - patternPowerAt(model, thetaDeg, -phiDeg)) <= 1e-9 * scale && Math.abs(p - patternPowerAt(model, thetaDeg, 180 - phiDeg)) <= 1e-9 * scale && Math.abs(p - patternPowerAt(model, 180 - thetaDeg, phiDeg)) <= 1e-9 * scale;
    }), { numRuns: 100, seed: 3 });
  });

  it('invalid inputs raise CalcInputError naming the parameter: N ≤ 0 or fractional, spacing ≤ 0 or NaN, counts past the cap', () => {
    fc.assert(fc.property(fc.oneof(fc.integer({ min: -1000, max: 0 }), fc.double({ min: 0.1, max: 99.9, noNaN: true }).filter((x) => !Number.isInteger(x)), fc.constant(Number.NaN), fc.integer({ min: MAX_ARRAY_ELEMENTS + 1, max: 10 * MAX_ARRAY_ELEMENTS })), (count) => {
      try { buildArrayModel({ geometry: { kind: 'linear', count, spacingWavelengths: 0.5 } }); return false; } catch (error) { return error instanceof CalcInputError && /count/.test((error as Error).message); }
    }), { numRuns: 100, seed: 5 });
    fc.assert(fc.property(fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant(Number.NaN), fc.constant(Number.POSITIVE_INFINITY)), (spacing) => {
      try { buildArrayModel({ geometry: { kind: 'linear', count: 8, spacingWavelengths: spacing } }); return false; } catch (error) { return error instanceof CalcInputError && /spacingWavelengths/.test((error as Error).message); }
    }), { numRuns: 100, seed: 6 });
    expect(() => buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 300, rows: 300, spacingXWavelengths: 0.5 } })).toThrow(/at most 65536/);
    expect(() => buildArrayModel({ geometry: { kind: 'linear', count: 8, spacingWavelengths: 0.5 }, steering: { thetaDeg: Number.NaN, phiDeg: 0 } })).toThrow(CalcInputError);
    expect(() => buildArrayModel({ geometry: { kind: 'linear', count: 8, spacingWavelengths: 0.5 }, phaseBits: 0 })).toThrow(/phaseBits/);
  });
});
