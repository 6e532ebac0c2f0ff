import { describe, expect, it } from 'vitest';
import { farFieldDistanceM } from '../../../calc/aperture/farFieldDistance';
import { computeReflector, createReflectorCalculator } from '../../../calc/calculators/reflector';
import { defaultTexts, validateAll } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';
import { farFieldBoundaryM } from '../../../calc/exposure/powerDensity';
import { freeSpaceWavelengthM } from '../../../calc/wavelength';
import { CalcInputError } from '../../../calc/errors';

describe('farFieldDistanceM(D, λ) = 2D²/λ (IEEE Std 149-2021, IEEE Recommended Practice for Antenna Measurements)', () => {
  it('3 m at λ = 0.1 m: 2·9/0.1 = 180 m (hand-worked)', () => {
    expect(farFieldDistanceM(3, 0.1)).toBeCloseTo(180, 10);
  });
  it('at 2D²/λ the path from the aperture edge exceeds the path from the centre by λ/16 to first order (phase π/8; hand-derived: √(R² + (D/2)²) − R ≈ D²/(8R))', () => {
    const d = 2;
    const l = 0.05;
    const r = farFieldDistanceM(d, l);
    expect((Math.sqrt(r * r + (d / 2) ** 2) - r) / l).toBeCloseTo(1 / 16, 4);
  });
  it('is the one relation behind the reflector page and range & exposure (identical values)', () => {
    const def = createReflectorCalculator(teamConventions);
    const dish = computeReflector(validateAll(def, defaultTexts(def)).inputs!);
    expect(dish.values.farFieldDistanceM).toBe(farFieldDistanceM(dish.values.diameterM as number, dish.values.wavelengthM as number));
    expect(farFieldBoundaryM(1.8, 12e9)).toBe(farFieldDistanceM(1.8, freeSpaceWavelengthM(12e9)));
  });
  it('rejects a non-positive size or wavelength', () => {
    expect(() => farFieldDistanceM(0, 0.1)).toThrow(CalcInputError);
    expect(() => farFieldDistanceM(1, 0)).toThrow(CalcInputError);
  });
});
