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
import type { ArchitectureId, Candidate, SizingRequirement } from '../sizing/candidate';
import { sizeReflector } from '../sizing/reflectorCandidate';
import { sizePlanarArray } from '../sizing/planarCandidate';
import { sizeLinearArray } from '../sizing/lineCandidate';
import { sizeSparseArray } from '../sizing/ringCandidates';
import { sizeEndFire } from '../sizing/endFireCandidate';
import { checkCandidate, UNIFORM_BEAM_TOLERANCE } from '../sizing/candidateChecks';
import { chooseCandidate, RECOMMENDATION_RULE } from '../sizing/chooseCandidate';
import { coverageCornerScanDeg, coverageSpacingLimitScanDeg, coverageSpacingLimitWavelengths } from '../sizing/coverage';
import { rectangularSpacingLimitFormula, triangularSpacingLimitFormula } from '../wavelengthFormulas';
import { cosineScanLossFormula } from '../scanLossFormulas';
import { hpbwFromDirectivityFormula } from '../endFireFormulas';
import { cosineElementExtraLossDb } from '../scanLoss';

export interface SizingData {
  candidates: Candidate[];
  /** id of the recommended candidate, or null when none fits. */
  chosenId: string | null;
  requirement: SizingRequirement;
  /** The rule the recommendation follows, as the page states it. */
  recommendationRule: string;
}

/** The results-table outputs that show each candidate's numbers (their rows carry its flags). */
export const CANDIDATE_OUTPUT_KEYS: Record<ArchitectureId, string[]> = {
  reflector: ['reflectorDiameterM'],
  endFire: ['endFireLengthM', 'endFireGainDbi', 'endFireHpbwDeg'],
  linearArray: ['linearLengthM', 'linearElements'],
  planarArray: ['planarWidthM', 'planarSpacingM', 'planarElementsRect', 'planarElementsTri', 'planarScanLossDb', 'planarGainEdgeDbi'],
  ringArray: ['ringDiameterM', 'ringElements'],
  yArray: ['yElements'],
};

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
    uniformBeam: inputs.uniformAzimuth === 'yes',
    maxSidelobeDb: (inputs.maxSidelobeDb as number | null | undefined) ?? null,
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

/** One caution per candidate that does not fit, naming the outputs that show its numbers. */
function candidateWarnings(candidates: Candidate[]): CalcWarning[] {
  return candidates
    .filter((c) => !c.fits)
    .map((c) => warning(`candidate-does-not-fit-${c.id}`, 'caution', `${c.name} does not fit: ${c.flags.map((f) => f.message).join('; ')}.`, CANDIDATE_OUTPUT_KEYS[c.id]));
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
  ].map((c) => checkCandidate(c, requirement));
  const chosen = chooseCandidate(candidates);
  const corner = coverageCornerScanDeg(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const n = requirement.assumptions.cosineExponent;
  if (n < 1) {
    const arrays = (['linearArray', 'planarArray', 'ringArray', 'yArray'] as const).flatMap((id) => CANDIDATE_OUTPUT_KEYS[id]);
    const extraDb = cosineElementExtraLossDb(Math.min(corner, 89.9), n);
    warnings.push(warning('element-exponent-below-one', 'outside-validity', `Element power pattern cosⁿθ with n = ${n} is below the bound n ≥ 1: the element would add ${extraDb.toFixed(2)} dB at the coverage corner on top of the projected aperture cos θ, more gain than a scanned face can have; the arrays' scan-edge gains are optimistic.`, [...arrays, 'cornerScanDeg']));
  }
  warnings.push(...candidateWarnings(candidates));
  if (!chosen) warnings.push(warning('nothing-fits', 'caution', 'No architecture meets the requirement within the stated limits: relax a limit or the requirement.', []));
  if (requirement.frequencyHighHz / requirement.frequencyLowHz > 2) warnings.push(warning('wide-band', 'note', 'The band is wider than an octave: elements and feeds this wide are specialised; spacing is set at the highest frequency and gain at the lowest.', []));
  const byId = (id: ArchitectureId) => candidates.find((c) => c.id === id)!;
  const planar = byId('planarArray');
  const planarOutline = planar.outline as { kind: 'rectangle'; widthM: number };
  return {
    values: {
      wavelengthLowM: freeSpaceWavelengthM(requirement.frequencyLowHz),
      cornerScanDeg: corner,
      reflectorDiameterM: byId('reflector').sizeM,
      endFireLengthM: byId('endFire').depthM,
      endFireGainDbi: byId('endFire').gainBroadsideDbi,
      endFireHpbwDeg: byId('endFire').hpbwBroadsideDeg[0],
      linearLengthM: (byId('linearArray').outline as { widthM: number }).widthM,
      linearElements: byId('linearArray').elementCount,
      planarWidthM: planarOutline.widthM,
      planarSpacingM: planar.spacingM ?? null,
      planarElementsRect: planar.elementCountRectangular ?? null,
      planarElementsTri: planar.elementCountTriangular ?? null,
      planarGainEdgeDbi: planar.gainEdgeDbi,
      spacingLimitWavelengths: coverageSpacingLimitWavelengths(requirement.scanAzimuthDeg, requirement.scanElevationDeg, lattice),
      planarScanLossDb: planar.gainEdgeDbi - planar.gainBroadsideDbi,
      ringDiameterM: byId('ringArray').sizeM,
      ringElements: byId('ringArray').elementCount,
      yElements: byId('yArray').elementCount,
    },
    warnings,
    data: { candidates, chosenId: chosen?.id ?? null, requirement, recommendationRule: RECOMMENDATION_RULE },
  };
}

export function createArchitectureSizingCalculator(conventions: TeamConventions): CalculatorDef<SizingData> {
  return {
    id: 'architecture-sizing',
    title: 'Architecture sizing',
    summary: 'Every architecture — reflector, end-fire, linear, planar, circular and Y arrays — sized to one gain or beamwidth requirement, side by side, with what rules each out.',
    nav: { order: 1 },
    safety: { lead: '', cautions: ['rfExposure', 'workAtHeight'] },
    embed: true,
    purpose: 'Which kind of antenna meets this requirement, and how big must each kind be? Every architecture sized to the same gain or beamwidth over the same coverage region, side by side, with what rules each one out.',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency (or band low edge)', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e6, max: 1e12, description: 'Gain and beamwidth are sized at the lowest frequency, element spacing at the highest.' },
      { kind: 'frequency', key: 'fhi', name: 'bandHighHz', label: 'Band high edge', defaultText: '', min: 1e6, max: 1e12, optional: true, description: 'Optional; empty for a single frequency.' },
      { kind: 'choice', key: 'req', name: 'requirementKind', label: 'Requirement', options: [ { value: 'gain', label: 'Gain at the scan edge' }, { value: 'hpbw', label: 'Half-power beamwidth at broadside' } ], defaultText: 'gain', description: 'Size for a gain that must hold at the edge of the scan range, or for a beamwidth.' },
      { kind: 'decibel', key: 'g', name: 'gainEdgeDbi', label: 'Gain at the scan edge (dBi)', defaultText: '30 dBi', min: 0, max: 80, usedWhen: { key: 'req', values: ['gain'] }, description: 'Gain required at the edge of the scan range.' },
      { kind: 'angle', key: 'bw', name: 'hpbwDeg', label: 'Half-power beamwidth', defaultText: '3 deg', min: 0.01, max: 120, usedWhen: { key: 'req', values: ['hpbw'] }, description: 'Largest HPBW allowed at broadside, both planes.' },
      { kind: 'angle', key: 'saz', name: 'scanAzimuthDeg', label: 'Coverage in azimuth (±, from boresight)', defaultText: `${conventions.maxScanDeg} deg`, min: 0, max: 85, description: '0 for a fixed beam. Azimuth in the horizontal plane from the boresight, the same for every candidate.' },
      { kind: 'angle', key: 'sel', name: 'scanElevationDeg', label: 'Coverage in elevation (±, from boresight)', defaultText: '0 deg', min: 0, max: 85, description: '0 for no elevation scan. Elevation from the horizontal plane; the region\'s corner is acos(cos az · cos el) from a face looking at the boresight.' },
      { kind: 'choice', key: 'uaz', name: 'uniformAzimuth', label: 'Beamwidth must stay the same over the scan range', options: [ { value: 'no', label: 'No' }, { value: 'yes', label: 'Yes (e.g. all-round surveillance)' } ], defaultText: 'no', description: `Yes rules out every candidate whose beam at the coverage corner is more than ${UNIFORM_BEAM_TOLERANCE * 100} % wider than at broadside: an electronically scanned face, ring or Y broadens alike; a mechanically steered antenna does not.` },
      { kind: 'levelBelowPeak', key: 'sll', name: 'maxSidelobeDb', label: 'Highest first sidelobe allowed (dB relative to the peak)', defaultText: '-13 dB', min: -80, max: 0, optional: true, description: 'Relative to the beam peak, negative (−13 dB is 13 dB below it; a positive depth is read as the same level); empty for no sidelobe requirement. −13 dB admits uniform excitation (−13.26 dB) and rules out sparse rings (about −8 dB).' },
      { kind: 'length', key: 'maxsize', name: 'maxSizeM', label: 'Size limit (largest dimension)', defaultText: '', min: 1e-3, max: 1e4, optional: true, description: 'Optional limit on the largest dimension.' },
      { kind: 'count', key: 'maxn', name: 'maxElements', label: 'Element-count limit', defaultText: '', min: 1, max: 1e9, optional: true, description: 'Optional limit on the number of array elements.' },
      { kind: 'length', key: 'maxdepth', name: 'maxDepthM', label: 'Depth limit', defaultText: '', min: 1e-4, max: 1e3, optional: true, description: 'Optional limit on depth behind the face (dish depth, boom length, radiating layer).' },
      { kind: 'number', key: 'eta', name: 'reflectorEfficiency', label: 'Assumed reflector aperture efficiency', defaultText: String(conventions.efficiencies.reflectorAperture), min: 0.05, max: 1, description: 'Team default from the conventions.' },
      { kind: 'number', key: 'etar', name: 'arrayRadiationEfficiency', label: 'Assumed array radiation efficiency', defaultText: String(conventions.efficiencies.arrayRadiation), min: 0.05, max: 1, description: 'Team default from the conventions.' },
      { kind: 'number', key: 'nexp', name: 'cosineExponent', label: 'Element power pattern cosⁿθ, n', defaultText: String(conventions.elementPowerExponent), min: 0.5, max: 10, description: 'Exponent of the embedded element power pattern (team default elementPowerExponent); sets the scan loss of every array. Below 1 the element would beat the projected aperture: a warning says so.' },
      { kind: 'number', key: 'margin', name: 'spacingMarginFraction', label: 'Spacing margin below the grating-lobe limit', defaultText: String(conventions.spacingMarginFraction), min: 0, max: 0.5, description: 'Fraction; team default from the conventions.' },
      { kind: 'choice', key: 'lat', name: 'lattice', label: 'Planar lattice', options: [ { value: 'triangular', label: 'Equilateral triangular' }, { value: 'rectangular', label: 'Rectangular' } ], defaultText: conventions.lattice, description: 'Lattice whose element count the table leads with (both are shown).' },
      { kind: 'decibel', key: 'ge', name: 'elementGainDbi', label: 'Element gain for line arrays (dBi)', defaultText: '6 dBi', min: -5, max: 20, description: 'Gain of one element of a linear array at λ/2 spacing (e.g. a patch or dipole over ground); it sets the element height across the line, h = Gλ/2π.' },
    ],
    outputs: [
      { key: 'wavelengthLowM', label: 'Wavelength at the lowest frequency', kind: 'length', digits: 4 },
      { key: 'cornerScanDeg', label: 'Coverage corner from the face normal, acos(cos az · cos el)', kind: 'angle', digits: 3 },
      { key: 'reflectorDiameterM', label: 'Reflector diameter', kind: 'length', digits: 3 },
      { key: 'endFireLengthM', label: 'Yagi–Uda boom length', kind: 'length', digits: 2, description: 'From a transcribed table: two figures' },
      { key: 'endFireGainDbi', label: 'Yagi–Uda gain (published table)', kind: 'decibel', digits: 3, decimals: 1, unit: 'dBi', description: 'Transcribed table value (from memory): to 0.1 dB' },
      { key: 'endFireHpbwDeg', label: 'Yagi–Uda beamwidth, √(41 253/G)', kind: 'angle', digits: 2, description: 'Beam-area estimate: two figures' },
      { key: 'linearLengthM', label: 'Linear array length', kind: 'length', digits: 3 },
      { key: 'linearElements', label: 'Linear array elements', kind: 'count', digits: 0 },
      { key: 'planarWidthM', label: 'Planar array width (square face)', kind: 'length', digits: 3 },
      { key: 'planarSpacingM', label: 'Planar array spacing (chosen lattice)', kind: 'length', digits: 3 },
      { key: 'spacingLimitWavelengths', label: 'Grating-lobe-free spacing limit over the coverage (chosen lattice)', kind: 'ratio', digits: 3, unit: 'λ' },
      { key: 'planarElementsRect', label: 'Planar array elements, rectangular lattice', kind: 'count', digits: 0 },
      { key: 'planarElementsTri', label: 'Planar array elements, triangular lattice', kind: 'count', digits: 0 },
      { key: 'planarScanLossDb', label: 'Planar array scan loss at the coverage corner', kind: 'decibel', digits: 3 },
      { key: 'planarGainEdgeDbi', label: 'Planar array gain at the coverage corner', kind: 'decibel', digits: 3, unit: 'dBi' },
      { key: 'ringDiameterM', label: 'Circular array diameter', kind: 'length', digits: 3 },
      { key: 'ringElements', label: 'Circular array elements', kind: 'count', digits: 0 },
      { key: 'yElements', label: 'Y-shaped array elements', kind: 'count', digits: 0 },
    ],
    formulas: [
      { formula: rectangularSpacingLimitFormula, output: 'spacingLimitWavelengths', args: (i) => (i.lattice === 'rectangular' ? { scanMaxDeg: coverageSpacingLimitScanDeg(i.scanAzimuthDeg as number, i.scanElevationDeg as number, 'rectangular') } : null) },
      { formula: triangularSpacingLimitFormula, output: 'spacingLimitWavelengths', args: (i) => (i.lattice === 'triangular' ? { scanMaxDeg: coverageSpacingLimitScanDeg(i.scanAzimuthDeg as number, i.scanElevationDeg as number, 'triangular') } : null) },
      { formula: cosineScanLossFormula, output: 'planarScanLossDb', args: (i) => ({ scanDeg: Math.min(coverageCornerScanDeg(i.scanAzimuthDeg as number, i.scanElevationDeg as number), 89.9), cosineExponent: i.cosineExponent as number }) },
      { formula: hpbwFromDirectivityFormula, output: 'endFireHpbwDeg', args: (_i, v) => (v.endFireGainDbi === null ? null : { directivity: 10 ** (v.endFireGainDbi / 10) }) },
    ],
    assumptions: [
      'Coverage means the same for every candidate: the region ±az in azimuth by ±el in elevation about a boresight (elevation from the horizontal plane). An electronically scanned face, ring or Y looks at the boresight, so its worst direction is the region\'s corner, θ = acos(cos az · cos el) from its normal: scan loss, gain at the edge and beam broadening are taken there. A reflector or Yagi–Uda is turned mechanically and keeps its beam over the whole region.',
      'Grating lobes: a rectangular lattice (axes horizontal and vertical) needs d/λ ≤ 1/(1 + sin az) and ≤ 1/(1 + sin el), the larger plane edge deciding (direction cosines u = sin az · cos el, v = sin el); the triangular lattice uses the cone through the corner, which is conservative. Spacing is set at the highest frequency less the team margin.',
      'Gain and beamwidth are sized at the lowest frequency of the band (widest beam, least gain).',
      'Every array uses one element model: each element fills its lattice cell, so a face of area A has directivity 4πA/λ² (× radiation efficiency) and each element the gain of its cell, 4π·cell/λ²; the table shows that element gain. A line is a face of length L and element height h = Gλ/2π set by the element gain G at λ/2 spacing. Rings and Ys are isotropic elements over a ground plane (+3 dB) with the engine\'s exact directivity. Every array loses cosⁿθ at the corner (element power pattern).',
      'Reflector: front-fed, f/D 0.4, −10 dB edge taper, with the assumed aperture efficiency; for a beamwidth requirement its diameter is the root of HPBW(D) = requirement on the reflector calculator\'s aperture pattern; flagged below D/λ = 10, where that model no longer holds.',
      'Yagi–Uda: a single antenna from the published gain-versus-boom table, rotated to steer; flagged impractical past the longest published boom.',
      'Beamwidth from directivity (Yagi–Uda beam, the line\'s fan beam): θ ≈ √(41 253/D) degrees, the beam-area relation 4π(180/π)² = 41 253 deg² (Kraus) for a pencil beam without sidelobes, the same constant as the end-fire page; rule-of-thumb and table values are shown to two figures.',
      'Footprint: the area of the smallest circle enclosing the antenna in its largest view (a dish\'s face, a face\'s diagonal, a line\'s length, a Yagi\'s boom), the one measure compared across candidates.',
      `Recommendation: ${RECOMMENDATION_RULE}`,
    ],
    references: [
      'R. J. Mailloux, Phased Array Antenna Handbook, 2nd ed., Artech House, 2005 (§2.1 (section number from memory) grating lobes in direction cosines).',
      'C. A. Balanis, Antenna Theory, 4th ed., Wiley, 2016, ch. 6 (chapter number from memory), 12 and 15.',
      'J. D. Kraus, Antennas, 2nd ed., McGraw-Hill, 1988, §2-13 (section number from memory) (beam area and directivity).',
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
