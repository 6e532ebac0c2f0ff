import { describe, expect, it } from 'vitest';
import { apertureField, apertureFieldSlope, beamFigures, sidelobePeaks, tabulateAperture } from '../../../calc/reflector/aperturePattern';
import { rimHalfAngleRad } from '../../../calc/reflector/geometry';
import { feedPowerPattern } from '../../../calc/reflector/feedPattern';
import { jinc } from '../../../calc/numeric/besselJ';
import fixture from '../../../verification/fixtures/reflector-efficiency.json';
import sidelobeFixture from '../../../verification/fixtures/reflector-sidelobes.json';

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

describe('sidelobes with a central blockage (first = first local maximum of |F| after the first null)', () => {
  it('blockage sweep 0…0.30 D at f/D 0.4/−10 dB, 0.3/−15 dB, 0.5/−12 dB: first and highest sidelobe match NumPy/SciPy (scripts/fixtures/reflector_sidelobes.py): u to 1e-6, level to 1e-6 dB', () => {
    expect(sidelobeFixture.cases.length).toBe(95);
    for (const c of sidelobeFixture.cases) {
      const b = beamFigures(tabulateAperture(feedAperture(c.focalRatio, c.powerExponent), c.innerFraction))!;
      const where = `f/D ${c.focalRatio}, q ${c.powerExponent.toFixed(3)}, blockage ${c.innerFraction}`;
      expect(Math.abs(b.firstSidelobeU! - c.firstSidelobeU), where).toBeLessThan(1e-6);
      expect(Math.abs(b.firstSidelobeDb! - c.firstSidelobeDb), where).toBeLessThan(1e-6);
      expect(Math.abs(b.highestSidelobeU! - c.highestSidelobeU), where).toBeLessThan(1e-6);
      expect(Math.abs(b.highestSidelobeDb! - c.highestSidelobeDb), where).toBeLessThan(1e-6);
    }
  });
  it('at blockage 0.20 D (f/D 0.4, −10 dB) the first sidelobe is −18.07 dB near u = 5.66, not a later lobe (SciPy fixture; the old between-nulls search gave −35.9 dB at u = 17.8)', () => {
    const c = sidelobeFixture.cases.find((x) => x.focalRatio === 0.4 && x.innerFraction === 0.2)!;
    expect(c.firstSidelobeDb).toBeCloseTo(-18.067, 2);
    const b = beamFigures(tabulateAperture(feedAperture(0.4, c.powerExponent), 0.2))!;
    expect(b.firstSidelobeU!).toBeLessThan(6);
    expect(b.firstSidelobeDb!).toBeCloseTo(c.firstSidelobeDb, 6);
  });
  it('a strongly tapered feed (q = 12, f/D 0.5) with a 0.1 D blockage has its highest sidelobe after the first (SciPy fixture: −32.8 dB first, −29.6 dB highest)', () => {
    const c = sidelobeFixture.cases.find((x) => x.powerExponent === 12 && x.innerFraction === 0.1)!;
    expect(c.highestSidelobeDb - c.firstSidelobeDb).toBeGreaterThan(2);
    const b = beamFigures(tabulateAperture(feedAperture(0.5, 12), 0.1))!;
    expect(b.highestSidelobeU!).toBeGreaterThan(b.firstSidelobeU!);
    expect(b.highestSidelobeDb!).toBeCloseTo(c.highestSidelobeDb, 6);
  });
  it('every first sidelobe is a local maximum of |F| with no higher sample between the first null and it (brute-force scan, step 1e-3)', () => {
    for (const blockage of [0.13, 0.15, 0.2, 0.3]) {
      const table = tabulateAperture(feedAperture(0.4, 4), blockage);
      const b = beamFigures(table)!;
      let u = b.firstNullU;
      let previous = 0;
      for (; u < b.firstSidelobeU! - 1e-3; u += 1e-3) {
        const v = Math.abs(apertureField(table, u));
        expect(v).toBeGreaterThanOrEqual(previous - 1e-12);
        previous = v;
      }
      expect(Math.abs(apertureField(table, b.firstSidelobeU! + 1e-3))).toBeLessThan(Math.abs(apertureField(table, b.firstSidelobeU!)));
    }
  });
  it('the uniform disc: highest sidelobe = first sidelobe = −17.57 dB (Airy pattern)', () => {
    const b = beamFigures(tabulateAperture(() => 1))!;
    expect(b.highestSidelobeU).toBe(b.firstSidelobeU);
    expect(b.highestSidelobeDb!).toBeCloseTo(-17.57, 2);
  });
  it('sidelobe search respects its limit (sidelobeLimitU below the first sidelobe gives none) and sidelobePeaks returns null on a range without a maximum', () => {
    const uniform = tabulateAperture(() => 1);
    const b = beamFigures(uniform, 80, 4.5)!;
    expect(b.firstSidelobeU).toBeNull();
    expect(b.highestSidelobeDb).toBeNull();
    expect(sidelobePeaks(uniform, 3.9, 5)).toBeNull();
  });
});
