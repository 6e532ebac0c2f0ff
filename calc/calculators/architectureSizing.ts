/**
 * Requirement-to-architecture sizing: every architecture sized to the same requirement, side by
 * side, with feasibility flags. Each candidate reuses its own calculator's code in calc/.
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import type { Lattice } from '../gratingLobeLimit';
import { freeSpaceWavelengthM } from '../wavelength';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import { limitFlags, type Candidate, type SizingRequirement } from '../sizing/candidate';
import { sizeReflector } from '../sizing/reflectorCandidate';
import { sizePlanarArray } from '../sizing/planarCandidate';
import { sizeLinearArray } from '../sizing/lineCandidate';
import { sizeSparseArray } from '../sizing/ringCandidates';
import { sizeEndFire } from '../sizing/endFireCandidate';
import { chooseCandidate } from '../sizing/chooseCandidate';
import { rectangularSpacingLimitFormula, triangularSpacingLimitFormula } from '../wavelengthFormulas';
import { cosineScanLossFormula } from '../scanLossFormulas';
import { maxGratingFreeSpacingWavelengths } from '../gratingLobeLimit';

export interface SizingData {
  candidates: Candidate[];
  /** id of the recommended candidate, or null when none fits. */
  chosenId: string | null;
  requirement: SizingRequirement;
}

/** Reads the requirement from validated inputs. */
export function sizingRequirement(inputs: CalcInputs): SizingRequirement {
  const fLow = inputs.frequencyHz as number;
  const fHighInput = inputs.bandHighHz as number | null;
  return {
    frequencyLowHz: fHighInput === null ? fLow : Math.min(fLow, fHighInput),
    frequencyHighHz: fHighInput === null ? fLow : Math.max(fLow, fHighInput),
    kind: inputs.requirementKind as 'gain' | 'hpbw',
    gainEdgeDbi: inputs.gainEdgeDbi as number,
    hpbwDeg: inputs.hpbwDeg as number,
    scanAzimuthDeg: inputs.scanAzimuthDeg as number,
    scanElevationDeg: inputs.scanElevationDeg as number,
    limits: {
      maxSizeM: inputs.maxSizeM as number | null,
      maxElements: inputs.maxElements as number | null,
      maxDepthM: inputs.maxDepthM as number | null,
    },
    assumptions: {
      reflectorEfficiency: inputs.reflectorEfficiency as number,
      arrayRadiationEfficiency: inputs.arrayRadiationEfficiency as number,
      cosineExponent: inputs.cosineExponent as number,
      spacingMarginFraction: inputs.spacingMarginFraction as number,
      elementGainDbi: inputs.elementGainDbi as number,
    },
  };
}

/** Sizes every architecture to the same requirement. */
export function computeArchitectureSizing(inputs: CalcInputs): CalcResult<SizingData> {
  const requirement = sizingRequirement(inputs);
  const lattice = inputs.lattice as Lattice;
  const warnings: CalcWarning[] = [];
  const candidates: Candidate[] = [
    sizeReflector(requirement),
    sizeEndFire(requirement),
    sizeLinearArray(requirement),
    sizePlanarArray(requirement, lattice),
    sizeSparseArray(requirement, 'ring'),
    sizeSparseArray(requirement, 'y'),
  ];
  const uniformAzimuth = inputs.uniformAzimuth === 'yes';
  for (const c of candidates) {
    const sparse = c.id === 'ringArray' || c.id === 'yArray';
    if (uniformAzimuth && (c.id === 'planarArray' || c.id === 'linearArray') && requirement.scanAzimuthDeg > 0) {
      c.flags.push(`beam broadens with azimuth scan (about ×${(1 / Math.cos((requirement.scanAzimuthDeg * Math.PI) / 180)).toFixed(2)} at ±${requirement.scanAzimuthDeg}°), not uniform over azimuth`);
    }
    if (!uniformAzimuth && sparse) c.flags.push('sparse aperture with high sidelobes (about −8 dB): chosen only where a uniform beamwidth over azimuth is required');
    c.flags.push(...limitFlags(c, requirement));
  }
  const chosen = chooseCandidate(candidates);
  if (!chosen) warnings.push(warning('nothing-fits', 'caution', 'No architecture meets the requirement within the stated limits: relax a limit or the requirement.', []));
  if (requirement.frequencyHighHz / requirement.frequencyLowHz > 2) warnings.push(warning('wide-band', 'note', 'The band is wider than an octave: elements and feeds this wide are specialised; spacing is set at the highest frequency and gain at the lowest.', []));
  const byId = (id: string) => candidates.find((c) => c.id === id);
  const planar = byId('planarArray')!;
  return {
    values: {
      wavelengthLowM: freeSpaceWavelengthM(requirement.frequencyLowHz),
      reflectorDiameterM: byId('reflector')!.sizeM,
      endFireLengthM: byId('endFire')?.sizeM ?? null,
      linearLengthM: byId('linearArray')!.sizeM,
      linearElements: byId('linearArray')!.elementCount,
      planarWidthM: planar.sizeM,
      planarSpacingM: planar.spacingM ?? null,
      planarElementsRect: planar.elementCountRectangular ?? null,
      planarElementsTri: planar.elementCountTriangular ?? null,
      planarGainEdgeDbi: planar.gainEdgeDbi,
      spacingLimitWavelengths: maxGratingFreeSpacingWavelengths(Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg), lattice),
      planarScanLossDb: planar.gainEdgeDbi - planar.gainBroadsideDbi,
      ringDiameterM: byId('ringArray')!.sizeM,
      ringElements: byId('ringArray')!.elementCount,
      yElements: byId('yArray')!.elementCount,
    },
    warnings,
    data: { candidates, chosenId: chosen?.id ?? null, requirement },
  };
}

export function createArchitectureSizingCalculator(conventions: TeamConventions): CalculatorDef<SizingData> {
  return {
    id: 'architecture-sizing',
    title: 'Architecture sizing',
    purpose: 'Which kind of antenna meets this requirement, and how big must each kind be? Every architecture sized to the same gain or beamwidth and scan range, side by side, with what rules each one out.',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency (or band low edge)', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e6, max: 1e12, description: 'Gain and beamwidth are sized at the lowest frequency, element spacing at the highest.' },
      { kind: 'frequency', key: 'fhi', name: 'bandHighHz', label: 'Band high edge', defaultText: '', min: 1e6, max: 1e12, optional: true, description: 'Optional; empty for a single frequency.' },
      { kind: 'choice', key: 'req', name: 'requirementKind', label: 'Requirement', options: [ { value: 'gain', label: 'Gain at the scan edge' }, { value: 'hpbw', label: 'Half-power beamwidth at broadside' } ], defaultText: 'gain', description: 'Size for a gain that must hold at the edge of the scan range, or for a beamwidth.' },
      { kind: 'decibel', key: 'g', name: 'gainEdgeDbi', label: 'Gain at the scan edge (dBi)', defaultText: '30 dBi', min: 0, max: 80, usedWhen: { key: 'req', values: ['gain'] }, description: 'Gain required at the edge of the scan range.' },
      { kind: 'angle', key: 'bw', name: 'hpbwDeg', label: 'Half-power beamwidth', defaultText: '3 deg', min: 0.01, max: 120, usedWhen: { key: 'req', values: ['hpbw'] }, description: 'Largest HPBW allowed at broadside, both planes.' },
      { kind: 'angle', key: 'saz', name: 'scanAzimuthDeg', label: 'Scan range in azimuth (±)', defaultText: `${conventions.maxScanDeg} deg`, min: 0, max: 85, description: '0 for a fixed beam.' },
      { kind: 'angle', key: 'sel', name: 'scanElevationDeg', label: 'Scan range in elevation (±)', defaultText: '0 deg', min: 0, max: 85, description: '0 for no elevation scan.' },
      { kind: 'choice', key: 'uaz', name: 'uniformAzimuth', label: 'Beamwidth must stay the same over azimuth', options: [ { value: 'no', label: 'No' }, { value: 'yes', label: 'Yes (e.g. all-round surveillance)' } ], defaultText: 'no', description: 'Yes favours circular and Y-shaped arrays, whose beam keeps its width as it steers in azimuth.' },
      { kind: 'length', key: 'maxsize', name: 'maxSizeM', label: 'Size limit (largest dimension)', defaultText: '', min: 1e-3, max: 1e4, optional: true, description: 'Optional limit on the largest dimension.' },
      { kind: 'count', key: 'maxn', name: 'maxElements', label: 'Element-count limit', defaultText: '', min: 1, max: 1e9, optional: true, description: 'Optional limit on the number of array elements.' },
      { kind: 'length', key: 'maxdepth', name: 'maxDepthM', label: 'Depth limit', defaultText: '', min: 1e-4, max: 1e3, optional: true, description: 'Optional limit on depth behind the face (dish depth, boom length, radiating layer).' },
      { kind: 'number', key: 'eta', name: 'reflectorEfficiency', label: 'Assumed reflector aperture efficiency', defaultText: String(conventions.efficiencies.reflectorAperture), min: 0.05, max: 1, description: 'Team default from the conventions.' },
      { kind: 'number', key: 'etar', name: 'arrayRadiationEfficiency', label: 'Assumed array radiation efficiency', defaultText: String(conventions.efficiencies.arrayRadiation), min: 0.05, max: 1, description: 'Team default from the conventions.' },
      { kind: 'number', key: 'nexp', name: 'cosineExponent', label: 'Scan-loss exponent n (cosⁿθ)', defaultText: String(conventions.elementPowerExponent), min: 0.5, max: 10, description: 'Team default from the conventions.' },
      { kind: 'number', key: 'margin', name: 'spacingMarginFraction', label: 'Spacing margin below the grating-lobe limit', defaultText: String(conventions.spacingMarginFraction), min: 0, max: 0.5, description: 'Fraction; team default from the conventions.' },
      { kind: 'choice', key: 'lat', name: 'lattice', label: 'Planar lattice', options: [ { value: 'triangular', label: 'Equilateral triangular' }, { value: 'rectangular', label: 'Rectangular' } ], defaultText: conventions.lattice, description: 'Lattice whose element count the table leads with (both are shown).' },
      { kind: 'decibel', key: 'ge', name: 'elementGainDbi', label: 'Element gain for line arrays (dBi)', defaultText: '6 dBi', min: -5, max: 20, description: 'Gain of one element of a linear array (e.g. a patch or dipole over ground).' },
    ],
    outputs: [
      { key: 'wavelengthLowM', label: 'Wavelength at the lowest frequency', kind: 'length', digits: 5 },
      { key: 'reflectorDiameterM', label: 'Reflector diameter', kind: 'length', digits: 4 },
      { key: 'endFireLengthM', label: 'End-fire / Yagi–Uda length', kind: 'length', digits: 4 },
      { key: 'linearLengthM', label: 'Linear array length', kind: 'length', digits: 4 },
      { key: 'linearElements', label: 'Linear array elements', kind: 'count', digits: 0 },
      { key: 'planarWidthM', label: 'Planar array width (square face)', kind: 'length', digits: 4 },
      { key: 'planarSpacingM', label: 'Planar array spacing (chosen lattice)', kind: 'length', digits: 4 },
      { key: 'spacingLimitWavelengths', label: 'Grating-lobe-free spacing limit (chosen lattice)', kind: 'ratio', digits: 4, unit: 'λ' },
      { key: 'planarElementsRect', label: 'Planar array elements, rectangular lattice', kind: 'count', digits: 0 },
      { key: 'planarElementsTri', label: 'Planar array elements, triangular lattice', kind: 'count', digits: 0 },
      { key: 'planarScanLossDb', label: 'Planar array scan loss at the edge', kind: 'decibel', digits: 4 },
      { key: 'planarGainEdgeDbi', label: 'Planar array gain at the scan edge', kind: 'decibel', digits: 4, unit: 'dBi' },
      { key: 'ringDiameterM', label: 'Circular array diameter', kind: 'length', digits: 4 },
      { key: 'ringElements', label: 'Circular array elements', kind: 'count', digits: 0 },
      { key: 'yElements', label: 'Y-shaped array elements', kind: 'count', digits: 0 },
    ],
    formulas: [
      { formula: rectangularSpacingLimitFormula, output: 'spacingLimitWavelengths', args: (i) => (i.lattice === 'rectangular' ? { scanMaxDeg: Math.max(i.scanAzimuthDeg as number, i.scanElevationDeg as number) } : null) },
      { formula: triangularSpacingLimitFormula, output: 'spacingLimitWavelengths', args: (i) => (i.lattice === 'triangular' ? { scanMaxDeg: Math.max(i.scanAzimuthDeg as number, i.scanElevationDeg as number) } : null) },
      { formula: cosineScanLossFormula, output: 'planarScanLossDb', args: (i) => ({ scanDeg: Math.max(i.scanAzimuthDeg as number, i.scanElevationDeg as number), cosineExponent: i.cosineExponent as number }) },
    ],
    assumptions: [
      'Gain and beamwidth are sized at the lowest frequency of the band (widest beam, least gain); array spacing at the highest (grating lobes).',
      'Reflector: front-fed, f/D 0.4, −10 dB edge taper, with the assumed aperture efficiency; its beam comes from the reflector calculator’s aperture pattern; it scans mechanically.',
      'Planar array: square face, uniform excitation, directivity 4πA/λ² with the assumed radiation efficiency, scan loss cosⁿθ at the worst scan edge, spacing from the grating-lobe limit with the team margin.',
      'Linear array: array gain N × element gain (elements λ/2 or more apart; common practice, no source); the beam across the array is the element’s.',
      'Yagi–Uda: a single antenna from the published gain-versus-boom table, rotated to steer; flagged impractical past the longest published boom.',
      'Circular and Y arrays: λ/2 spacing at the highest frequency, isotropic elements over a ground plane (+3 dB), directivity by the engine’s exact pair sum and beamwidths by root-finding on the computed pattern.',
      'The recommended candidate is the smallest by area (the mass proxy) among those with no flags.',
    ],
    references: [
      'R. J. Mailloux, Phased Array Antenna Handbook, 2nd ed., Artech House, 2005.',
      'C. A. Balanis, Antenna Theory, 4th ed., Wiley, 2016, ch. 6 and 15 (chapter number from memory).',
      'W. L. Stutzman and G. A. Thiele, Antenna Theory and Design, 3rd ed., Wiley, 2012, §2.4 (section number from memory; gain–beamwidth rule).',
    ],
    examples: [
      { title: 'Coastal surveillance radar, 9.2–9.6 GHz, 34 dBi at ±45° azimuth', query: '?v=1&f=9.2GHz&fhi=9.6GHz&req=gain&g=34dBi&saz=45deg&sel=0deg&uaz=no&maxsize=2m&eta=0.6&etar=0.8&nexp=1.3&margin=0.05&lat=triangular&ge=6dBi' },
      { title: 'Rooftop weather-radar panel, 5.6 GHz, 2.5° beam, ±30° azimuth, square lattice', query: '?v=1&f=5.6GHz&req=hpbw&bw=2.5deg&saz=30deg&sel=0deg&uaz=no&eta=0.6&etar=0.8&nexp=1.3&margin=0.05&lat=rectangular&ge=6dBi' },
      { title: 'Balloon-tracking ground station, 1.68 GHz, 4° beam, ±60° in both planes, 3 m limit', query: '?v=1&f=1.68GHz&req=hpbw&bw=4deg&saz=60deg&sel=60deg&uaz=yes&maxsize=3m&eta=0.6&etar=0.8&nexp=1.3&margin=0.05&lat=triangular&ge=6dBi' },
    ],
    sourcePath: 'calc/calculators/architectureSizing.ts',
    compute: (inputs) => computeArchitectureSizing(inputs),
  };
}
