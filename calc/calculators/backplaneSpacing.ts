/**
 * Backplane spacing: where to put a conducting plane behind dipole-like radiators, and what the
 * choice costs over a band and a scan range (image method with a spacer; see
 * calc/backplane/imageFactor.ts for the model).
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { CalcInputError } from '../errors';
import { powerRatioToDbFloored } from '../decibel';
import { radToDeg } from '../angle';
import { freeSpaceWavelengthM, mediumWavelengthM } from '../wavelength';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import {
  backplaneImageFactorDb,
  backplaneRoundTripPhaseRad,
  bestBroadsideFrequencyHz,
  broadsideBandHz,
  broadsideNullFrequencyHz,
  broadsideRippleDb,
  dipoleOverPlaneDirectivity,
  flattestSpacingM,
  quarterWaveSpacingM,
  type DipoleKind,
} from '../backplane/index';
import {
  backplaneBandFormula,
  backplaneImageFactorFormula,
  backplaneNullFormula,
  backplanePhaseFormula,
  backplaneRippleFormula,
  dipoleOverPlaneFormula,
  quarterWaveBackplaneFormula,
} from '../backplaneFormulas';

export interface FrequencyPoint {
  frequencyHz: number;
  /** Broadside image factor (dB) for the chosen spacing, the flattest spacing and the λ/4 spacing. */
  chosenDb: number;
  flattestDb: number;
  quarterWaveDb: number;
  /** Chosen spacing at the maximum scan angle. */
  chosenScanDb: number;
}

export interface AnglePoint {
  thetaDeg: number;
  lowDb: number;
  designDb: number;
  highDb: number;
}

export interface HeightPoint {
  /** h/λ in the spacer. */
  heightWavelengths: number;
  directivityDbi: number;
}

export interface BackplaneData {
  frequency: FrequencyPoint[];
  angle: AnglePoint[];
  height: HeightPoint[];
  bandLowHz: number;
  bandHighHz: number;
  designHz: number;
  scanMaxDeg: number;
  chosenHeightWavelengths: number;
  freeSpaceDirectivityDbi: number;
}

const FREQUENCY_SAMPLES = 121;

/** A frequency for a warning sentence, in MHz or GHz with four significant digits. */
function hzText(frequencyHz: number): string {
  return frequencyHz >= 1e9 ? `${+(frequencyHz / 1e9).toPrecision(4)} GHz` : `${+(frequencyHz / 1e6).toPrecision(4)} MHz`;
}
const ANGLE_SAMPLES = 91;
const HEIGHT_SAMPLES = 75;
/** Directivity floor (dBi) for a broadside null. */
const DIRECTIVITY_FLOOR_DBI = -100;

/** Pure computation from validated inputs (Hz, m, degrees, choices). */
export function computeBackplaneSpacing(inputs: CalcInputs): CalcResult<BackplaneData> {
  const designHz = inputs.frequencyHz as number;
  const bandLowHz = inputs.bandLowHz as number;
  const bandHighHz = inputs.bandHighHz as number;
  const er = inputs.relativePermittivity as number;
  const scanMaxDeg = inputs.scanMaxDeg as number;
  const element = inputs.element as DipoleKind;
  if (!(bandHighHz > bandLowHz)) throw new CalcInputError('bandHighHz', 'expected the band high edge above the band low edge');
  const warnings: CalcWarning[] = [];

  const quarterFreeM = freeSpaceWavelengthM(designHz) / 4;
  const quarterSpacerM = quarterWaveSpacingM(designHz, er);
  const h = (inputs.spacingM as number | null) ?? quarterSpacerM;
  const hSpacerWl = h / mediumWavelengthM(designHz, er);

  const bestHz = bestBroadsideFrequencyHz(h, er);
  const nullHz = broadsideNullFrequencyHz(h, er);
  const band1 = broadsideBandHz(h, er, 1);
  const band3 = broadsideBandHz(h, er, 3);
  const nullInBand = nullHz <= bandHighHz;
  const rippleChosen = nullInBand ? null : broadsideRippleDb(h, bandLowHz, bandHighHz, er);
  const flatM = flattestSpacingM(bandLowHz, bandHighHz, er);
  const rippleFlat = broadsideRippleDb(flatM, bandLowHz, bandHighHz, er);
  const quarterNullInBand = broadsideNullFrequencyHz(quarterSpacerM, er) <= bandHighHz;
  const rippleQuarter = quarterNullInBand ? null : broadsideRippleDb(quarterSpacerM, bandLowHz, bandHighHz, er);

  const factor = (f: number, theta: number) => backplaneImageFactorDb(h, f, er, theta);
  const directivity = dipoleOverPlaneDirectivity(element, hSpacerWl);
  const directivityDbi = directivity > 0 ? powerRatioToDbFloored(directivity, DIRECTIVITY_FLOOR_DBI) : null;
  const freeSpaceDirectivityDbi = powerRatioToDbFloored(dipoleOverPlaneDirectivity(element, null));

  if (nullInBand) {
    warnings.push(warning('null-in-band', 'caution', `The backplane cancels broadside at ${hzText(nullHz)} (h = λ/2 in the spacer), at or below the band high edge: the band cannot be covered with this spacing.`, ['nullFrequencyHz', 'rippleChosenDb']));
  }
  if (bandLowHz < band1.lowHz || bandHighHz > band1.highHz) {
    warnings.push(warning('band-beyond-1db', 'note', 'The band reaches beyond the frequencies where the broadside factor is within 1 dB of its best; see the variation across the band and the flattest spacing.', ['band1LowHz', 'band1HighHz', 'rippleChosenDb']));
  }
  if (designHz < bandLowHz || designHz > bandHighHz) {
    warnings.push(warning('design-outside-band', 'note', 'The design frequency lies outside the band.', ['quarterWaveSpacerM']));
  }
  if (er > 1) {
    warnings.push(warning('spacer-approximation', 'outside-validity', 'With a dielectric spacer the off-broadside factor uses one ray through the spacer (reflections at its surface and Fresnel factors ignored), and the directivity treats the spacer as filling the half-space; broadside figures are exact for that ray.', ['scanLowDb', 'scanHighDb', 'directivityDbi']));
    const te1OnsetHz = 299792458 / (4 * h * Math.sqrt(er - 1));
    if (te1OnsetHz <= bandHighHz) {
      warnings.push(warning('spacer-surface-waves', 'caution', `The spacer is thick enough for a second surface-wave mode (TE₁ above about ${hzText(te1OnsetHz)}, where h√(εr − 1) = λ0/4; Pozar, Microwave Engineering, 4th ed., §3.6 (section number from memory), from memory): much power can leave sideways in the spacer.`, ['directivityDbi']));
    } else {
      warnings.push(warning('spacer-surface-waves', 'note', 'A dielectric spacer always carries the TM₀ surface wave; it grows with thickness and permittivity and is not in these figures.', ['directivityDbi']));
    }
  }
  if (hSpacerWl < 0.05) {
    warnings.push(warning('very-close-plane', 'caution', 'Below about λ/20 the radiator is nearly shorted by its image: the directivity shown is still high, but radiation resistance and bandwidth collapse, so the realised gain falls.', ['directivityDbi']));
  }
  warnings.push(warning('finite-plane', 'note', 'The plane is infinite here. A real backplane of a few wavelengths diffracts at its edges, which sets the actual back lobe (often −15 to −25 dB) and ripples the forward pattern.', ['directivityDbi']));

  // Plots
  const span = bandHighHz - bandLowHz;
  const plotLow = Math.max(bandLowHz * 0.05, bandLowHz - 0.5 * span);
  const plotHigh = bandHighHz + 0.5 * span;
  const frequency: FrequencyPoint[] = [];
  for (let i = 0; i < FREQUENCY_SAMPLES; i++) {
    const f = plotLow + ((plotHigh - plotLow) * i) / (FREQUENCY_SAMPLES - 1);
    frequency.push({
      frequencyHz: f,
      chosenDb: factor(f, 0),
      flattestDb: backplaneImageFactorDb(flatM, f, er, 0),
      quarterWaveDb: backplaneImageFactorDb(quarterSpacerM, f, er, 0),
      chosenScanDb: factor(f, scanMaxDeg),
    });
  }
  const angle: AnglePoint[] = [];
  for (let i = 0; i < ANGLE_SAMPLES; i++) {
    const theta = (90 * i) / (ANGLE_SAMPLES - 1);
    angle.push({ thetaDeg: theta, lowDb: factor(bandLowHz, theta), designDb: factor(designHz, theta), highDb: factor(bandHighHz, theta) });
  }
  const height: HeightPoint[] = [];
  const hMax = Math.max(0.75, 1.2 * hSpacerWl);
  for (let i = 0; i < HEIGHT_SAMPLES; i++) {
    const x = 0.01 + ((hMax - 0.01) * i) / (HEIGHT_SAMPLES - 1);
    height.push({ heightWavelengths: x, directivityDbi: powerRatioToDbFloored(dipoleOverPlaneDirectivity(element, x), -20) });
  }

  return {
    values: {
      quarterWaveFreeM: quarterFreeM,
      quarterWaveSpacerM: quarterSpacerM,
      spacingM: h,
      spacingSpacerWavelengths: hSpacerWl,
      roundTripPhaseDeg: radToDeg(backplaneRoundTripPhaseRad(h, designHz, er)),
      broadsideDesignDb: factor(designHz, 0),
      broadsideLowDb: factor(bandLowHz, 0),
      broadsideHighDb: factor(bandHighHz, 0),
      scanLowDb: factor(bandLowHz, scanMaxDeg),
      scanHighDb: factor(bandHighHz, scanMaxDeg),
      bestFrequencyHz: bestHz,
      band1LowHz: band1.lowHz,
      band1HighHz: band1.highHz,
      band3LowHz: band3.lowHz,
      band3HighHz: band3.highHz,
      nullFrequencyHz: nullHz,
      rippleChosenDb: rippleChosen,
      rippleQuarterWaveDb: rippleQuarter,
      flattestSpacingM: flatM,
      rippleFlattestDb: rippleFlat,
      directivityDbi,
      freeSpaceDirectivityDbi,
    },
    warnings,
    data: { frequency, angle, height, bandLowHz, bandHighHz, designHz, scanMaxDeg, chosenHeightWavelengths: hSpacerWl, freeSpaceDirectivityDbi },
  };
}

/** The calculator definition, with defaults taken from the team conventions. */
export function createBackplaneSpacingCalculator(conventions: TeamConventions): CalculatorDef<BackplaneData> {
  const f0 = conventions.designFrequencyHz;
  return {
    id: 'backplane-spacing',
    title: 'Backplane spacing',
    summary: 'Spacing of a conducting plane behind dipoles: the λ/4 rule with a spacer, the image factor over a band and scan range, the flattest spacing, and directivity over the plane.',
    nav: { order: 5 },
    safety: { lead: '', cautions: ['rfExposure', 'workAtHeight'] },
    embed: true,
    purpose: 'How far behind dipole-like radiators should a conducting backplane sit, and what does that spacing cost in broadside gain over a band and a scan range?',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Design frequency', defaultText: frequencyDefaultText(f0), min: 1e3, max: 1e13, description: 'Frequency for the quarter-wave spacing; spacings given in λ use its free-space wavelength.' },
      { kind: 'frequency', key: 'flo', name: 'bandLowHz', label: 'Band low edge', defaultText: frequencyDefaultText(0.9 * f0), min: 1e3, max: 1e13, description: 'Lowest frequency of the band.' },
      { kind: 'frequency', key: 'fhi', name: 'bandHighHz', label: 'Band high edge', defaultText: frequencyDefaultText(1.1 * f0), min: 1e3, max: 1e13, description: 'Highest frequency of the band; must be above the low edge.' },
      { kind: 'number', key: 'er', name: 'relativePermittivity', label: 'Spacer relative permittivity εr', defaultText: '1', min: 1, max: 30, description: 'Material between radiator and backplane (1 for air or foam).' },
      { kind: 'angle', key: 'scan', name: 'scanMaxDeg', label: 'Maximum scan angle from broadside', defaultText: `${conventions.maxScanDeg} deg`, min: 0, max: 89, description: 'Largest beam angle from the backplane normal, in air.' },
      { kind: 'choice', key: 'el', name: 'element', label: 'Radiator', options: [ { value: 'halfWave', label: 'Half-wave dipole' }, { value: 'short', label: 'Short dipole' } ], defaultText: 'halfWave', description: 'Dipole parallel to the backplane, for the directivity by pattern integration.' },
      { kind: 'length', key: 'h', name: 'spacingM', label: 'Chosen spacing', defaultText: '', min: 1e-7, max: 1e3, optional: true, wavelengthFrom: 'design', description: 'Optional; empty means λ/4 in the spacer at the design frequency. In λ means free-space wavelengths at the design frequency.' },
    ],
    outputs: [
      { key: 'quarterWaveFreeM', label: 'λ₀/4 in free space', kind: 'length', digits: 5 },
      { key: 'quarterWaveSpacerM', label: 'λ/4 in the spacer', kind: 'length', digits: 5 },
      { key: 'spacingM', label: 'Spacing used', kind: 'length', digits: 5 },
      { key: 'spacingSpacerWavelengths', label: 'Spacing used', kind: 'ratio', digits: 4, unit: 'λ (spacer)', description: 'h/λ in the spacer at the design frequency' },
      { key: 'roundTripPhaseDeg', label: 'Phase of the reflected wave, broadside', kind: 'angle', digits: 5, description: 'k_s h + 180° + k_s h; 360° means in phase' },
      { key: 'broadsideDesignDb', label: 'Broadside image factor, design frequency', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'broadsideLowDb', label: 'Broadside image factor, band low edge', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'broadsideHighDb', label: 'Broadside image factor, band high edge', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'scanLowDb', label: 'Image factor at maximum scan, band low edge', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'scanHighDb', label: 'Image factor at maximum scan, band high edge', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'bestFrequencyHz', label: 'Frequency of the best broadside factor (h = λ/4)', kind: 'frequency', digits: 5 },
      { key: 'band1LowHz', label: 'Within 1 dB of best: from', kind: 'frequency', digits: 5 },
      { key: 'band1HighHz', label: 'Within 1 dB of best: to', kind: 'frequency', digits: 5 },
      { key: 'band3LowHz', label: 'Within 3 dB of best: from', kind: 'frequency', digits: 5 },
      { key: 'band3HighHz', label: 'Within 3 dB of best: to', kind: 'frequency', digits: 5 },
      { key: 'nullFrequencyHz', label: 'Broadside cancelled (h = λ/2) at', kind: 'frequency', digits: 5 },
      { key: 'rippleChosenDb', label: 'Broadside variation across the band, spacing used', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'rippleQuarterWaveDb', label: 'Broadside variation across the band, λ/4 at design', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'flattestSpacingM', label: 'Flattest spacing over the band', kind: 'length', digits: 5, description: 'Minimises the broadside variation across the band (golden-section search)' },
      { key: 'rippleFlattestDb', label: 'Broadside variation across the band, flattest spacing', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'directivityDbi', label: 'Broadside directivity of the radiator over the plane', kind: 'decibel', digits: 4, unit: 'dBi', description: 'Pattern integration at the spacing used, design frequency' },
      { key: 'freeSpaceDirectivityDbi', label: 'Directivity of the radiator alone', kind: 'decibel', digits: 4, unit: 'dBi' },
    ],
    formulas: [
      { formula: quarterWaveBackplaneFormula, output: 'quarterWaveSpacerM', args: (i) => ({ frequencyHz: i.frequencyHz as number, relativePermittivity: i.relativePermittivity as number }) },
      { formula: backplanePhaseFormula, output: 'roundTripPhaseDeg', args: (i, v) => ({ spacingM: v.spacingM as number, frequencyHz: i.frequencyHz as number, relativePermittivity: i.relativePermittivity as number }) },
      { formula: backplaneImageFactorFormula, output: 'broadsideDesignDb', args: (i, v) => ({ spacingM: v.spacingM as number, frequencyHz: i.frequencyHz as number, relativePermittivity: i.relativePermittivity as number, thetaDeg: 0 }) },
      { formula: backplaneImageFactorFormula, output: 'scanHighDb', args: (i, v) => ({ spacingM: v.spacingM as number, frequencyHz: i.bandHighHz as number, relativePermittivity: i.relativePermittivity as number, thetaDeg: i.scanMaxDeg as number }) },
      { formula: backplaneNullFormula, output: 'nullFrequencyHz', args: (i, v) => ({ spacingM: v.spacingM as number, relativePermittivity: i.relativePermittivity as number }) },
      { formula: backplaneBandFormula, output: 'band1LowHz', args: (i, v) => ({ spacingM: v.spacingM as number, relativePermittivity: i.relativePermittivity as number, withinDb: 1, upper: 0 }) },
      { formula: backplaneBandFormula, output: 'band3HighHz', args: (i, v) => ({ spacingM: v.spacingM as number, relativePermittivity: i.relativePermittivity as number, withinDb: 3, upper: 1 }) },
      { formula: backplaneRippleFormula, output: 'rippleChosenDb', args: (i, v) => (v.rippleChosenDb === null ? null : { spacingM: v.spacingM as number, bandLowHz: i.bandLowHz as number, bandHighHz: i.bandHighHz as number, relativePermittivity: i.relativePermittivity as number }) },
      { formula: backplaneRippleFormula, output: 'rippleFlattestDb', args: (i, v) => ({ spacingM: v.flattestSpacingM as number, bandLowHz: i.bandLowHz as number, bandHighHz: i.bandHighHz as number, relativePermittivity: i.relativePermittivity as number }) },
      { formula: dipoleOverPlaneFormula, output: 'directivityDbi', args: (i, v) => (v.directivityDbi === null ? null : { heightWavelengths: v.spacingSpacerWavelengths as number, halfWave: i.element === 'halfWave' ? 1 : 0 }) },
    ],
    assumptions: [
      'The backplane is an infinite, perfectly conducting plane and the radiator is parallel to it (horizontal dipole); the image method then gives the pattern exactly in air.',
      'With a spacer (εr > 1), the phase through it uses k_s = k0√εr: exact at broadside (normal incidence), and off broadside one ray refracted by Snell\'s law, with reflections at the spacer surface, Fresnel factors and surface waves ignored.',
      'Directivity by pattern integration treats the medium above the plane as uniform, so it depends on h/λ in the spacer only; for εr = 1 it is exact image theory.',
      'The image factor is the field of radiator plus image relative to the radiator alone at the same current; the radiator\'s own impedance change near the plane is not in it.',
      'The radiator pattern is held fixed across the band (a half-wave dipole stays a half-wave pattern).',
      'The flattest spacing minimises the max − min of the broadside image factor across the band; scan and impedance are not in that criterion.',
    ],
    references: [
      'C. A. Balanis, Antenna Theory: Analysis and Design, 4th ed., Wiley, 2016, §4.6 (section number from memory; half-wave dipole), §4.7 (section number from memory; dipoles above a ground plane, image theory).',
      'D. M. Pozar, Microwave Engineering, 4th ed., Wiley, 2012, §3.6 (section number from memory; grounded dielectric slab, surface waves).',
      'IEEE Std 145-2013, IEEE Standard for Definitions of Terms for Antennas.',
    ],
    examples: [
      { title: 'Warehouse tag-reader panel at 5.8 GHz on foam, 5.725–5.875 GHz, ±40° scan', query: '?v=1&f=5.8GHz&flo=5.725GHz&fhi=5.875GHz&er=1.05&scan=40deg&el=halfWave' },
      { title: 'Wideband 2–4 GHz sounding array over an air gap, checked at λ/4 of 3 GHz', query: '?v=1&f=3GHz&flo=2GHz&fhi=4GHz&er=1&scan=30deg&el=short&h=0.25lambda' },
      { title: 'Printed 2.4 GHz dipoles on 3.2 mm laminate (εr 4.4) over a plane', query: '?v=1&f=2.44GHz&flo=2.4GHz&fhi=2.4835GHz&er=4.4&scan=20deg&el=halfWave&h=3.2mm' },
    ],
    sourcePath: 'calc/calculators/backplaneSpacing.ts',
    compute: computeBackplaneSpacing,
  };
}
