/**
 * Scan-loss estimate: how much gain a planar phased array loses as it scans, split into
 * projected aperture, element factor and mismatch; beam broadening; grating-lobe onset; and the
 * aperture growth needed to hold a gain target at the scan edge.
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { freeSpaceWavelengthM } from '../wavelength';
import { gratingLobeOnsetScanDeg, latticeCellAreaPerSpacingSquared, type Lattice } from '../gratingLobeLimit';
import { apertureGainFromArea } from '../aperture/index';
import { beamBroadeningFactor, scanLossPartsDb, uniformLineHpbwDeg, type ElementModel } from '../scanLoss';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import { beamBroadeningFormula, cosineScanLossFormula, currentSheetFormula } from '../scanLossFormulas';

export interface ScanSweepPoint {
  scanDeg: number;
  projectedDb: number;
  elementDb: number;
  mismatchDb: number;
  totalDb: number;
  /** Scan-plane HPBW from the computed pattern of a line across the aperture, degrees (null if undefined). */
  hpbwDeg: number | null;
  /** HPBW(0)/cos θ0, degrees. */
  hpbwCosineLawDeg: number | null;
}

export interface ScanLossData {
  sweep: ScanSweepPoint[];
  scanMaxDeg: number;
  gratingOnsetDeg: number;
}

/** Largest line length the beamwidth sweep evaluates (elements). */
const MAX_LINE_ELEMENTS = 1_000_000;

/** Pure computation from validated inputs. */
export function computeScanLoss(inputs: CalcInputs): CalcResult<ScanLossData> {
  const f = inputs.frequencyHz as number;
  const lambda = freeSpaceWavelengthM(f);
  const spacingM = inputs.spacingM as number;
  const dWl = spacingM / lambda;
  const lattice = inputs.lattice as Lattice;
  const sizeBy = inputs.sizeBy as 'width' | 'count';
  const scanMax = inputs.scanMaxDeg as number;
  const model = inputs.elementModel as ElementModel;
  const exponent = inputs.cosineExponent as number;
  const efficiency = inputs.radiationEfficiency as number;
  const target = inputs.targetGainDbi as number | null;
  const warnings: CalcWarning[] = [];

  const cellM2 = latticeCellAreaPerSpacingSquared(lattice) * spacingM * spacingM;
  let areaM2: number;
  let count: number;
  if (sizeBy === 'width') {
    const width = inputs.apertureWidthM as number;
    areaM2 = width * width;
    count = Math.max(1, Math.round(areaM2 / cellM2));
  } else {
    count = inputs.elementCount as number;
    areaM2 = count * cellM2;
  }
  const widthM = Math.sqrt(areaM2);
  const lineCount = Math.min(MAX_LINE_ELEMENTS, Math.max(2, Math.round(widthM / spacingM)));

  const d0 = apertureGainFromArea(areaM2, lambda);
  const directivityDbi = 10 * Math.log10(d0);
  const gainBroadsideDbi = directivityDbi + 10 * Math.log10(efficiency);
  const edge = scanLossPartsDb(scanMax, model, exponent);
  const gainEdgeDbi = gainBroadsideDbi + edge.totalDb;
  const onset = gratingLobeOnsetScanDeg(dWl, lattice);

  const hpbw0 = uniformLineHpbwDeg(lineCount, dWl, 0);
  const hpbwEdge = uniformLineHpbwDeg(lineCount, dWl, scanMax);

  const sweep: ScanSweepPoint[] = [];
  const stop = Math.min(85, Math.max(60, Math.ceil((scanMax + 15) / 5) * 5));
  for (let s = 0; s <= stop + 1e-9; s += 2.5) {
    const parts = scanLossPartsDb(s, model, exponent);
    sweep.push({ scanDeg: s, ...parts, hpbwDeg: uniformLineHpbwDeg(lineCount, dWl, s), hpbwCosineLawDeg: hpbw0 === null ? null : hpbw0 * beamBroadeningFactor(s) });
  }

  let areaGrowth: number | null = null;
  let requiredWidthM: number | null = null;
  let requiredCount: number | null = null;
  let targetMarginDb: number | null = null;
  if (target !== null) {
    targetMarginDb = gainEdgeDbi - target;
    areaGrowth = Math.max(1, 10 ** (-targetMarginDb / 10));
    requiredWidthM = widthM * Math.sqrt(areaGrowth);
    requiredCount = Math.ceil((areaM2 * areaGrowth) / cellM2);
  }

  if (onset < scanMax) {
    warnings.push(warning('grating-lobe-in-scan', 'caution', `A grating lobe enters visible space at ${onset.toFixed(1)}° scan, inside the ${scanMax}° scan range: the gain loss is larger than shown and the pattern is spoiled.`, ['gratingOnsetDeg', 'totalScanLossDb']));
  }
  if (scanMax > 60) warnings.push(warning('wide-scan', 'note', 'Beyond about 60° real elements often fall faster than any cosⁿ fit, and the cos θ broadening law loses accuracy; check with measured embedded patterns.', ['totalScanLossDb', 'hpbwEdgeDeg']));
  if (lineCount < 8) warnings.push(warning('small-aperture', 'outside-validity', 'Fewer than 8 elements across: edge elements behave differently from the infinite-array models used here.', ['totalScanLossDb', 'hpbwBroadsideDeg']));
  if (model === 'cosine' && exponent < 1) {
    warnings.push(warning('element-exponent-below-one', 'outside-validity', `An element power pattern cosⁿθ with n = ${exponent} < 1 makes the element factor a gain of ${edge.elementDb.toFixed(2)} dB at ${scanMax}°: the scanned gain would exceed the projected-aperture limit 4πA·cos θ₀/λ². The embedded element pattern of a large array cannot beat the projected aperture, so n ≥ 1 (n = 1 is the ideal).`, ['elementDb', 'totalScanLossDb', 'gainEdgeDbi']));
  }
  if (dWl < 0.25) warnings.push(warning('close-spacing', 'note', 'Spacing below λ/4: strong mutual coupling; the element model matters more than usual.', ['totalScanLossDb']));

  return {
    values: {
      areaM2,
      elementCount: count,
      spacingWavelengths: dWl,
      directivityBroadsideDbi: directivityDbi,
      gainBroadsideDbi,
      projectedDb: edge.projectedDb,
      elementDb: model === 'cosine' ? edge.elementDb : null,
      mismatchDb: model === 'currentSheet' ? edge.mismatchDb : null,
      totalScanLossDb: edge.totalDb,
      gainEdgeDbi,
      hpbwBroadsideDeg: hpbw0,
      hpbwEdgeDeg: hpbwEdge,
      broadeningComputed: hpbw0 !== null && hpbwEdge !== null ? hpbwEdge / hpbw0 : null,
      broadeningCosineLaw: beamBroadeningFactor(scanMax),
      gratingOnsetDeg: onset,
      targetMarginDb,
      areaGrowth,
      requiredWidthM,
      requiredCount,
    },
    warnings,
    data: { sweep, scanMaxDeg: scanMax, gratingOnsetDeg: onset },
  };
}

export function createScanLossCalculator(conventions: TeamConventions): CalculatorDef<ScanLossData> {
  return {
    id: 'scan-loss',
    title: 'Scan-loss estimate',
    summary: 'Gain lost at the scan edge — projected aperture, element factor, mismatch — beam broadening, grating-lobe onset, and the aperture growth a gain target needs.',
    nav: { order: 7 },
    safety: { lead: 'A scanned array still concentrates its power along the steered beam.', cautions: ['rfExposure'] },
    embed: true,
    purpose: 'How much gain does a planar phased array lose at the edge of its scan range, where does that loss come from, and how much bigger must the aperture be to hold a gain target there?',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e6, max: 1e12, description: 'Design frequency.' },
      { kind: 'length', key: 'd', name: 'spacingM', label: 'Element spacing', defaultText: '0.55 λ', min: 1e-5, max: 100, wavelengthFrom: 'design', description: 'Nearest-neighbour spacing (may be given in λ).' },
      { kind: 'choice', key: 'lat', name: 'lattice', label: 'Lattice', options: [ { value: 'rectangular', label: 'Rectangular (square cell)' }, { value: 'triangular', label: 'Equilateral triangular' } ], defaultText: conventions.lattice, description: 'Element lattice.' },
      { kind: 'choice', key: 'by', name: 'sizeBy', label: 'Aperture given by', options: [ { value: 'width', label: 'Width of a square face' }, { value: 'count', label: 'Element count' } ], defaultText: 'width', description: 'Give the aperture as the side of a square face, or as a number of elements.' },
      { kind: 'length', key: 'w', name: 'apertureWidthM', label: 'Aperture width (square face)', defaultText: '0.5 m', min: 1e-4, max: 1000, wavelengthFrom: 'design', description: 'Side of the square array face; used when the aperture is given by width.' },
      { kind: 'count', key: 'n', name: 'elementCount', label: 'Element count', defaultText: '256', min: 4, max: 10_000_000, description: 'Number of elements; used when the aperture is given by count.' },
      { kind: 'angle', key: 'scan', name: 'scanMaxDeg', label: 'Maximum scan angle from broadside', defaultText: `${conventions.maxScanDeg} deg`, min: 0, max: 85, description: 'Scan edge, in the worst plane.' },
      { kind: 'choice', key: 'el', name: 'elementModel', label: 'Element model', options: [ { value: 'cosine', label: 'Embedded element power pattern cosⁿθ' }, { value: 'currentSheet', label: 'Ideal infinite current sheet (with its scan mismatch)' } ], defaultText: 'cosine', description: 'How the embedded element behaves with scan.' },
      { kind: 'number', key: 'nexp', name: 'cosineExponent', label: 'Element power pattern cosⁿθ, n', defaultText: String(conventions.elementPowerExponent), min: 0.5, max: 10, usedWhen: { key: 'el', values: ['cosine'] }, description: 'Exponent of the embedded element\'s power pattern (not field); team default from the conventions. 1 means the projected-aperture loss alone; below 1 is physically impossible for a large array and gets a warning.' },
      { kind: 'number', key: 'eta', name: 'radiationEfficiency', label: 'Radiation efficiency', defaultText: String(conventions.efficiencies.arrayRadiation), min: 0.01, max: 1, description: 'Feed network and element losses (team default from the conventions).' },
      { kind: 'decibel', key: 'gt', name: 'targetGainDbi', label: 'Gain target at the scan edge (dBi)', defaultText: '', min: -20, max: 80, optional: true, description: 'Optional: the gain the array must still have at the scan edge.' },
    ],
    outputs: [
      { key: 'areaM2', label: 'Aperture area', kind: 'number', digits: 4, unit: 'm²' },
      { key: 'elementCount', label: 'Elements', kind: 'count', digits: 0 },
      { key: 'spacingWavelengths', label: 'Spacing', kind: 'ratio', digits: 4, unit: 'λ' },
      { key: 'directivityBroadsideDbi', label: 'Broadside directivity 4πA/λ²', kind: 'decibel', digits: 4, unit: 'dBi', description: 'Directivity (IEEE Std 145) of the filled aperture with a forward element: no losses' },
      { key: 'gainBroadsideDbi', label: 'Broadside gain η·4πA/λ²', kind: 'decibel', digits: 4, unit: 'dBi', description: 'Gain (IEEE Std 145): directivity times the radiation efficiency; matched at broadside, so realized gain too' },
      { key: 'projectedDb', label: 'Directivity drop at the scan edge: projected aperture cos θ₀', kind: 'decibel', digits: 4, description: 'The drop of the array\'s directivity itself: 4πA·cos θ₀/λ²' },
      { key: 'elementDb', label: 'Realized-gain drop at the scan edge: element factor beyond cos θ₀', kind: 'decibel', digits: 4, description: 'cos^(n−1) θ₀ of the embedded element power pattern cosⁿθ: mismatch and coupling folded into n; not a directivity change' },
      { key: 'mismatchDb', label: 'Realized-gain drop at the scan edge: mismatch (current sheet)', kind: 'decibel', digits: 4, description: '1 − |Γ|² of the ideal current sheet matched at broadside' },
      { key: 'totalScanLossDb', label: 'Total scan loss at the edge (realized gain)', kind: 'decibel', digits: 4, description: 'Projected aperture (directivity) plus the element factor or the mismatch (realized gain), relative to broadside' },
      { key: 'gainEdgeDbi', label: 'Realized gain at the scan edge', kind: 'decibel', digits: 4, unit: 'dBi', description: 'Broadside gain plus the total scan loss: efficiency, projected aperture and the element factor or mismatch included' },
      { key: 'hpbwBroadsideDeg', label: 'HPBW at broadside (scan plane)', kind: 'angle', digits: 4 },
      { key: 'hpbwEdgeDeg', label: 'HPBW at the scan edge (scan plane)', kind: 'angle', digits: 4 },
      { key: 'broadeningComputed', label: 'Beam broadening, from the computed pattern', kind: 'ratio', digits: 4, unit: '×' },
      { key: 'broadeningCosineLaw', label: 'Beam broadening, 1/cos θ law', kind: 'ratio', digits: 4, unit: '×' },
      { key: 'gratingOnsetDeg', label: 'Grating lobe enters at scan', kind: 'angle', digits: 3, description: '90° means none can enter at any scan' },
      { key: 'targetMarginDb', label: 'Margin over the gain target at the edge', kind: 'decibel', digits: 4 },
      { key: 'areaGrowth', label: 'Aperture area growth needed', kind: 'ratio', digits: 4, unit: '×' },
      { key: 'requiredWidthM', label: 'Square-face width that meets the target', kind: 'length', digits: 4 },
      { key: 'requiredCount', label: 'Elements that meet the target', kind: 'count', digits: 0 },
    ],
    formulas: [
      { formula: cosineScanLossFormula, output: 'totalScanLossDb', args: (i) => (i.elementModel === 'cosine' ? { scanDeg: i.scanMaxDeg as number, cosineExponent: i.cosineExponent as number } : null) },
      { formula: currentSheetFormula, output: 'mismatchDb', args: (i) => (i.elementModel === 'currentSheet' ? { scanDeg: i.scanMaxDeg as number } : null) },
      { formula: beamBroadeningFormula, output: 'broadeningCosineLaw', args: (i) => ({ scanDeg: i.scanMaxDeg as number }) },
    ],
    assumptions: [
      'The aperture is large and uniformly excited: directivity 4πA/λ² at broadside, with a forward element pattern (no back radiation).',
      'Scan loss is the same in every scan plane; real elements differ between E and H planes.',
      'Beamwidths are computed for a uniformly excited line of elements across the aperture width (root-finding on its array factor), beside the 1/cos θ law.',
      'No grating lobe is assumed in visible space; when one enters, the loss is larger than shown (a warning says so).',
      'The cosⁿθ model is of the embedded element power pattern (the exponent of the power, not the field, pattern), and folds mismatch and element effects into n; the current-sheet model is an ideal upper bound on performance, not a real element.',
      'Which quantity each part is: the projected aperture cos θ₀ is the drop of the array\'s directivity (IEEE Std 145); the element factor beyond it and the current-sheet mismatch are drops of realized gain, which the directivity of the array pattern does not show.',
    ],
    references: [
      'R. J. Mailloux, Phased Array Antenna Handbook, 2nd ed., Artech House, 2005, §1.1 and §2.1 (section number from memory).',
      'H. A. Wheeler, "Simple relations derived from a phased-array antenna made of an infinite current sheet", IEEE Trans. Antennas Propag., AP-13, 1965.',
      'C. A. Balanis, Antenna Theory, 4th ed., Wiley, 2016, §6.3 (section number from memory).',
    ],
    examples: [
      { title: 'Airport surface-movement panel, 9.4 GHz, ±50°, 0.8 m face, 36 dBi needed at the edge', query: '?v=1&f=9.4GHz&d=0.58lambda&lat=triangular&by=width&w=0.8m&scan=50deg&el=cosine&nexp=1.3&eta=0.75&gt=36dB' },
      { title: 'Satellite-tracking tile, 20 GHz, 1024 elements, ±60°, ideal current sheet', query: '?v=1&f=20GHz&d=0.5lambda&lat=rectangular&by=count&n=1024&scan=60deg&el=currentSheet&nexp=1.3&eta=0.7' },
    ],
    sourcePath: 'calc/calculators/scanLoss.ts',
    compute: (inputs) => computeScanLoss(inputs),
  };
}
