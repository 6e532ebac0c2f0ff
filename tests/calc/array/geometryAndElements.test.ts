import { describe, expect, it } from 'vitest';
import { buildArrayModel, buildGeometry } from '../../../calc/array/buildArray';
import { customGeometryMetres } from '../../../calc/array/customGeometry';
import { elementFieldAt } from '../../../calc/array/elementPattern';
import { groundPlaneImageFactor } from '../../../calc/array/imageFactor';
import { randomGeometry, thinnedGeometry } from '../../../calc/array/randomGeometry';
import { lineTaperWeights } from '../../../calc/array/taper';
import { taperEfficiency } from '../../../calc/array/taperEfficiency';
import { CalcInputError } from '../../../calc/errors';

describe('geometries (positions in wavelengths)', () => {
  it('uniform linear array lies on x, centred, at the given spacing', () => {
    const g = buildGeometry({ kind: 'linear', count: 5, spacingWavelengths: 0.5 });
    expect(Array.from(g.positionsWavelengths.x)).toEqual([-1, -0.5, 0, 0.5, 1]);
    expect(g.positionsWavelengths.y.every((v) => v === 0)).toBe(true);
  });
  it('equilateral triangular lattice has nearest neighbours exactly d apart (6 per interior element)', () => {
    const g = buildGeometry({ kind: 'planar', lattice: 'triangular', columns: 5, rows: 5, spacingXWavelengths: 0.6 });
    const { x, y } = g.positionsWavelengths;
    const centre = 12; // row 2, column 2
    const neighbours = Array.from(x).filter((_, n) => n !== centre && Math.abs(Math.hypot(x[n] - x[centre], y[n] - y[centre]) - 0.6) < 1e-12);
    expect(neighbours.length).toBe(6);
  });
  it('circular and elliptical outlines keep the sites inside the ellipse with semi-axes columns·dx/2 and rows·dy/2', () => {
    const full = buildGeometry({ kind: 'planar', lattice: 'rectangular', columns: 20, rows: 10, spacingXWavelengths: 0.5 });
    const ellipse = buildGeometry({ kind: 'planar', lattice: 'rectangular', columns: 20, rows: 10, spacingXWavelengths: 0.5, outline: 'ellipse' });
    const circle = buildGeometry({ kind: 'planar', lattice: 'rectangular', columns: 20, rows: 10, spacingXWavelengths: 0.5, outline: 'circle' });
    expect(full.positionsWavelengths.x.length).toBe(200);
    expect(ellipse.positionsWavelengths.x.length).toBeLessThan(200);
    expect(circle.positionsWavelengths.x.length).toBeLessThan(ellipse.positionsWavelengths.x.length);
    const { x, y } = ellipse.positionsWavelengths;
    for (let n = 0; n < x.length; n++) expect((x[n] / 5) ** 2 + (y[n] / 2.5) ** 2).toBeLessThanOrEqual(1 + 1e-12);
  });
  it('uniform circular array and Y-shaped array put elements at the stated radius and arm angles', () => {
    const ring = buildGeometry({ kind: 'circular', count: 12, radiusWavelengths: 2 }).positionsWavelengths;
    for (let n = 0; n < 12; n++) expect(Math.hypot(ring.x[n], ring.y[n])).toBeCloseTo(2, 12);
    const yArray = buildGeometry({ kind: 'yShaped', elementsPerArm: 4, spacingWavelengths: 1.5, includeCentre: true }).positionsWavelengths;
    expect(yArray.x.length).toBe(13);
    const angles = new Set(Array.from(yArray.x).slice(1).map((x, n) => Math.round((Math.atan2(yArray.y[n + 1], x) * 180) / Math.PI)));
    expect([...angles].sort((a, b) => a - b)).toEqual([-150, -30, 90]);
  });
  it('volumetric, random (seeded, minimum separation) and thinned arrays are reproducible', () => {
    expect(buildGeometry({ kind: 'volumetric', countX: 3, countY: 4, countZ: 2, spacingWavelengths: 0.5 }).positionsWavelengths.z.filter((z) => z > 0).length).toBe(12);
    const spec = { count: 30, extentXWavelengths: 100, extentYWavelengths: 100, extentZWavelengths: 10, minSeparationWavelengths: 8, seed: 42 };
    const a = randomGeometry(spec), b = randomGeometry(spec);
    expect(Array.from(a.positionsWavelengths.x)).toEqual(Array.from(b.positionsWavelengths.x));
    const { x, y, z } = a.positionsWavelengths;
    for (let m = 0; m < 30; m++) for (let n = m + 1; n < 30; n++) expect(Math.hypot(x[m] - x[n], y[m] - y[n], z[m] - z[n])).toBeGreaterThanOrEqual(8);
    const thinned = thinnedGeometry(buildGeometry({ kind: 'planar', lattice: 'rectangular', columns: 40, rows: 40, spacingXWavelengths: 0.5 }), 0.5, 9);
    expect(Math.abs(thinned.positionsWavelengths.x.length / 1600 - 0.5)).toBeLessThan(0.05); // binomial: 5 % ≈ 4σ at N = 1600
    expect(() => randomGeometry({ ...spec, count: 500, minSeparationWavelengths: 50 })).toThrow(CalcInputError);
  });
  it('positions in metres convert to wavelengths at the frequency (λ = c/f)', () => {
    const g = customGeometryMetres([0, 0.15], [0, 0], [0, 0], 1e9);
    expect(g.positionsWavelengths.x[1]).toBeCloseTo(0.15 / (299_792_458 / 1e9), 12);
  });
});

describe('element patterns and image factor', () => {
  it('power pattern cosⁿθ has field w^(n/2) ahead and zero behind', () => {
    expect(elementFieldAt({ kind: 'cosine', powerExponent: 4 }, 0.6, 0, 0.8)).toBeCloseTo(0.64, 14);
    expect(elementFieldAt({ kind: 'cosine', powerExponent: 4 }, 0.6, 0, -0.8)).toBe(0);
    expect(elementFieldAt({ kind: 'cosine', powerExponent: 1.3 }, 0.6, 0, 0.8) ** 2).toBeCloseTo(0.8 ** 1.3, 14);
  });
  it('half-wave dipole along x: 1 broadside, 0 along its axis, cos(π/2·cos ψ)/sin ψ between (Balanis, "Antenna Theory", 4th ed., eq. 4-84 (equation number from memory))', () => {
    const dipole = { kind: 'halfWaveDipole' as const, axis: 'x' as const };
    expect(elementFieldAt(dipole, 0, 0, 1)).toBe(1);
    expect(elementFieldAt(dipole, 1, 0, 0)).toBe(0);
    const psi = Math.PI / 3;
    expect(elementFieldAt(dipole, Math.cos(psi), 0, Math.sin(psi))).toBeCloseTo(Math.cos((Math.PI / 2) * Math.cos(psi)) / Math.sin(psi), 14);
  });
  it('horizontal image factor 2 sin(kh cos θ): 2 at broadside for h = λ/4, 0 at h = λ/2, 0 below the plane (image theory, Balanis §4.7 (section number from memory))', () => {
    expect(groundPlaneImageFactor(0.25, 1, 'horizontal')).toBeCloseTo(2, 14);
    expect(Math.abs(groundPlaneImageFactor(0.5, 1, 'horizontal'))).toBeLessThan(1e-14);
    expect(groundPlaneImageFactor(0.25, -0.1, 'horizontal')).toBe(0);
    expect(groundPlaneImageFactor(0.25, 1, 'vertical')).toBeCloseTo(0, 14);
  });
  it('element × array factor: the total pattern includes the element pattern', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 1, spacingWavelengths: 0.5 }, element: { kind: 'halfWaveDipole', axis: 'y', groundPlaneHeightWavelengths: 0.25 } });
    expect(elementFieldAt(model.element, 0, 0, 1) ** 2).toBeCloseTo(4, 12);
  });
});

describe('taper efficiency |Σa|²/(N Σa²) (Mailloux, "Phased Array Antenna Handbook", 2nd ed., §3.1 (section number from memory))', () => {
  it('is 1 for uniform and below 1 for Taylor and cosine tapers', () => {
    expect(taperEfficiency(lineTaperWeights({ kind: 'uniform' }, 16))).toBeCloseTo(1, 14);
    expect(taperEfficiency(lineTaperWeights({ kind: 'taylor', nbar: 5, sidelobeDb: 35 }, 64))).toBeLessThan(0.95);
    expect(taperEfficiency(lineTaperWeights({ kind: 'cosineOnPedestal', pedestal: 0 }, 1000))).toBeCloseTo(8 / (Math.PI * Math.PI), 4); // cosine taper 8/π² ≈ 0.81 (Mailloux)
  });
});
