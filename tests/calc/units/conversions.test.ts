import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { electricFieldFromPowerDensityVPerM, FREE_SPACE_IMPEDANCE_OHM, magneticFieldFromPowerDensityAPerM, powerDensityFromElectricFieldWPerM2 } from '../../../calc/units/planeWave';
import { dbdToDbi, dbiToDbd } from '../../../calc/units/gainReference';
import { freeSpaceFrequencyHz, freeSpaceWavelengthM } from '../../../calc/wavelength';
import { carrierToNoiseDensityFromEbN0DbHz, ebN0Db } from '../../../calc/link/carrierToNoise';
import { computeUnitConverter, createUnitConverterCalculator } from '../../../calc/calculators/unitConverter';
import { defaultTexts, validateAll } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';

describe('plane wave in free space', () => {
  it('10 W/m² is 61.38 V/m and 0.1629 A/m (η₀ = 376.73 Ω, CODATA 2018; hand-worked √(10·376.73))', () => {
    expect(electricFieldFromPowerDensityVPerM(10)).toBeCloseTo(61.37836, 5);
    expect(magneticFieldFromPowerDensityAPerM(10)).toBeCloseTo(0.162924, 6);
    expect(electricFieldFromPowerDensityVPerM(10) / magneticFieldFromPowerDensityAPerM(10)).toBeCloseTo(FREE_SPACE_IMPEDANCE_OHM, 9);
  });
  it('η₀ equals μ₀c with μ₀ ≈ 4π×10⁻⁷ H/m to 1e-9 relative (CODATA 2018, from memory)', () => {
    expect(Math.abs(FREE_SPACE_IMPEDANCE_OHM / (4e-7 * Math.PI * 299_792_458) - 1)).toBeLessThan(1e-9);
  });
  it('density → field → density is the identity (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), (s) => {
      expect(powerDensityFromElectricFieldWPerM2(electricFieldFromPowerDensityVPerM(s))).toBeCloseTo(s, 6);
    }));
  });
  it('rejects a negative density or field, naming the input', () => {
    expect(() => electricFieldFromPowerDensityVPerM(-1)).toThrow(/powerDensityWPerM2/);
    expect(() => powerDensityFromElectricFieldWPerM2(-1)).toThrow(/electricFieldVPerM/);
  });
});

describe('dBi ↔ dBd, frequency ↔ wavelength, Eb/N₀ ↔ C/N₀: there and back is the identity', () => {
  it('dBd = dBi − 2.15 (half-wave dipole; common practice)', () => {
    expect(dbiToDbd(10)).toBeCloseTo(7.85, 12);
    fc.assert(fc.property(fc.double({ min: -100, max: 100, noNaN: true }), (g) => {
      expect(dbdToDbi(dbiToDbd(g))).toBeCloseTo(g, 9);
    }));
  });
  it('f → λ → f (property); 10 GHz is 2.998 cm', () => {
    expect(freeSpaceWavelengthM(10e9)).toBeCloseTo(0.0299792458, 12);
    fc.assert(fc.property(fc.double({ min: 1, max: 1e15, noNaN: true }), (f) => {
      expect(freeSpaceFrequencyHz(freeSpaceWavelengthM(f)) / f).toBeCloseTo(1, 12);
    }));
    expect(() => freeSpaceFrequencyHz(0)).toThrow(/wavelengthM/);
  });
  it('Eb/N₀ → C/N₀ → Eb/N₀ (property); 10 dB at 1 Mbit/s is 70 dB·Hz', () => {
    expect(carrierToNoiseDensityFromEbN0DbHz(10, 1e6)).toBeCloseTo(70, 12);
    fc.assert(fc.property(fc.double({ min: -20, max: 40, noNaN: true }), fc.double({ min: 1, max: 1e12, noNaN: true }), (e, rb) => {
      expect(ebN0Db(carrierToNoiseDensityFromEbN0DbHz(e, rb), rb)).toBeCloseTo(e, 9);
    }));
  });
});

describe('unit-converter calculator', () => {
  const def = createUnitConverterCalculator(teamConventions);
  const at = (texts: Record<string, string>) => computeUnitConverter(validateAll(def, { ...defaultTexts(def), ...texts }).inputs!).values;
  it('reads a power typed as dBm, dBW or W alike: 30 dBm = 0 dBW = 1 W', () => {
    for (const p of ['30 dBm', '0 dBW', '1 W', '1000 mW']) {
      const v = at({ p });
      expect(v.powerW).toBeCloseTo(1, 12);
      expect(v.powerDbm).toBeCloseTo(30, 12);
      expect(v.powerDbw).toBeCloseTo(0, 12);
    }
  });
  it('1 mW/cm² is 10 W/m²; VSWR 2 gives |Γ| 1/3 and 9.54 dB return loss; 20 dB return loss is VSWR 1.222 (hand-worked)', () => {
    expect(at({ s: '1 mW/cm2' }).densityWPerM2).toBeCloseTo(10, 12);
    expect(at({ s: '1 mW/cm2' }).densityMwPerCm2).toBeCloseTo(1, 12);
    const v = at({ vswr: '2', rl: '20 dB' });
    expect(v.reflectionMagnitude).toBeCloseTo(1 / 3, 12);
    expect(v.returnLossDb).toBeCloseTo(9.5424, 4);
    expect(v.vswrFromReturnLoss).toBeCloseTo(1.1 / 0.9, 12);
  });
  it('a matched VSWR of 1 has no return loss figure (null), not Infinity', () => {
    expect(at({ vswr: '1' }).returnLossDb).toBeNull();
    expect(at({ vswr: '1' }).mismatchLossDb).toBe(0);
  });
  it('bad input gets a message at the field: VSWR below 1, NF below 0 dB, a negative temperature, a bit rate of 0', () => {
    for (const [key, text] of [['vswr', '0.5'], ['nf', '-1 dB'], ['tn', '-3'], ['rb', '0'], ['lin', '0']]) {
      const status = validateAll(def, { ...defaultTexts(def), [key]: text }).fields[key];
      expect(status.ok, key).toBe(false);
    }
  });
});
