import { describe, expect, it } from 'vitest';
import { freeSpaceWavelengthM, mediumWavelengthM, wavenumberRadPerM } from '../../calc/wavelength';
import { CalcInputError } from '../../calc/errors';

// c = 299 792 458 m/s exactly (SI Brochure, 9th ed., BIPM 2019).
describe('freeSpaceWavelengthM(frequencyHz) returns metres', () => {
  it('is c/f with c exact: 1 GHz → 0.299792458 m', () => {
    expect(freeSpaceWavelengthM(1e9)).toBe(0.299792458);
  });
  it('10 GHz → 29.9792458 mm (tolerance 1e-15 m)', () => {
    expect(Math.abs(freeSpaceWavelengthM(10e9) - 0.0299792458)).toBeLessThan(1e-15);
  });
  it('299.792458 MHz → exactly 1 m', () => {
    expect(freeSpaceWavelengthM(299_792_458)).toBe(1);
  });
  it('rejects zero, negative and non-finite frequencies with a CalcInputError naming the parameter', () => {
    for (const bad of [0, -1, Number.NaN, Infinity]) {
      expect(() => freeSpaceWavelengthM(bad)).toThrow(CalcInputError);
    }
    expect(() => freeSpaceWavelengthM(0)).toThrow(/frequencyHz/);
  });
});

describe('mediumWavelengthM(frequencyHz, εr)', () => {
  it('is λ0/√εr: εr = 4 halves the wavelength (plane-wave relation, any EM text)', () => {
    expect(mediumWavelengthM(1e9, 4)).toBeCloseTo(0.299792458 / 2, 15);
  });
  it('rejects εr < 1', () => {
    expect(() => mediumWavelengthM(1e9, 0.5)).toThrow(/relativePermittivity/);
  });
});

describe('wavenumberRadPerM', () => {
  it('is 2π/λ0', () => {
    expect(wavenumberRadPerM(1e9)).toBeCloseTo((2 * Math.PI) / 0.299792458, 12);
  });
});
