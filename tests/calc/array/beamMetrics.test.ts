import { describe, expect, it } from 'vitest';
import { principalPlaneMetrics } from '../../../calc/array/beamMetrics';
import { buildArrayModel } from '../../../calc/array/buildArray';
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
