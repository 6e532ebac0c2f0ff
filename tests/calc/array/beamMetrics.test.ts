import { describe, expect, it } from 'vitest';
import { principalPlaneMetrics } from '../../../calc/array/beamMetrics';
import { buildArrayModel } from '../../../calc/array/buildArray';
import { gratingLobeDirections } from '../../../calc/array/gratingLobes';
import { brentRoot } from '../../../calc/numeric/brentRoot';
import { goldenMinimize } from '../../../calc/numeric/goldenMinimize';
import { jinc } from '../../../calc/numeric/besselJ';

const DEG = 180 / Math.PI;

describe('principalPlaneMetrics: uniform line source (textbook constants: Balanis, "Antenna Theory", 4th ed., ch. 12 (chapter number from memory) uniform aperture; Stutzman & Thiele, "Antenna Theory and Design", uniform line source)', () => {
  // 2,000 elements at λ/8 approximate a continuous line source of length L = N·d = 250 λ.
  const model = buildArrayModel({ geometry: { kind: 'linear', count: 2000, spacingWavelengths: 0.125 } });
  const { theta } = principalPlaneMetrics(model);
  it('HPBW = 0.886 λ/L rad within 0.1 %', () => {
    expect(Math.abs(theta.hpbwDeg! / DEG / (0.886 / 250) - 1)).toBeLessThan(0.001);
  });
  it('first sidelobe −13.26 dB within 0.01 dB', () => {
    expect(Math.abs(theta.peakSidelobeDb! + 13.26)).toBeLessThan(0.01);
  });
  it('FNBW = 2λ/L rad within 0.1 % (nulls of sin(Nψ/2)/sin(ψ/2), same source)', () => {
    expect(Math.abs(theta.fnbwDeg! / DEG / (2 / 250) - 1)).toBeLessThan(0.001);
  });
});

describe('uniform circular aperture (textbook constants: Balanis, "Antenna Theory", 4th ed., ch. 12 (chapter number from memory) circular aperture; Stutzman & Thiele, "Antenna Theory and Design")', () => {
  it('continuous pattern jinc(πD/λ sin θ): HPBW 1.029 λ/D rad (0.1 %) and first sidelobe −17.57 dB (0.01 dB)', () => {
    const diameter = 40;
    const power = (theta: number) => jinc(Math.PI * diameter * Math.sin(theta)) ** 2;
    const half = brentRoot((t) => power(t) - 0.5, 0, 1.5 / (Math.PI * diameter) * 1.5);
    expect(Math.abs((2 * half) / (1.029 / diameter) - 1)).toBeLessThan(0.001);
    const sidelobe = goldenMinimize((t) => -power(t), 3.9 / (Math.PI * diameter), 7 / (Math.PI * diameter));
    expect(Math.abs(10 * Math.log10(power(sidelobe)) + 17.57)).toBeLessThan(0.01);
  });
  it('a 100 × 100 λ/2 lattice cut to a circle (D = 50 λ): HPBW within 0.5 % of 1.029 λ/D, sidelobe within 0.1 dB of −17.57 dB', () => {
    const model = buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 100, rows: 100, spacingXWavelengths: 0.5, outline: 'circle' } });
    const { theta, phi } = principalPlaneMetrics(model);
    for (const plane of [theta, phi]) {
      expect(Math.abs(plane.hpbwDeg! / DEG / (1.029 / 50) - 1)).toBeLessThan(0.005);
      expect(Math.abs(plane.peakSidelobeDb! + 17.57)).toBeLessThan(0.1);
    }
  });
});

describe('beam broadening with scan', () => {
  it('long linear array: HPBW(θ0) = HPBW(0)/cos θ0 within 1 % up to 60° (Mailloux, "Phased Array Antenna Handbook", 2nd ed., ch. 1 (chapter number from memory))', () => {
    const hpbw = (scanDeg: number) => principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: 200, spacingWavelengths: 0.5 }, steering: { thetaDeg: scanDeg, phiDeg: 0 } })).theta.hpbwDeg!;
    const broadside = hpbw(0);
    for (const scan of [15, 30, 45, 60]) {
      expect(Math.abs(hpbw(scan) / (broadside / Math.cos(scan / DEG)) - 1), `θ0=${scan}`).toBeLessThan(0.01);
    }
  });
  it('uniform circular array: beamwidth changes less than 1 % with azimuth steering φ0 (ring symmetry; common practice, no source)', () => {
    const widths = [0, 7, 13, 29, 45, 77].map((phiDeg) => {
      const r = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'circular', count: 48, radiusWavelengths: 4 }, steering: { thetaDeg: 30, phiDeg } }));
      return [r.theta.hpbwDeg!, r.phi.hpbwDeg!];
    });
    for (const [t, p] of widths) {
      expect(Math.abs(t / widths[0][0] - 1)).toBeLessThan(0.01);
      expect(Math.abs(p / widths[0][1] - 1)).toBeLessThan(0.01);
    }
  });
});

describe('principalPlaneMetrics edge cases', () => {
  it('a broadside linear array has no half-power point in the plane across its axis and says so in a warning', () => {
    const r = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: 8, spacingWavelengths: 0.5 } }));
    expect(r.phi.hpbwDeg).toBeUndefined();
    expect(r.warnings.map((w) => w.code)).toContain('no-half-power-point');
  });
});

/** Uniform N-element line array factor power at u − u0 for spacing d (λ): |sin(Nπd·Δu)/(N sin(πd·Δu))|² (Balanis, "Antenna Theory", 4th ed., §6.3 (section number from memory)). */
function uniformLinePower(count: number, spacing: number, du: number): number {
  const x = Math.PI * spacing * du;
  return Math.abs(Math.sin(x)) < 1e-15 ? 1 : (Math.sin(count * x) / (count * Math.sin(x))) ** 2;
}
/** Highest sidelobe of that array factor between its first and second nulls (golden-section search on the formula). */
function uniformLineFirstSidelobeDb(count: number, spacing: number): number {
  const du = goldenMinimize((x) => -uniformLinePower(count, spacing, x), 1 / (count * spacing), 2 / (count * spacing), 1e-14);
  return 10 * Math.log10(uniformLinePower(count, spacing, du));
}

describe('principalPlaneMetrics: grating lobes are not sidelobes, and the horizon counts', () => {
  it('an 8-element 1 λ line at broadside: both grating lobes sit exactly at θ = ±90° at 0 dB (array factor periodic in u with period λ/d, Mailloux, "Phased Array Antenna Handbook", 2nd ed., §2.1 (section number from memory)) and the peak sidelobe is the −12.80 dB first sidelobe (Balanis §6.3 (section number from memory) formula), to 1e-9 dB', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 8, spacingWavelengths: 1 } });
    const { theta } = principalPlaneMetrics(model);
    expect(theta.gratingLobeDb!).toBeCloseTo(0, 9);
    expect(Math.abs(theta.gratingLobeOffsetDeg!)).toBeCloseTo(90, 9);
    expect(theta.peakSidelobeDb!).toBeCloseTo(uniformLineFirstSidelobeDb(8, 1), 9);
    expect(theta.peakSidelobeDb!).toBeCloseTo(-12.797, 3);
    // consistent with gratingLobeDirections, which counts the two lobes on the horizon (u = ±1)
    const lobes = gratingLobeDirections(model.lattice!.vectorsWavelengths, model.beam);
    expect(lobes.map((l) => l.thetaDeg)).toEqual([90, 90]);
  });
  it('a lobe centred just outside visible space (8 × 0.98 λ) is a grating lobe where it reaches the horizon: its level there equals the array factor at u = 1, to 1e-9 dB (Balanis §6.3 (section number from memory) formula)', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 8, spacingWavelengths: 0.98 } });
    const { theta } = principalPlaneMetrics(model);
    expect(gratingLobeDirections(model.lattice!.vectorsWavelengths, model.beam)).toHaveLength(0);
    expect(theta.gratingLobeDb!).toBeCloseTo(10 * Math.log10(uniformLinePower(8, 0.98, 1)), 9);
    expect(Math.abs(theta.gratingLobeOffsetDeg!)).toBe(90);
    expect(theta.peakSidelobeDb!).toBeCloseTo(uniformLineFirstSidelobeDb(8, 0.98), 9);
  });
  it('a sidelobe that peaks beyond the horizon is measured at θ = ±90° (4 × 0.3 λ: the pattern rises from its first null to u = 1), to 1e-9 dB of the Balanis §6.3 (section number from memory) formula', () => {
    const { theta } = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: 4, spacingWavelengths: 0.3 } }));
    expect(theta.peakSidelobeDb!).toBeCloseTo(10 * Math.log10(uniformLinePower(4, 0.3, 1)), 9); // −14.82 dB
    expect(Math.abs(theta.peakSidelobeOffsetDeg!)).toBe(90);
    expect(theta.gratingLobeDb).toBeUndefined();
  });
  it('a 0.9 λ line steered to 35°: the grating lobe at asin(sin 35° − 1/0.9) is reported at 0 dB and the peak sidelobe stays near −13 dB (Mailloux §2.1 (section number from memory))', () => {
    const { theta } = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: 12, spacingWavelengths: 0.9 }, steering: { thetaDeg: 35, phiDeg: 0 } }));
    const lobeDeg = Math.asin(Math.sin(35 / DEG) - 1 / 0.9) * DEG;
    expect(theta.gratingLobeDb!).toBeCloseTo(0, 9);
    expect(theta.gratingLobeOffsetDeg!).toBeCloseTo(lobeDeg - 35, 6);
    expect(theta.peakSidelobeDb!).toBeLessThan(-12.5);
  });
  it('an array with no lattice (ring) reports no grating lobe; every high lobe is a sidelobe', () => {
    const { theta } = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'circular', count: 16, radiusWavelengths: 2 } }));
    expect(theta.gratingLobeDb).toBeUndefined();
    expect(theta.peakSidelobeDb).toBeDefined();
  });
});

describe('principalPlaneMetrics: beam peak offset', () => {
  it('is exactly 0 at broadside for arrays symmetric about the normal (line, square and triangular planar, ring)', () => {
    const specs = [
      { geometry: { kind: 'linear', count: 16, spacingWavelengths: 0.5 } },
      { geometry: { kind: 'planar', lattice: 'rectangular', columns: 8, rows: 8, spacingXWavelengths: 0.5 } },
      { geometry: { kind: 'planar', lattice: 'triangular', columns: 8, rows: 8, spacingXWavelengths: 0.5 } },
      { geometry: { kind: 'circular', count: 24, radiusWavelengths: 2 }, element: { kind: 'cosine', powerExponent: 2 } },
    ] as const;
    for (const spec of specs) {
      const { theta, phi } = principalPlaneMetrics(buildArrayModel(spec as never));
      expect(theta.peakOffsetDeg, spec.geometry.kind).toBe(0);
      expect(phi.peakOffsetDeg, spec.geometry.kind).toBe(0);
    }
  });
  it('is below 1e-9° for steered isotropic arrays, whose array-factor peak is exactly at θ0 (progressive phase, Mailloux §1 (section number from memory))', () => {
    for (const thetaDeg of [10, 30, 55]) {
      const { theta } = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 12, rows: 10, spacingXWavelengths: 0.5 }, steering: { thetaDeg, phiDeg: 20 } }));
      expect(Math.abs(theta.peakOffsetDeg), `θ0=${thetaDeg}`).toBeLessThan(1e-9);
    }
  });
  it('with a cos θ element the peak is the root of the analytic pattern derivative: 6 × λ/2 line steered to 40° peaks about 2.46° toward broadside (derivative of |AF|²cos²θ written out from the Balanis §6.3 (section number from memory) array factor, root by Brent here), within 1e-8°', () => {
    const count = 6, x0 = Math.sin(40 / DEG);
    const derivative = (theta: number) => {
      const x = Math.PI * 0.5 * (Math.sin(theta) - x0), dx = Math.PI * 0.5 * Math.cos(theta);
      const af = Math.sin(count * x) / (count * Math.sin(x));
      const dAf = (count * Math.cos(count * x) * Math.sin(x) - Math.sin(count * x) * Math.cos(x)) / (count * Math.sin(x) ** 2);
      return 2 * af * dAf * dx * Math.cos(theta) ** 2 - 2 * af * af * Math.cos(theta) * Math.sin(theta);
    };
    const peakDeg = brentRoot(derivative, 35 / DEG, 39.99 / DEG, 1e-16) * DEG;
    const { theta } = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count, spacingWavelengths: 0.5 }, steering: { thetaDeg: 40, phiDeg: 0 }, element: { kind: 'cosine', powerExponent: 2 } }));
    expect(peakDeg - 40).toBeCloseTo(-2.46, 2);
    expect(Math.abs(theta.peakOffsetDeg - (peakDeg - 40))).toBeLessThan(1e-8);
  });
  it('follows the element pattern when it pulls the beam: a 4 × λ/2 line of cos θ elements steered to 50° peaks between broadside and 50°', () => {
    const { theta } = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: 4, spacingWavelengths: 0.5 }, steering: { thetaDeg: 50, phiDeg: 0 }, element: { kind: 'cosine', powerExponent: 2 } }));
    expect(theta.peakOffsetDeg).toBeLessThan(-1);
    expect(theta.peakOffsetDeg).toBeGreaterThan(-50);
  });
});
