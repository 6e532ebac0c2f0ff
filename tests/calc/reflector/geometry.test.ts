import { describe, expect, it } from 'vitest';
import {
  apertureRadiusAtFeedAngleM,
  dishDepthM,
  feedAngleAtApertureRadiusRad,
  focalLengthM,
  focusToReflectorM,
  rimHalfAngleRad,
  spaceAttenuationDb,
} from '../../../calc/reflector/geometry';
import { CalcInputError } from '../../../calc/errors';

const deg = (rad: number) => (rad * 180) / Math.PI;

// Source for every relation here: paraboloid geometry, Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory).
describe('reflector geometry', () => {
  it('focalLengthM(D, f/D) = (f/D)·D in metres', () => {
    expect(focalLengthM(1.2, 0.4)).toBeCloseTo(0.48, 14);
  });
  it('dishDepthM(D, f) = D²/(16 f): 1.2 m at f = 0.48 m is 0.1875 m (hand-worked)', () => {
    expect(dishDepthM(1.2, 0.48)).toBeCloseTo(0.1875, 14);
  });
  it('rimHalfAngleRad(0.25) = 90° (focus in the rim plane) and (0.5) = 2·atan(0.5) = 53.130° (hand-worked)', () => {
    expect(deg(rimHalfAngleRad(0.25))).toBeCloseTo(90, 12);
    expect(deg(rimHalfAngleRad(0.5))).toBeCloseTo(53.13010235415598, 12);
  });
  it('the rim ray reaches ρ = D/2 and travels r = f + z_rim from the focus (tolerance 1e-12)', () => {
    const d = 2;
    const f = focalLengthM(d, 0.35);
    const psi0 = rimHalfAngleRad(0.35);
    expect(apertureRadiusAtFeedAngleM(f, psi0)).toBeCloseTo(d / 2, 12);
    expect(feedAngleAtApertureRadiusRad(f, d / 2)).toBeCloseTo(psi0, 12);
    // distance to a paraboloid point equals its distance to the directrix: f + ρ²/(4f)
    expect(focusToReflectorM(f, psi0)).toBeCloseTo(f + (d * d) / 4 / (4 * f), 12);
  });
  it('spaceAttenuationDb is 0 on axis and −6.02 dB at ψ = 90° (20·log10(1/2), hand-worked)', () => {
    expect(spaceAttenuationDb(0)).toBe(0);
    expect(spaceAttenuationDb(Math.PI / 2)).toBeCloseTo(-6.0206, 4);
  });
  it('rejects invalid input with CalcInputError', () => {
    expect(() => focalLengthM(-1, 0.4)).toThrow(CalcInputError);
    expect(() => rimHalfAngleRad(0)).toThrow(CalcInputError);
    expect(() => dishDepthM(1, Number.NaN)).toThrow(CalcInputError);
  });
});
