/**
 * Unit and level converter for design meetings: dB ↔ linear, W ↔ dBm ↔ dBW, power density ↔ field
 * strength (free space), VSWR ↔ |Γ| ↔ return loss ↔ mismatch loss, noise figure ↔ noise
 * temperature, dBi ↔ dBd, frequency ↔ wavelength, Eb/N₀ ↔ C/N₀. Each row of inputs converts on
 * its own; every number comes from the calc/ function named beside it.
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { dbToFieldRatio, dbToPowerRatio, fieldRatioToDb, powerRatioToDb } from '../decibel';
import { wattsToDbm } from '../link/friis';
import { mismatchLossDb, mismatchLossFromVswrDb, reflectionMagnitudeFromReturnLossDb, reflectionMagnitudeFromVswr, returnLossDbFromReflectionMagnitude, vswrFromReflectionMagnitude } from '../link/mismatch';
import { noiseFigureToTemperatureK, noiseTemperatureToFigureDb } from '../link/noiseTemperature';
import { carrierToNoiseDensityFromEbN0DbHz, ebN0Db } from '../link/carrierToNoise';
import { electricFieldFromPowerDensityVPerM, magneticFieldFromPowerDensityAPerM, powerDensityFromElectricFieldWPerM2 } from '../units/planeWave';
import { dbiToDbd } from '../units/gainReference';
import { freeSpaceFrequencyHz, freeSpaceWavelengthM } from '../wavelength';
import { frequencyDefaultText } from './defaultText';
import { mismatchLossFormula } from '../linkBudgetFormulas';
import { wavelengthFormula } from '../wavelengthFormulas';

/** mW/cm² per W/m² (1 W/m² = 0.1 mW/cm²). */
const MW_PER_CM2_PER_W_PER_M2 = 0.1;

/** Pure computation from validated inputs. */
export function computeUnitConverter(inputs: CalcInputs): CalcResult<null> {
  const n = (name: string) => inputs[name] as number;
  const powerW = n('givenPowerW');
  const densityWPerM2 = n('givenPowerDensityWPerM2');
  const vswrGamma = reflectionMagnitudeFromVswr(n('vswr'));
  const rlGamma = reflectionMagnitudeFromReturnLossDb(n('returnLossDb'));
  return {
    values: {
      powerRatio: dbToPowerRatio(n('levelDb')),
      fieldRatio: dbToFieldRatio(n('levelDb')),
      powerRatioDb: powerRatioToDb(n('linearPowerRatio')),
      fieldRatioDb: fieldRatioToDb(n('linearFieldRatio')),
      powerW,
      powerDbm: wattsToDbm(powerW),
      powerDbw: powerRatioToDb(powerW),
      densityWPerM2,
      densityMwPerCm2: densityWPerM2 * MW_PER_CM2_PER_W_PER_M2,
      electricFieldVPerM: electricFieldFromPowerDensityVPerM(densityWPerM2),
      magneticFieldAPerM: magneticFieldFromPowerDensityAPerM(densityWPerM2),
      densityFromFieldWPerM2: powerDensityFromElectricFieldWPerM2(n('electricFieldVPerM')),
      reflectionMagnitude: vswrGamma,
      returnLossDb: vswrGamma > 0 ? returnLossDbFromReflectionMagnitude(vswrGamma) : null,
      mismatchLossDb: mismatchLossFromVswrDb(n('vswr')),
      vswrFromReturnLoss: vswrFromReflectionMagnitude(rlGamma),
      reflectionFromReturnLoss: rlGamma,
      mismatchFromReturnLossDb: mismatchLossDb(rlGamma),
      noiseTemperatureK: noiseFigureToTemperatureK(n('noiseFigureDb')),
      noiseFigureFromTemperatureDb: noiseTemperatureToFigureDb(n('noiseTemperatureK')),
      gainDbd: dbiToDbd(n('gainDbi')),
      wavelengthM: freeSpaceWavelengthM(n('frequencyHz')),
      frequencyFromWavelengthHz: freeSpaceFrequencyHz(n('givenWavelengthM')),
      carrierToNoiseDensityDbHz: carrierToNoiseDensityFromEbN0DbHz(n('ebN0Db'), n('bitRateBitPerS')),
      ebN0FromCarrierDb: ebN0Db(n('carrierToNoiseDensityDbHz'), n('bitRateBitPerS')),
    },
    warnings: [],
    data: null,
  };
}

/** The converter definition. */
export function createUnitConverterCalculator(conventions: TeamConventions): CalculatorDef<null> {
  return {
    id: 'unit-converter',
    title: 'Unit & level converter',
    summary: 'dB and ratios, dBm and watts, power density and field strength, VSWR and return loss, noise figure and temperature, dBi and dBd, frequency and wavelength, Eb/N₀ and C/N₀.',
    nav: { order: 10 },
    safety: { lead: 'Power densities and field strengths converted here bear on exposure limits.', cautions: ['rfExposure'] },
    embed: true,
    purpose: 'The conversions a design meeting needs at once: decibels and ratios, dBm and watts, power density and field strength, VSWR and return loss, noise figure and temperature, dBi and dBd, frequency and wavelength, Eb/N₀ and C/N₀.',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'decibel', key: 'db', name: 'levelDb', label: 'Level in dB', defaultText: '3 dB', min: -400, max: 400, description: 'A level in decibels, converted to a power ratio and a field (amplitude) ratio.' },
      { kind: 'number', key: 'lin', name: 'linearPowerRatio', label: 'Power ratio (linear)', defaultText: '2', min: 0, max: 1e300, minExclusive: true, description: 'A power ratio, converted to dB (10·log10).' },
      { kind: 'number', key: 'flin', name: 'linearFieldRatio', label: 'Field (amplitude) ratio', defaultText: '2', min: 0, max: 1e300, minExclusive: true, description: 'A voltage or field ratio, converted to dB (20·log10).' },
      { kind: 'power', key: 'p', name: 'givenPowerW', label: 'Power', defaultText: '1 W', min: 1e-30, max: 1e12, minExclusive: true, description: 'A power in W, mW, kW, dBm or dBW, shown in all three forms.' },
      { kind: 'powerDensity', key: 's', name: 'givenPowerDensityWPerM2', label: 'Power density', defaultText: '10 W/m2', min: 0, max: 1e9, description: 'Plane-wave power density (W/m², mW/cm² or µW/cm²), with the free-space field strengths.' },
      { kind: 'number', key: 'e', name: 'electricFieldVPerM', label: 'Electric field strength (RMS), V/m', defaultText: '61.4', min: 0, max: 1e7, description: 'RMS field strength of a plane wave in free space, converted to power density.' },
      { kind: 'number', key: 'vswr', name: 'vswr', label: 'VSWR', defaultText: '1.5', min: 1, max: 1e5, description: 'Voltage standing-wave ratio (≥ 1), with |Γ|, return loss and mismatch loss.' },
      { kind: 'decibel', key: 'rl', name: 'returnLossDb', label: 'Return loss', defaultText: '20 dB', min: 0, max: 120, description: 'Return loss, positive dB, with VSWR, |Γ| and mismatch loss.' },
      { kind: 'decibel', key: 'nf', name: 'noiseFigureDb', label: 'Noise figure', defaultText: '2 dB', min: 0, max: 60, description: 'Noise figure (≥ 0 dB), converted to the effective noise temperature T₀(F − 1), T₀ = 290 K.' },
      { kind: 'number', key: 'tn', name: 'noiseTemperatureK', label: 'Noise temperature, K', defaultText: '75', min: 0, max: 1e7, description: 'Effective input noise temperature, kelvin, converted to a noise figure.' },
      { kind: 'decibel', key: 'gi', name: 'gainDbi', label: 'Gain (dBi)', defaultText: '10 dBi', min: -100, max: 150, description: 'Gain over isotropic, converted to gain over a half-wave dipole.' },
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1, max: 1e15, description: 'Frequency, converted to the free-space wavelength.' },
      { kind: 'length', key: 'lam', name: 'givenWavelengthM', label: 'Wavelength (free space)', defaultText: '3 cm', min: 1e-9, max: 1e9, description: 'Free-space wavelength, converted to frequency.' },
      { kind: 'decibel', key: 'ebn0', name: 'ebN0Db', label: 'Eb/N₀', defaultText: '10 dB', min: -50, max: 100, description: 'Energy per bit over noise density, converted to C/N₀ at the bit rate below.' },
      { kind: 'decibel', key: 'cn0', name: 'carrierToNoiseDensityDbHz', label: 'C/N₀ (dB·Hz)', defaultText: '80 dB', min: -50, max: 300, description: 'Carrier-to-noise density ratio in dB·Hz (type it as dB), converted to Eb/N₀ at the bit rate below.' },
      { kind: 'number', key: 'rb', name: 'bitRateBitPerS', label: 'Bit rate, bit/s', defaultText: '1e6', min: 0, max: 1e15, minExclusive: true, description: 'Bit rate for both Eb/N₀ ↔ C/N₀ conversions, bit/s (e.g. 2e6).' },
    ],
    outputs: [
      { key: 'powerRatio', label: 'Level in dB → power ratio 10^(dB/10)', kind: 'ratio', digits: 6 },
      { key: 'fieldRatio', label: 'Level in dB → field ratio 10^(dB/20)', kind: 'ratio', digits: 6 },
      { key: 'powerRatioDb', label: 'Power ratio → dB', kind: 'decibel', digits: 4 },
      { key: 'fieldRatioDb', label: 'Field ratio → dB', kind: 'decibel', digits: 4 },
      { key: 'powerW', label: 'Power in watts', kind: 'power', digits: 6 },
      { key: 'powerDbm', label: 'Power in dBm', kind: 'decibel', digits: 4, unit: 'dBm' },
      { key: 'powerDbw', label: 'Power in dBW', kind: 'decibel', digits: 4, unit: 'dBW' },
      { key: 'densityWPerM2', label: 'Power density', kind: 'powerDensity', digits: 5 },
      { key: 'densityMwPerCm2', label: 'Power density', kind: 'number', digits: 5, unit: 'mW/cm²' },
      { key: 'electricFieldVPerM', label: 'Electric field (RMS, free space)', kind: 'number', digits: 5, unit: 'V/m' },
      { key: 'magneticFieldAPerM', label: 'Magnetic field (RMS, free space)', kind: 'number', digits: 5, unit: 'A/m' },
      { key: 'densityFromFieldWPerM2', label: 'Electric field → power density E²/η₀', kind: 'powerDensity', digits: 5 },
      { key: 'reflectionMagnitude', label: 'VSWR → |Γ|', kind: 'ratio', digits: 5 },
      { key: 'returnLossDb', label: 'VSWR → return loss', kind: 'decibel', digits: 4 },
      { key: 'mismatchLossDb', label: 'VSWR → mismatch loss', kind: 'decibel', digits: 4 },
      { key: 'vswrFromReturnLoss', label: 'Return loss → VSWR', kind: 'ratio', digits: 5 },
      { key: 'reflectionFromReturnLoss', label: 'Return loss → |Γ|', kind: 'ratio', digits: 5 },
      { key: 'mismatchFromReturnLossDb', label: 'Return loss → mismatch loss', kind: 'decibel', digits: 4 },
      { key: 'noiseTemperatureK', label: 'Noise figure → noise temperature', kind: 'number', digits: 5, unit: 'K' },
      { key: 'noiseFigureFromTemperatureDb', label: 'Noise temperature → noise figure', kind: 'decibel', digits: 4 },
      { key: 'gainDbd', label: 'Gain over a half-wave dipole', kind: 'decibel', digits: 4, unit: 'dBd' },
      { key: 'wavelengthM', label: 'Frequency → wavelength', kind: 'length', digits: 6 },
      { key: 'frequencyFromWavelengthHz', label: 'Wavelength → frequency', kind: 'frequency', digits: 6 },
      { key: 'carrierToNoiseDensityDbHz', label: 'Eb/N₀ → C/N₀ at the bit rate', kind: 'decibel', digits: 4, unit: 'dB·Hz' },
      { key: 'ebN0FromCarrierDb', label: 'C/N₀ → Eb/N₀ at the bit rate', kind: 'decibel', digits: 4 },
    ],
    formulas: [
      { formula: mismatchLossFormula, output: 'mismatchLossDb', args: (i) => ({ vswr: i.vswr as number }) },
      { formula: wavelengthFormula, output: 'wavelengthM', args: (i) => ({ frequencyHz: i.frequencyHz as number, relativePermittivity: 1 }) },
    ],
    assumptions: [
      'Each row of inputs converts on its own; change one and only its results change.',
      'Field strengths are RMS values of a single plane wave in free space, with η₀ = 376.73 Ω (CODATA 2018); near an antenna E and H are not tied this way.',
      'Noise figure and temperature use T₀ = 290 K: T = T₀(10^(NF/10) − 1).',
      'dBd = dBi − 2.15 (the lossless half-wave dipole); a dBic figure is to the co-polarized circular component.',
      'Eb/N₀ = C/N₀ − 10·log10(R_b), R_b in bit/s.',
    ],
    references: [
      'IEEE Std 145-2013, IEEE Standard for Definitions of Terms for Antennas.',
      'D. M. Pozar, Microwave Engineering, 4th ed., Wiley, 2012.',
      'CODATA 2018 recommended values of the fundamental physical constants (impedance of free space).',
    ],
    examples: [{ title: 'A field-strength reading from a site survey, 0.5 mW/cm², and a 1.9:1 feed', query: '?v=1&db=-3dB&lin=0.5&flin=0.5&p=27dBm&s=0.5mW/cm2&e=20&vswr=1.9&rl=10dB&nf=0.8dB&tn=35&gi=8.5dBi&f=2.45GHz&lam=12cm&ebn0=4.5dB&cn0=75dB&rb=2e6' }],
    sourcePath: 'calc/calculators/unitConverter.ts',
    compute: (inputs) => computeUnitConverter(inputs),
  };
}
