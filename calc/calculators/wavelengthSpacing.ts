/**
 * Wavelength & element spacing: wavelengths over a band, the grating-lobe-free spacing for a
 * lattice and scan range, the grating-lobe onset for a chosen spacing, and element counts.
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { freeSpaceWavelengthM, mediumWavelengthM } from '../wavelength';
import { gratingLobeOnsetScanDeg, maxGratingFreeSpacingWavelengths, type Lattice } from '../gratingLobeLimit';
import { elementCountEstimate } from '../elementCount';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import {
  elementCountFormula,
  gratingLobeOnsetFormula,
  rectangularSpacingLimitFormula,
  triangularSpacingLimitFormula,
  wavelengthFormula,
} from '../wavelengthFormulas';

export interface WavelengthRow {
  label: string;
  frequencyHz: number;
  freeSpaceWavelengthM: number;
  mediumWavelengthM: number;
}

export interface OnsetPoint {
  frequencyHz: number;
  rectangularOnsetDeg: number;
  triangularOnsetDeg: number;
}

export interface WavelengthSpacingData {
  rows: WavelengthRow[];
  /** Grating-lobe onset scan angle against frequency for the chosen spacing (empty without one). */
  onset: OnsetPoint[];
  scanMaxDeg: number;
  bandLowHz: number;
  bandHighHz: number;
}

const LATTICE_LABEL: Record<Lattice, string> = { rectangular: 'rectangular', triangular: 'equilateral triangular' };

/** Number of frequency samples in the onset plot. */
const ONSET_SAMPLES = 121;

/** Pure computation from validated inputs (Hz, m, degrees). */
export function computeWavelengthSpacing(
  inputs: CalcInputs,
  spacingMarginFraction: number,
): CalcResult<WavelengthSpacingData> {
  const fLow = inputs.frequencyHz as number;
  const fHighInput = inputs.bandHighHz as number | null;
  const isBand = fHighInput !== null && fHighInput !== fLow;
  const bandLow = isBand ? Math.min(fLow, fHighInput) : fLow;
  const bandHigh = isBand ? Math.max(fLow, fHighInput) : fLow;
  const permittivity = inputs.relativePermittivity as number;
  const scanMaxDeg = inputs.scanMaxDeg as number;
  const lattice = inputs.lattice as Lattice;
  const chosenSpacingM = inputs.spacingM as number | null;
  const apertureWidthM = inputs.apertureWidthM as number | null;
  const apertureHeightM = inputs.apertureHeightM as number | null;
  const apertureShape = inputs.apertureShape as 'rectangle' | 'ellipse';
  const warnings: CalcWarning[] = [];

  const lambdaHigh = freeSpaceWavelengthM(bandHigh);
  const lambdaLow = freeSpaceWavelengthM(bandLow);
  const lambdaMediumHigh = mediumWavelengthM(bandHigh, permittivity);

  const rows: WavelengthRow[] = (isBand
    ? [
        { label: 'f_low', frequencyHz: bandLow },
        { label: 'f_centre', frequencyHz: (bandLow + bandHigh) / 2 },
        { label: 'f_high', frequencyHz: bandHigh },
      ]
    : [{ label: 'f', frequencyHz: bandHigh }]
  ).map((row) => ({
    ...row,
    freeSpaceWavelengthM: freeSpaceWavelengthM(row.frequencyHz),
    mediumWavelengthM: mediumWavelengthM(row.frequencyHz, permittivity),
  }));

  const limitWavelengths = maxGratingFreeSpacingWavelengths(scanMaxDeg, lattice);
  const limitM = limitWavelengths * lambdaHigh;
  const recommendedM = limitM * (1 - spacingMarginFraction);

  let onsetHighDeg: number | null = null;
  let onsetLowDeg: number | null = null;
  let chosenWavelengths: number | null = null;
  const onset: OnsetPoint[] = [];
  if (chosenSpacingM !== null) {
    chosenWavelengths = chosenSpacingM / lambdaHigh;
    onsetHighDeg = gratingLobeOnsetScanDeg(chosenWavelengths, lattice);
    onsetLowDeg = isBand ? gratingLobeOnsetScanDeg(chosenSpacingM / lambdaLow, lattice) : null;
    const plotLow = isBand ? bandLow : bandHigh * 0.8;
    const plotHigh = isBand ? bandHigh : bandHigh * 1.2;
    for (let i = 0; i < ONSET_SAMPLES; i++) {
      const f = plotLow + ((plotHigh - plotLow) * i) / (ONSET_SAMPLES - 1);
      const dWl = chosenSpacingM / freeSpaceWavelengthM(f);
      onset.push({
        frequencyHz: f,
        rectangularOnsetDeg: gratingLobeOnsetScanDeg(dWl, 'rectangular'),
        triangularOnsetDeg: gratingLobeOnsetScanDeg(dWl, 'triangular'),
      });
    }
    if (onsetHighDeg < scanMaxDeg) {
      warnings.push(
        warning(
          'grating-lobe-in-scan-range',
          'caution',
          `With this spacing a grating lobe enters visible space at ${onsetHighDeg.toFixed(1)}° scan at the highest frequency, inside the ${scanMaxDeg}° scan range of the ${LATTICE_LABEL[lattice]} lattice.`,
          ['onsetHighDeg', 'chosenWavelengths'],
        ),
      );
    }
    if (chosenWavelengths < 0.25) {
      warnings.push(
        warning(
          'close-spacing',
          'note',
          'Spacing below λ/4: mutual coupling is strong, and the embedded element pattern and impedance, not these free-space limits, decide the design.',
          ['chosenWavelengths'],
        ),
      );
    }
  }

  let areaM2: number | null = null;
  if (apertureWidthM !== null) {
    const height = apertureHeightM ?? apertureWidthM;
    areaM2 = apertureShape === 'ellipse' ? (Math.PI / 4) * apertureWidthM * height : apertureWidthM * height;
  }
  const recommendedRectM = maxGratingFreeSpacingWavelengths(scanMaxDeg, 'rectangular') * lambdaHigh * (1 - spacingMarginFraction);
  const recommendedTriM = maxGratingFreeSpacingWavelengths(scanMaxDeg, 'triangular') * lambdaHigh * (1 - spacingMarginFraction);
  const countRect = areaM2 === null ? null : elementCountEstimate(areaM2, recommendedRectM, 'rectangular');
  const countTri = areaM2 === null ? null : elementCountEstimate(areaM2, recommendedTriM, 'triangular');
  const savingPercent = countRect && countTri !== null ? (100 * (countRect - countTri)) / countRect : null;
  const countChosen = areaM2 !== null && chosenSpacingM !== null ? elementCountEstimate(areaM2, chosenSpacingM, lattice) : null;
  if (areaM2 !== null && countRect !== null && countRect < 16) {
    warnings.push(
      warning('small-aperture', 'outside-validity', 'The aperture is only a few spacings across: the area-based count ignores edge cells and is rough.', ['countRect', 'countTri', 'countChosen']),
    );
  }
  if (scanMaxDeg > 60) {
    warnings.push(
      warning('wide-scan', 'note', 'Scans beyond about 60° bring large scan loss and impedance variation; check the scan-loss estimate as well as grating lobes.', ['limitWavelengths']),
    );
  }

  return {
    values: {
      lambda0High: lambdaHigh,
      lambda0Low: isBand ? lambdaLow : null,
      lambdaMediumHigh: permittivity !== 1 ? lambdaMediumHigh : null,
      halfLambda0High: lambdaHigh / 2,
      quarterLambda0High: lambdaHigh / 4,
      quarterLambdaMediumHigh: permittivity !== 1 ? lambdaMediumHigh / 4 : null,
      limitWavelengths,
      limitM,
      recommendedM,
      recommendedWavelengths: recommendedM / lambdaHigh,
      chosenWavelengths,
      onsetHighDeg,
      onsetLowDeg,
      areaM2,
      countRect,
      countTri,
      savingPercent,
      countChosen,
    },
    warnings,
    data: { rows, onset, scanMaxDeg, bandLowHz: bandLow, bandHighHz: bandHigh },
  };
}

/** The calculator definition, with defaults taken from the team conventions. */
export function createWavelengthSpacingCalculator(conventions: TeamConventions): CalculatorDef<WavelengthSpacingData> {
  const margin = conventions.spacingMarginFraction;
  return {
    id: 'wavelength-spacing',
    title: 'Wavelength & element spacing',
    summary: 'Wavelengths over a band, the grating-lobe-free spacing for a lattice and scan range, and the element count of an aperture.',
    nav: { order: 2 },
    safety: { lead: 'Arrays spaced here usually transmit:', cautions: ['rfExposure'] },
    embed: true,
    purpose:
      'How far apart can the elements of a phased array sit before a grating lobe appears, over the band and the scan range, and how many elements does the aperture then need?',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency (or band low edge)', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e3, max: 1e13, minExclusive: false, description: 'Operating frequency; with a band high edge, the lowest frequency of the band.' },
      { kind: 'frequency', key: 'fhi', name: 'bandHighHz', label: 'Band high edge', defaultText: '', min: 1e3, max: 1e13, optional: true, description: 'Highest frequency of the band; leave empty for a single frequency. Spacing limits use the highest frequency.' },
      { kind: 'number', key: 'er', name: 'relativePermittivity', label: 'Relative permittivity εr of the medium', defaultText: '1', min: 1, max: 100, description: 'For the in-medium wavelength (substrate, spacer, radome). Spacing limits use free space: the array radiates into air.' },
      { kind: 'angle', key: 'scan', name: 'scanMaxDeg', label: 'Maximum scan angle from broadside', defaultText: `${conventions.maxScanDeg} deg`, min: 0, max: 89, description: 'Largest steering angle from the array normal, in any plane.' },
      { kind: 'choice', key: 'lat', name: 'lattice', label: 'Lattice', options: [ { value: 'rectangular', label: 'Rectangular (square cell)' }, { value: 'triangular', label: 'Equilateral triangular' } ], defaultText: conventions.lattice, description: 'Element lattice of the planar array.' },
      { kind: 'length', key: 'd', name: 'spacingM', label: 'Chosen element spacing', defaultText: '', min: 1e-6, max: 1e3, optional: true, wavelengthFrom: 'highest', description: 'Optional. A spacing to check; may be given in wavelengths at the highest frequency (e.g. 0.6 λ).' },
      { kind: 'length', key: 'w', name: 'apertureWidthM', label: 'Aperture width (or diameter)', defaultText: '', min: 1e-6, max: 1e4, optional: true, wavelengthFrom: 'highest', description: 'Optional. Width of the array face, or its diameter for an elliptical outline.' },
      { kind: 'length', key: 'h', name: 'apertureHeightM', label: 'Aperture height', defaultText: '', min: 1e-6, max: 1e4, optional: true, wavelengthFrom: 'highest', description: 'Optional; empty means equal to the width.' },
      { kind: 'choice', key: 'shape', name: 'apertureShape', label: 'Aperture outline', options: [ { value: 'rectangle', label: 'Rectangle' }, { value: 'ellipse', label: 'Ellipse / circle' } ], defaultText: 'rectangle', description: 'Outline of the array face, for the element count.' },
    ],
    outputs: [
      { key: 'lambda0High', label: 'Free-space wavelength λ₀ (highest frequency)', kind: 'length', digits: 5 },
      { key: 'lambda0Low', label: 'Free-space wavelength λ₀ (lowest frequency)', kind: 'length', digits: 5 },
      { key: 'lambdaMediumHigh', label: 'Wavelength in the medium (highest frequency)', kind: 'length', digits: 5 },
      { key: 'halfLambda0High', label: 'λ₀/2 (highest frequency)', kind: 'length', digits: 5 },
      { key: 'quarterLambda0High', label: 'λ₀/4 (highest frequency)', kind: 'length', digits: 5 },
      { key: 'quarterLambdaMediumHigh', label: 'λ/4 in the medium (highest frequency)', kind: 'length', digits: 5 },
      { key: 'limitWavelengths', label: 'Grating-lobe-free spacing limit', kind: 'ratio', digits: 4, unit: 'λ₀', description: 'd/λ₀ at the highest frequency, for the chosen lattice and scan range' },
      { key: 'limitM', label: 'Grating-lobe-free spacing limit', kind: 'length', digits: 4 },
      { key: 'recommendedM', label: `Recommended spacing (${Math.round(margin * 100)} % below the limit)`, kind: 'length', digits: 4 },
      { key: 'recommendedWavelengths', label: 'Recommended spacing', kind: 'ratio', digits: 4, unit: 'λ₀', description: 'd/λ₀ at the highest frequency' },
      { key: 'chosenWavelengths', label: 'Chosen spacing', kind: 'ratio', digits: 4, unit: 'λ₀', description: 'd/λ₀ at the highest frequency' },
      { key: 'onsetHighDeg', label: 'Grating lobe enters at scan (highest frequency)', kind: 'angle', digits: 3, description: '90° means none can enter at any scan; 0° means one is visible at broadside' },
      { key: 'onsetLowDeg', label: 'Grating lobe enters at scan (lowest frequency)', kind: 'angle', digits: 3, description: '90° means none can enter at any scan' },
      { key: 'areaM2', label: 'Aperture area', kind: 'number', digits: 4, unit: 'm²' },
      { key: 'countRect', label: 'Elements, rectangular lattice at its recommended spacing', kind: 'count', digits: 0 },
      { key: 'countTri', label: 'Elements, triangular lattice at its recommended spacing', kind: 'count', digits: 0 },
      { key: 'savingPercent', label: 'Saving of the triangular lattice', kind: 'percent', digits: 3 },
      { key: 'countChosen', label: 'Elements at the chosen spacing and lattice', kind: 'count', digits: 0 },
    ],
    formulas: [
      { formula: wavelengthFormula, output: 'lambda0High', args: (i) => ({ frequencyHz: highest(i), relativePermittivity: 1 }) },
      {
        formula: rectangularSpacingLimitFormula,
        output: 'limitWavelengths',
        args: (i) => (i.lattice === 'rectangular' ? { scanMaxDeg: i.scanMaxDeg as number } : null),
      },
      {
        formula: triangularSpacingLimitFormula,
        output: 'limitWavelengths',
        args: (i) => (i.lattice === 'triangular' ? { scanMaxDeg: i.scanMaxDeg as number } : null),
      },
      {
        formula: gratingLobeOnsetFormula,
        output: 'onsetHighDeg',
        args: (i, v) =>
          v.chosenWavelengths === null ? null : { spacingWavelengths: v.chosenWavelengths, latticeFactor: i.lattice === 'triangular' ? 2 / Math.sqrt(3) : 1 },
      },
      {
        formula: elementCountFormula,
        output: 'countRect',
        args: (i, v) =>
          v.areaM2 === null
            ? null
            : { areaM2: v.areaM2, spacingM: maxGratingFreeSpacingWavelengths(i.scanMaxDeg as number, 'rectangular') * freeSpaceWavelengthM(highest(i)) * (1 - margin), cellFactor: 1 },
      },
    ],
    assumptions: [
      'Spacing limits use the free-space wavelength at the highest frequency: the array radiates into air, whatever the medium setting.',
      'A spacing exactly at the limit puts a grating lobe on the horizon at full scan; the team margin keeps it out with some room, because the grating lobe rises quickly once it enters.',
      'The triangular lattice is equilateral and the limit is for its worst scan plane.',
      'Element counts are area ÷ cell area: good for apertures many spacings across, rough for small ones.',
      'The in-medium wavelength assumes a lossless, non-magnetic, homogeneous medium.',
    ],
    references: [
      'R. J. Mailloux, Phased Array Antenna Handbook, 2nd ed., Artech House, 2005, §2.1 (section number from memory).',
      'M. I. Skolnik (ed.), Radar Handbook, 3rd ed., McGraw-Hill, 2008, ch. 13 (chapter number from memory).',
      'E. D. Sharp, "A triangular arrangement of planar-array elements that reduces the number needed", IRE Trans. Antennas Propag., AP-9, 1961.',
      'BIPM, The International System of Units (SI Brochure), 9th ed., 2019.',
    ],
    examples: [
      { title: 'Harbour-surveillance panel, 9–10 GHz, ±50° scan, 1.2 m × 0.4 m face', query: '?v=1&f=9GHz&fhi=10GHz&er=1&scan=50deg&lat=triangular&d=16mm&w=1.2m&h=0.4m&shape=rectangle' },
      { title: 'Weather-balloon tracker, 1.68 GHz, ±30° scan, 0.6 λ spacing on a 1 m disc', query: '?v=1&f=1.68GHz&er=1&scan=30deg&lat=rectangular&d=0.6lambda&w=1m&shape=ellipse' },
    ],
    sourcePath: 'calc/calculators/wavelengthSpacing.ts',
    compute: (inputs) => computeWavelengthSpacing(inputs, margin),
  };
}

function highest(inputs: CalcInputs): number {
  const low = inputs.frequencyHz as number;
  const high = inputs.bandHighHz as number | null;
  return high === null ? low : Math.max(low, high);
}
