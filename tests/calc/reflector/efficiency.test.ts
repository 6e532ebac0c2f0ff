import { describe, expect, it } from 'vitest';
import { illuminationEfficiencies, optimumIllumination, spilloverEfficiency, reflectorTaperEfficiency } from '../../../calc/reflector/efficiency';
import { rimHalfAngleRad } from '../../../calc/reflector/geometry';
import { edgeTaperDb } from '../../../calc/reflector/feedPattern';
import { goldenMinimize } from '../../../calc/numeric/goldenMinimize';
import { CalcInputError } from '../../../calc/errors';
import fixture from '../../../verification/fixtures/reflector-efficiency.json';

describe('spillover and taper efficiency against SciPy quad (scripts/fixtures/reflector_efficiency.py)', () => {
  it('match to 2e-6 absolute for f/D 0.3…2 and q 0…40', () => {
    for (const c of fixture.efficiencies) {
      const e = illuminationEfficiencies(c.powerExponent, rimHalfAngleRad(c.focalRatio));
      expect(Math.abs(e.spillover - c.spillover), `spillover f/D=${c.focalRatio} q=${c.powerExponent}`).toBeLessThan(2e-6);
      expect(Math.abs(e.taper - c.taper), `taper f/D=${c.focalRatio} q=${c.powerExponent}`).toBeLessThan(2e-6);
    }
  });
  it('the optimum (scan + golden section) matches SciPy minimize_scalar: efficiency to 1e-6, edge taper to 0.02 dB', () => {
    for (const c of fixture.optimum) {
      const o = optimumIllumination(rimHalfAngleRad(c.focalRatio));
      expect(Math.abs(o.efficiency - c.efficiency)).toBeLessThan(1e-6);
      expect(Math.abs(o.edgeTaperDb - c.edgeTaperDb)).toBeLessThan(0.02);
    }
  });
});

describe('spillover and taper efficiency: closed forms and textbook results', () => {
  it('spillover equals the closed form 1 − cos^(q+1) ψ0 of the cos^q power pattern (hand-derived; 5e-11)', () => {
    for (const fd of [0.26, 0.35, 0.5, 1, 3]) {
      const psi0 = rimHalfAngleRad(fd);
      for (const q of [0, 1, 2.5, 8, 100, 600]) {
        expect(spilloverEfficiency(q, psi0)).toBeCloseTo(1 - Math.cos(psi0) ** (q + 1), 10);
      }
    }
  });
  it('taper for q = 2 at f/D = 0.5 equals the closed form 2[2S/(1+S) − ln(1+S)]²/(S (1 − 0.6³)/3), S = 1/4 (hand-derived; 1e-12)', () => {
    const s = 0.25;
    const i1 = (2 * s) / (1 + s) - Math.log(1 + s);
    expect(reflectorTaperEfficiency(2, rimHalfAngleRad(0.5))).toBeCloseTo((2 * i1 * i1) / (s * ((1 - 0.6 ** 3) / 3)), 12);
  });
  it('for cos^n feeds n = 2, 4, 6, 8 the best rim angle is about 66°, 53.5°, 46.5°, 42°, with spillover × taper ≈ 0.82–0.83 and an edge taper near −11 dB (Balanis, Antenna Theory, 4th ed., §15.4.1 (section number from memory), figure of aperture efficiency vs ψ0 for cos^n feeds; angles read from the figure, ±1.5°)', () => {
    for (const [n, psiDeg] of [[2, 66], [4, 53.5], [6, 46.5], [8, 42]] as const) {
      const best = goldenMinimize((psi) => -illuminationEfficiencies(n, psi).aperture, 0.3, 1.5, 1e-8);
      expect(Math.abs((best * 180) / Math.PI - psiDeg)).toBeLessThan(1.5);
      const e = illuminationEfficiencies(n, best).aperture;
      expect(e).toBeGreaterThan(0.81);
      expect(e).toBeLessThan(0.835);
      expect(edgeTaperDb(n, best)).toBeGreaterThan(-11.5);
      expect(edgeTaperDb(n, best)).toBeLessThan(-10);
    }
  });
  it('optimumIllumination gives a −10 to −11 dB edge taper and 0.81–0.83 efficiency for f/D 0.4…1, where the optimum q ≥ 2 (textbook rule, Balanis 4th ed. §15.4.1 (section number from memory); deeper dishes want q < 2 and reach a little more)', () => {
    for (const fd of [0.4, 0.5, 0.7, 1]) {
      const o = optimumIllumination(rimHalfAngleRad(fd));
      expect(o.edgeTaperDb).toBeGreaterThan(-11.2);
      expect(o.edgeTaperDb).toBeLessThan(-10);
      expect(o.efficiency).toBeGreaterThan(0.81);
      expect(o.efficiency).toBeLessThan(0.835);
    }
  });
  it('uniform feed (q = 0) on a very shallow dish tends to full taper efficiency and tiny spillover', () => {
    const e = illuminationEfficiencies(0, rimHalfAngleRad(50));
    expect(e.taper).toBeGreaterThan(0.99999);
    expect(e.spillover).toBeLessThan(1e-4);
  });
  it('rejects invalid input with CalcInputError', () => {
    expect(() => illuminationEfficiencies(-1, 1)).toThrow(CalcInputError);
    expect(() => illuminationEfficiencies(2, 2)).toThrow(CalcInputError);
    expect(() => illuminationEfficiencies(Number.NaN, 1)).toThrow(CalcInputError);
  });
});
