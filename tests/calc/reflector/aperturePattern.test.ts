import { describe, expect, it } from 'vitest';
import { apertureField, apertureFieldSlope, beamFigures, tabulateAperture } from '../../../calc/reflector/aperturePattern';
import { rimHalfAngleRad } from '../../../calc/reflector/geometry';
import { feedPowerPattern } from '../../../calc/reflector/feedPattern';
import { jinc } from '../../../calc/numeric/besselJ';
import fixture from '../../fixtures/reflector-efficiency.json';

function feedAperture(fd: number, q: number) {
  const half = Math.tan(rimHalfAngleRad(fd) / 2);
  return (t: number) => {
    const psi = 2 * Math.atan(t * half);
    return Math.sqrt(feedPowerPattern(q, psi)) * Math.cos(psi / 2) ** 2;
  };
}

describe('Hankel transform of a uniform aperture', () => {
  const uniform = tabulateAperture(() => 1);
  it('equals the jinc pattern 2J1(u)/u for u up to 40 (Airy pattern, any optics text; 1e-10)', () => {
    for (let u = 0; u <= 40; u += 0.37) expect(apertureField(uniform, u)).toBeCloseTo(jinc(u), 10);
  });
  it('slope matches a central difference (1e-7)', () => {
    for (const u of [0.5, 3, 7.7]) {
      const h = 1e-5;
      expect(apertureFieldSlope(uniform, u)).toBeCloseTo((apertureField(uniform, u + h) - apertureField(uniform, u - h)) / (2 * h), 7);
    }
  });
  it('HPBW = 1.029 λ/D, first null at u = 3.8317, first sidelobe −17.57 dB at u = 5.1356 (uniform circular aperture: Balanis, Antenna Theory, 4th ed., §12.7, table of circular-aperture figures — table number from memory; A&S Table 9.5 (table number from memory) for the J1 zero)', () => {
    const b = beamFigures(uniform)!;
    // HPBW in radians for large D/λ: 2u3/(π D/λ) → 2·u3/π times λ/D
    expect((2 * b.halfPowerU) / Math.PI).toBeCloseTo(1.029, 3);
    expect(b.firstNullU).toBeCloseTo(3.8317059702075125, 10);
    expect(b.firstSidelobeU!).toBeCloseTo(5.1356223, 6);
    expect(b.firstSidelobeDb!).toBeCloseTo(-17.57, 2);
  });
  it('a uniform annulus (inner radius 0.3) narrows the beam and raises the first sidelobe (closed form [jinc(u) − ε² jinc(εu)]/(1 − ε²), hand-derived; 1e-10)', () => {
    const eps = 0.3;
    const annulus = tabulateAperture(() => 1, eps);
    const closed = (u: number) => (jinc(u) - eps * eps * jinc(eps * u)) / (1 - eps * eps);
    for (const u of [0.7, 2.2, 4.4, 9]) expect(apertureField(annulus, u)).toBeCloseTo(closed(u), 10);
    const b = beamFigures(annulus)!;
    expect(b.halfPowerU).toBeLessThan(1.6163);
    expect(b.firstSidelobeDb!).toBeGreaterThan(-17.57);
  });
});

describe('reflector aperture patterns', () => {
  it('beam figures match SciPy quad + brentq (scripts/fixtures/reflector_efficiency.py): u to 1e-8, sidelobe to 1e-6 dB', () => {
    for (const c of fixture.patterns) {
      const b = beamFigures(tabulateAperture(feedAperture(c.focalRatio, c.powerExponent), c.innerFraction))!;
      expect(Math.abs(b.halfPowerU - c.halfPowerU)).toBeLessThan(1e-8);
      expect(Math.abs(b.firstNullU - c.firstNullU)).toBeLessThan(1e-8);
      expect(Math.abs(b.firstSidelobeU! - c.firstSidelobeU)).toBeLessThan(1e-7);
      expect(Math.abs(b.firstSidelobeDb! - c.firstSidelobeDb)).toBeLessThan(1e-6);
    }
  });
  it('tends to the uniform-aperture figures as q → 0 and f/D grows (q = 0, f/D = 30: 1.029 λ/D to 1e-3, −17.57 dB to 0.01 dB)', () => {
    const b = beamFigures(tabulateAperture(feedAperture(30, 0)))!;
    expect((2 * b.halfPowerU) / Math.PI).toBeCloseTo(1.029, 3);
    expect(b.firstSidelobeDb!).toBeCloseTo(-17.57, 2);
  });
  it('about −10 dB edge taper gives HPBW ≈ 70 λ/D degrees (rule of thumb: common practice, no source; ±6 %)', () => {
    // q = 2 at f/D = 0.4 is a −10.03 dB edge taper
    const b = beamFigures(tabulateAperture(feedAperture(0.4, 2)))!;
    const factorDeg = ((2 * b.halfPowerU) / Math.PI) * (180 / Math.PI);
    expect(factorDeg).toBeGreaterThan(70 * 0.94);
    expect(factorDeg).toBeLessThan(70 * 1.06);
  });
  it('stronger taper widens the beam and lowers the first sidelobe (monotone in q at f/D = 0.5)', () => {
    let previous = beamFigures(tabulateAperture(feedAperture(0.5, 0)))!;
    for (const q of [2, 5, 10, 20]) {
      const b = beamFigures(tabulateAperture(feedAperture(0.5, q)))!;
      expect(b.halfPowerU).toBeGreaterThan(previous.halfPowerU);
      expect(b.firstSidelobeDb!).toBeLessThan(previous.firstSidelobeDb!);
      previous = b;
    }
  });
});
