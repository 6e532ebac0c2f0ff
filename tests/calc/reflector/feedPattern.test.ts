import { describe, expect, it } from 'vitest';
import { edgeTaperDb, feedEdgeLevelDb, feedPowerPattern, powerExponentForEdgeTaper } from '../../../calc/reflector/feedPattern';
import { rimHalfAngleRad } from '../../../calc/reflector/geometry';
import { CalcInputError } from '../../../calc/errors';

const rad = (d: number) => (d * Math.PI) / 180;

describe('cos^q ψ POWER-pattern feed', () => {
  it('feedPowerPattern is cos^q ψ in front and 0 behind', () => {
    expect(feedPowerPattern(2, rad(60))).toBeCloseTo(0.25, 14);
    expect(feedPowerPattern(0, rad(80))).toBe(1);
    expect(feedPowerPattern(3, rad(100))).toBe(0);
  });
  it('the q = 2 power pattern falls 6.02 dB at 60° (10·2·log10 0.5, hand-worked): power, not field, convention', () => {
    expect(feedEdgeLevelDb(2, rad(60))).toBeCloseTo(-6.0206, 4);
  });
  it('edgeTaperDb(2, 66°) = −7.814 − 3.056 = −10.870 dB with space attenuation (hand-worked; Balanis 4th ed. §15.4.1 (section number from memory) puts the optimum near −11 dB)', () => {
    expect(edgeTaperDb(2, rad(66))).toBeCloseTo(-10.870077909836, 9);
  });
  it('powerExponentForEdgeTaper inverts edgeTaperDb (round trip to 1e-10)', () => {
    for (const fd of [0.26, 0.3, 0.4, 0.6, 1, 3]) {
      const psi0 = rimHalfAngleRad(fd);
      for (const q of [0, 0.5, 2, 7.3, 40]) {
        const taper = edgeTaperDb(q, psi0);
        expect(powerExponentForEdgeTaper(taper, psi0)).toBeCloseTo(q, 8);
      }
    }
  });
  it('rejects a taper weaker than the space attenuation alone (q would be negative) and a positive taper', () => {
    const psi0 = rimHalfAngleRad(0.4); // space attenuation −2.86 dB
    expect(() => powerExponentForEdgeTaper(-2, psi0)).toThrow(CalcInputError);
    expect(() => powerExponentForEdgeTaper(3, psi0)).toThrow(CalcInputError);
    expect(() => powerExponentForEdgeTaper(Number.NaN, psi0)).toThrow(CalcInputError);
  });
});
