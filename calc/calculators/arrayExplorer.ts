/**
 * Array pattern explorer: pattern cut, directivity, beamwidths, sidelobe level and grating lobes
 * of linear, planar, ring, Y-armed and thinned arrays, computed by the array engine (calc/array).
 *
 * Two modes share one function. 'interactive' (the frame's synchronous compute, also used for
 * the server-rendered page) does everything whose estimated cost fits SYNC_BUDGET_EVALUATIONS
 * and lists the rest in data.pending; 'complete' does everything (the page's worker runs it).
 * The page feeds complete results back through the `background` lookup, so the frame's table
 * shows them as soon as they arrive.
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { warning, type CalcWarning } from '../warnings';
import { gratingLobeOnsetScanDeg, latticeCellAreaPerSpacingSquared } from '../gratingLobeLimit';
import { apertureGainFromArea } from '../aperture/index';
import { degToRad } from '../angle';
import { gratingLobeOnsetFormula, wavelengthFormula } from '../wavelengthFormulas';
import {
  arrayDiameterWavelengths,
  buildArrayModel,
  directivity,
  gratingLobeDirections,
  isIsotropic,
  patternCut,
  principalPlaneMetrics,
  taperEfficiency,
  type ArrayModel,
  type GratingLobe,
  type PlaneMetrics,
} from '../array/index';
import { explorerArray, inputsKey, sidelobeDepthDb, type ExplorerGeometry } from '../explorer/explorerInputs';
import { explorerQueryV1toV2 } from '../explorer/explorerLinkMigration';
import { cutSamples, directivityNeedsQuadrature, MAX_QUADRATURE_WORK, pairSumFitsSync, patternWork, quadratureWork, SYNC_BUDGET_EVALUATIONS } from '../explorer/workEstimate';
import { elementNullWarning, peakOffSteeringWarning, withoutBeamFigures } from '../explorer/beamValidity';
import { highestGratingLobeDb, levelText, planePeakPower } from '../explorer/gratingLobeLevel';
import { taylorNbarWarning } from '../array/taylorNbar';
import { frequencyDefaultText } from './defaultText';

/** Parts of the result that may be left to the background worker. */
export type PendingPart = 'directivity' | 'pattern';

export interface ExplorerCut {
  phiDeg: number;
  thetaDeg: Float64Array;
  /** Power relative to the cut's peak, dB (floored at −300 dB). */
  powerDb: Float64Array;
}

export interface ArrayExplorerData {
  /** The validated inputs these results are for, and their key. */
  inputs: CalcInputs;
  key: string;
  geometry: ExplorerGeometry;
  /** Parts not computed yet (empty when the result is complete). */
  pending: PendingPart[];
  cut: ExplorerCut | null;
  beam: { thetaDeg: number; phiDeg: number };
  gratingLobes: GratingLobe[];
  /** Whether the geometry lies in the x–y plane with extent in y (a u–v map is worth showing). */
  planar: boolean;
}

export type ExplorerMode = 'interactive' | 'complete';

const lineLike = (geometry: ExplorerGeometry) => geometry === 'linear';

/** True for an x–y array of isotropic elements without a ground plane (its pattern is mirrored in z = 0). */
function isMirrorImaged(geometry: ExplorerGeometry, model: ArrayModel): boolean {
  return geometry !== 'linear' && isIsotropic(model.element);
}

/**
 * Directivity of the filled aperture the planar lattice occupies, projected toward the beam,
 * dBi: 4πA·cos θ₀/λ² with A = elements × lattice cell (Balanis, "Antenna Theory", 4th ed., §12.5 (section number from memory),
 * and the projected-aperture scan law, Mailloux, "Phased Array Antenna Handbook", 2nd ed., §2.1 (section number from memory));
 * null for the other geometries, which fill no aperture.
 */
function filledApertureDirectivityDbi(geometry: ExplorerGeometry, count: number, spacingWavelengths: number, lattice: 'rectangular' | 'triangular', thetaDeg: number): number | null {
  if (geometry !== 'planar' || thetaDeg >= 89.9) return null;
  const areaWavelengths2 = count * latticeCellAreaPerSpacingSquared(lattice) * spacingWavelengths * spacingWavelengths;
  return 10 * Math.log10(apertureGainFromArea(areaWavelengths2, 1) * Math.cos(degToRad(thetaDeg)));
}

function worstSidelobe(planes: PlaneMetrics[]): number | null {
  const levels = planes.map((p) => p.peakSidelobeDb).filter((x): x is number => x !== undefined && Number.isFinite(x));
  return levels.length ? Math.max(...levels) : null;
}

/** Computes the explorer's outputs. In 'interactive' mode costly parts are listed in data.pending instead of computed. */
export function computeArrayExplorer(inputs: CalcInputs, mode: ExplorerMode = 'complete'): CalcResult<ArrayExplorerData> {
  const array = explorerArray(inputs);
  const model: ArrayModel = buildArrayModel(array.spec);
  const count = model.weights.re.length;
  const isLine = lineLike(array.geometry);
  const warnings: CalcWarning[] = [];
  const pending: PendingPart[] = [];

  const doPattern = mode === 'complete' || patternWork(model) <= SYNC_BUDGET_EVALUATIONS;
  const quadrature = directivityNeedsQuadrature(model);
  const quadratureTooCostly = quadrature && quadratureWork(model) > MAX_QUADRATURE_WORK;
  const doDirectivity = !quadratureTooCostly && (mode === 'complete' || pairSumFitsSync(model));

  let cut: ExplorerCut | null = null;
  let theta: PlaneMetrics | null = null;
  let phi: PlaneMetrics | null = null;
  if (doPattern) {
    const c = patternCut(model, { phiDeg: array.cutPhiDeg, thetaStartDeg: -180, thetaStopDeg: 180, count: cutSamples(model) });
    cut = { phiDeg: c.phiDeg, thetaDeg: c.thetaDeg, powerDb: c.powerDb };
    const planes = principalPlaneMetrics(model);
    theta = planes.theta;
    phi = isLine ? null : planes.phi;
    for (const plane of isLine ? [theta] : [theta, phi!]) {
      if (plane.hpbwDeg === undefined) {
        warnings.push(warning('no-half-power-point', 'note', `The pattern does not fall to half power in the ${plane.plane === 'theta' ? 'scan' : 'orthogonal'} plane, so its HPBW is not defined there.`, [plane.plane === 'theta' ? 'hpbwScanDeg' : 'hpbwCrossDeg']));
      }
    }
  } else {
    pending.push('pattern');
  }

  let directivityDbi: number | null = null;
  if (doDirectivity) directivityDbi = directivity(model).directivityDbi;
  else if (quadratureTooCostly) {
    warnings.push(warning('directivity-too-costly', 'caution', 'With this element pattern and array size, integrating the directivity over the sphere would take minutes, so it is not computed. Use isotropic elements or a cosⁿθ element without a ground plane (both have an exact pair sum), or a smaller array.', ['directivityDbi']));
  } else pending.push('directivity');

  if (pending.length > 0) {
    const parts = [pending.includes('pattern') ? 'the pattern cut, beamwidths and sidelobe level' : '', pending.includes('directivity') ? (quadrature ? 'the directivity (integrated over the sphere because of the element pattern)' : 'the directivity (an exact pair sum, long for this many elements)') : ''].filter(Boolean).join(' and ');
    warnings.push(warning('computing-in-background', 'note', `For this array ${parts} are computed in the background; they appear here when ready.`, []));
  }

  const lobes = array.lattice ? gratingLobeDirections(model.lattice!.vectorsWavelengths, model.beam) : [];
  const shownPlanes = theta ? (phi ? [theta, phi] : [theta]) : [];
  // Beam figures are valid only where the array forms a beam at (θ0, φ0).
  const elementNull = elementNullWarning(array.spec.element ?? { kind: 'isotropic' }, model.beam);
  const gratingLobeDb = array.lattice && theta ? highestGratingLobeDb(model, lobes, shownPlanes, Math.max(...shownPlanes.map((p) => planePeakPower(model, p)))) : null;
  const lobeLevel = gratingLobeDb === null || elementNull ? '' : `, the highest at ${levelText(gratingLobeDb)} dB relative to the main beam`;
  if (lobes.length > 0) {
    warnings.push(warning('grating-lobe-visible', 'caution', `${lobes.length} grating lobe(s) in or at the edge of visible space at this spacing, frequency and steering (marked on the u–v map)${lobeLevel}. They are not counted as sidelobes.`, ['gratingLobeCount', 'onsetDeg', 'gratingLobeDb']));
  } else if (gratingLobeDb !== null) {
    // a lobe edge below the sidelobes is only a note; above them it is a caution
    const sidelobeLevel = theta ? worstSidelobe(shownPlanes) : null;
    const severity = sidelobeLevel === null || gratingLobeDb > sidelobeLevel ? 'caution' : 'note';
    warnings.push(warning('grating-lobe-at-horizon', severity, `A grating lobe centred just outside visible space reaches into it at the horizon${lobeLevel}; it is not counted as a sidelobe.`, ['gratingLobeDb']));
  }
  if (inputs.taper === 'taylor') {
    const nbarWarning = taylorNbarWarning(inputs.nbar as number, sidelobeDepthDb(inputs), ['sidelobeDb']);
    if (nbarWarning) warnings.push(nbarWarning);
  }
  const offSteering = elementNull || !theta ? null : peakOffSteeringWarning(shownPlanes.map((metrics) => ({ metrics, name: metrics.plane === 'theta' ? 'scan plane' : 'orthogonal plane' })));
  for (const w of [elementNull, offSteering]) if (w) warnings.push(w);
  if (array.spacingWavelengths < 0.25 && array.geometry !== 'circular') {
    warnings.push(warning('close-spacing', 'note', 'Spacing below λ/4: mutual coupling is strong, and the embedded element pattern, not this free-space model, decides the real pattern.', ['spacingWavelengths']));
  }
  if (isMirrorImaged(array.geometry, model)) {
    warnings.push(warning('isotropic-mirror-beam', 'note', 'Isotropic elements with no ground plane radiate a mirror beam behind the array, so a filled planar array\'s directivity is about 3 dB below 4πA/λ². Choose the element power pattern cosⁿθ (the team\'s element) or add a ground plane to compare with 4πA/λ².', ['directivityDbi']));
  }
  if (array.geometry === 'thinned') {
    warnings.push(warning('thinned-seed', 'note', 'The thinned layout is one random draw (fixed by the seed); another seed gives another sidelobe structure with about the same average level.', ['sidelobeDb']));
  }

  const amplitudes = Float64Array.from(model.weights.re, (re, n) => Math.hypot(re, model.weights.im[n]));
  const bits = inputs.phaseBits as number;
  const sidelobes = theta ? worstSidelobe(phi ? [theta, phi] : [theta]) : null;
  return {
    values: withoutBeamFigures({
      elementCount: count,
      lambda0: array.wavelengthM,
      spacingWavelengths: array.spacingWavelengths,
      ringRadiusM: array.ringRadiusWavelengths === null ? null : array.ringRadiusWavelengths * array.wavelengthM,
      sizeWavelengths: arrayDiameterWavelengths(model.positionsWavelengths),
      directivityDbi,
      filledApertureDirectivityDbi: filledApertureDirectivityDbi(array.geometry, count, array.spacingWavelengths, inputs.lattice as 'rectangular' | 'triangular', inputs.thetaDeg as number),
      hpbwScanDeg: theta?.hpbwDeg ?? null,
      hpbwCrossDeg: phi?.hpbwDeg ?? null,
      fnbwScanDeg: theta?.fnbwDeg ?? null,
      fnbwCrossDeg: phi?.fnbwDeg ?? null,
      sidelobeDb: sidelobes,
      gratingLobeDb,
      peakOffsetDeg: theta ? theta.peakOffsetDeg : null,
      gratingLobeCount: array.lattice ? lobes.length : null,
      onsetDeg: array.lattice ? gratingLobeOnsetScanDeg(array.spacingWavelengths, array.lattice) : null,
      taperEfficiencyPercent: 100 * taperEfficiency(amplitudes),
      phaseStepDeg: bits > 0 ? 360 / 2 ** bits : null,
    }, elementNull !== null),
    warnings,
    data: {
      inputs,
      key: inputsKey(inputs),
      geometry: array.geometry,
      pending,
      cut,
      beam: { ...model.beam },
      gratingLobes: lobes,
      planar: !isLine,
    },
  };
}

/** Options of the definition: where the page's background results come from. */
export interface ArrayExplorerOptions {
  /** Complete results made elsewhere (the page's worker) for exactly these inputs, if any. */
  background?: (inputs: CalcInputs) => CalcResult<ArrayExplorerData> | undefined;
}

const GEOMETRY_OPTIONS = [
  { value: 'linear', label: 'Linear (along x)' },
  { value: 'planar', label: 'Planar lattice' },
  { value: 'circular', label: 'Ring (circular)' },
  { value: 'yArms', label: 'Y of three arms' },
  { value: 'thinned', label: 'Randomly thinned planar lattice' },
];

/** The calculator definition, with defaults taken from the team conventions. */
export function createArrayExplorerCalculator(conventions: TeamConventions, options: ArrayExplorerOptions = {}): CalculatorDef<ArrayExplorerData> {
  return {
    id: 'array-explorer',
    title: 'Array pattern explorer',
    summary: 'Pattern cut, u–v map, directivity, beamwidths, sidelobes and grating lobes of a steered array, with the element excitation table.',
    nav: { order: 6 },
    safety: { lead: '', cautions: ['rfExposure', 'workAtHeight'] },
    embed: true,
    purpose:
      'What does this array radiate when steered: its pattern cut and u–v map, directivity, beamwidths, sidelobe level and grating lobes, and the amplitude and phase each element needs?',
    schemaVersion: 2,
    migrations: { 1: explorerQueryV1toV2 },
    params: [
      { kind: 'choice', key: 'geo', name: 'geometry', label: 'Geometry', options: GEOMETRY_OPTIONS, defaultText: 'planar', description: 'Element layout. Linear arrays lie on x; the others lie in the x–y plane (calc/angleConvention).' },
      { kind: 'choice', key: 'lat', name: 'lattice', label: 'Lattice (planar, thinned)', options: [{ value: 'rectangular', label: 'Rectangular (square cell)' }, { value: 'triangular', label: 'Equilateral triangular' }], defaultText: conventions.lattice, description: 'Lattice of the planar and thinned geometries; the triangular one has rows √3/2·d apart, alternate rows shifted by d/2.' },
      { kind: 'choice', key: 'out', name: 'outline', label: 'Outline (planar, thinned)', options: [{ value: 'rectangle', label: 'Rectangle' }, { value: 'circle', label: 'Circle' }, { value: 'ellipse', label: 'Ellipse' }], defaultText: 'rectangle', description: 'Keeps the lattice sites inside this outline of the columns × rows block. Circle and ellipse use a radial taper.' },
      { kind: 'count', key: 'nx', name: 'countX', label: 'Elements per row (linear: count; ring: count; Y: per arm)', defaultText: '8', min: 1, max: 1024, description: 'Columns of a planar grid, elements of a line or ring, or elements on each arm of the Y.' },
      { kind: 'count', key: 'ny', name: 'countY', label: 'Rows (planar, thinned)', defaultText: '8', min: 1, max: 128, description: 'Rows of a planar or thinned grid (at most 128 × 128 sites).' },
      { kind: 'length', key: 'd', name: 'spacingM', label: 'Element spacing', defaultText: '0.5 λ', min: 1e-6, max: 100, wavelengthFrom: 'design', description: 'Distance between neighbouring elements (along the ring for a ring; nearest neighbours on a triangular lattice). May be given in wavelengths at the frequency, e.g. 0.6 λ.' },
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e3, max: 1e13, description: 'Operating frequency; spacings in λ and the ground-plane height refer to it.' },
      { kind: 'number', key: 'fill', name: 'fillFraction', label: 'Fill fraction (thinned)', defaultText: '0.6', min: 0.05, max: 1, description: 'Share of lattice sites kept by the random thinning.' },
      { kind: 'count', key: 'seed', name: 'seed', label: 'Random seed (thinned)', defaultText: '7', min: 0, max: 4294967295, description: 'Seed of the thinning draw; the same seed always gives the same layout.' },
      { kind: 'choice', key: 'tap', name: 'taper', label: 'Amplitude taper', options: [{ value: 'uniform', label: 'Uniform' }, { value: 'cosine', label: 'Cosine² on a pedestal' }, { value: 'taylor', label: 'Taylor (n̄, sidelobe level)' }, { value: 'chebyshev', label: 'Dolph–Chebyshev (sidelobe level)' }], defaultText: 'uniform', description: 'Amplitude across the aperture: separable (x × y) on full rectangular grids, radial otherwise.' },
      { kind: 'levelBelowPeak', key: 'sll', name: 'sidelobeDb', label: 'Design sidelobe level, dB relative to the peak (Taylor, Chebyshev)', defaultText: '-30 dB', min: -80, max: -13, description: 'Negative dB relative to the main beam, e.g. −30 dB (30 dB below the peak); a positive depth such as 30 dB is read as the same level.' },
      { kind: 'count', key: 'nbar', name: 'nbar', label: 'Taylor n̄', defaultText: '5', min: 1, max: 20, description: 'Number of nearly equal sidelobes next to the main beam.' },
      { kind: 'levelBelowPeak', key: 'edge', name: 'pedestalDb', label: 'Edge level, dB relative to the centre (cosine² on a pedestal)', defaultText: '-10 dB', min: -60, max: 0, description: 'Field amplitude at the aperture edge relative to the centre, negative dB (a positive depth is read as the same level).' },
      { kind: 'choice', key: 'el', name: 'element', label: 'Element pattern', options: [{ value: 'isotropic', label: 'Isotropic (radiates behind the array too)' }, { value: 'cosine', label: 'Element power pattern cosⁿθ, forward only' }, { value: 'dipoleX', label: 'Half-wave dipole along x' }, { value: 'dipoleY', label: 'Half-wave dipole along y' }], defaultText: 'cosine', description: 'Pattern of each element, multiplied by the array factor. The default is the team\'s element from the conventions. Non-isotropic patterns need directivity by integration (in the background for large arrays).' },
      { kind: 'number', key: 'nexp', name: 'elementPowerExponent', label: 'Element power pattern cosⁿθ, n', defaultText: String(conventions.elementPowerExponent), min: 0, max: 40, usedWhen: { key: 'el', values: ['cosine'] }, description: 'Exponent of the element\'s power pattern (field cos^(n/2) θ); team default from the conventions. n = 2 is a cos θ field pattern.' },
      { kind: 'length', key: 'gp', name: 'groundHeightM', label: 'Ground-plane height below the elements', defaultText: '', min: 0, max: 100, minExclusive: true, optional: true, wavelengthFrom: 'design', description: 'Optional. A perfectly conducting plane this far behind the elements (e.g. 0.25 λ); empty means none.' },
      { kind: 'angle', key: 'th', name: 'thetaDeg', label: 'Steering θ₀ from broadside', defaultText: '0 deg', min: 0, max: 90, description: 'Beam direction from the array normal (+z); for a linear array, the scan angle from broadside.' },
      { kind: 'angle', key: 'ph', name: 'phiDeg', label: 'Steering φ₀ from +x', defaultText: '0 deg', min: -180, max: 360, description: 'Azimuth of the beam in the array plane, from +x.' },
      { kind: 'count', key: 'bits', name: 'phaseBits', label: 'Phase-shifter bits (0 = continuous)', defaultText: '0', min: 0, max: 12, description: 'Phases are rounded to 360°/2ᴮ steps; 0 keeps them exact.' },
      { kind: 'angle', key: 'cut', name: 'cutPhiDeg', label: 'Plane of the plotted cut, φ', defaultText: '', min: -180, max: 360, optional: true, description: 'Optional. The φ plane of the plotted cut; empty means the steering plane φ₀.' },
    ],
    outputs: [
      { key: 'elementCount', label: 'Elements', kind: 'count', digits: 0 },
      { key: 'lambda0', label: 'Free-space wavelength λ₀', kind: 'length', digits: 5 },
      { key: 'spacingWavelengths', label: 'Element spacing', kind: 'ratio', digits: 4, unit: 'λ₀' },
      { key: 'ringRadiusM', label: 'Ring radius', kind: 'length', digits: 4 },
      { key: 'sizeWavelengths', label: 'Largest element-to-element distance', kind: 'ratio', digits: 4, unit: 'λ₀' },
      { key: 'directivityDbi', label: 'Directivity toward (θ₀, φ₀): array factor × element pattern, no losses', kind: 'decibel', digits: 4, unit: 'dBi', description: 'Directivity (IEEE Std 145) of the total pattern, array factor times the chosen element pattern; no efficiency or mismatch, so not gain. Exact pair sum for isotropic elements and for cosⁿθ elements in the x–y plane without a ground plane; integration over the sphere otherwise' },
      { key: 'filledApertureDirectivityDbi', label: 'Filled-aperture directivity 4πA·cos θ₀/λ² (planar)', kind: 'decibel', digits: 4, unit: 'dBi', description: 'A = elements × lattice cell: what a large uniformly excited planar array with a forward element reaches; the directivity above differs by the taper efficiency, edge effects and, for isotropic elements, the ≈ 3 dB mirror beam' },
      { key: 'hpbwScanDeg', label: 'HPBW, scan plane (φ = φ₀)', kind: 'angle', digits: 4, description: 'Between the −3 dB points found by root-finding' },
      { key: 'hpbwCrossDeg', label: 'HPBW, orthogonal plane', kind: 'angle', digits: 4 },
      { key: 'fnbwScanDeg', label: 'FNBW, scan plane', kind: 'angle', digits: 4 },
      { key: 'fnbwCrossDeg', label: 'FNBW, orthogonal plane', kind: 'angle', digits: 4 },
      { key: 'sidelobeDb', label: 'Peak sidelobe level (principal planes)', kind: 'decibel', digits: 4, description: 'Highest sidelobe in the two planes through the beam, forward half space; grating lobes are reported apart' },
      { key: 'gratingLobeDb', label: 'Highest grating lobe level', kind: 'decibel', digits: 4, resolution: 1e-4, description: 'Relative to the main beam, at each grating-lobe direction and in the principal planes (lattice geometries)' },
      { key: 'peakOffsetDeg', label: 'Beam peak offset from θ₀ (scan plane)', kind: 'angle', digits: 3, resolution: 1e-4, description: 'From the element pattern and phase quantization; offsets below 10⁻⁴° (the root-finder resolves about 10⁻⁸°, older searches 10⁻⁶°) are shown as 0' },
      { key: 'gratingLobeCount', label: 'Grating lobes in visible space', kind: 'count', digits: 0 },
      { key: 'onsetDeg', label: 'Grating lobe enters at scan', kind: 'angle', digits: 3, description: 'Worst scan plane; 90° means none at any scan' },
      { key: 'taperEfficiencyPercent', label: 'Taper efficiency', kind: 'percent', digits: 4 },
      { key: 'phaseStepDeg', label: 'Phase-shifter step', kind: 'angle', digits: 4 },
    ],
    formulas: [
      { formula: wavelengthFormula, output: 'lambda0', args: (i) => ({ frequencyHz: i.frequencyHz as number, relativePermittivity: 1 }) },
      {
        formula: gratingLobeOnsetFormula,
        output: 'onsetDeg',
        args: (i, v) => (v.onsetDeg === null || v.spacingWavelengths === null ? null : { spacingWavelengths: v.spacingWavelengths, latticeFactor: (i.geometry === 'planar' || i.geometry === 'thinned') && i.lattice === 'triangular' ? 2 / Math.sqrt(3) : 1 }),
      },
    ],
    assumptions: [
      'Free-space array factor times one element pattern: mutual coupling, edge effects and the embedded element pattern are not modelled.',
      'Directivity follows the IEEE Std 145 definition (no losses, no mismatch: it is not gain or realized gain); with isotropic elements, and with cosⁿθ elements in the x–y plane and no ground plane, it is an exact pair sum (the cosⁿθ kernel by Bessel J0), otherwise Gauss–Legendre integration over the sphere.',
      'The cosine element is named by its power pattern cosⁿθ (n from the team conventions by default), as on the scan-loss page; a field pattern cosᵐθ is n = 2m.',
      'An x–y array of isotropic elements radiates a mirror beam behind it, so its directivity is about 3 dB below 4πA/λ²; a forward element pattern or a ground plane removes it.',
      'Beamwidths and sidelobe levels are measured in the two principal planes through the beam, sidelobes in the forward half space (z ≥ 0).',
      'Phase shifters are ideal: phases are rounded to the nearest of 2ᴮ states, amplitudes are exact.',
      'Grating lobes are listed for lattice geometries (linear, planar, thinned); rings and Y arms have no lattice and are judged from the pattern.',
    ],
    references: [
      'R. J. Mailloux, Phased Array Antenna Handbook, 2nd ed., Artech House, 2005, ch. 1–3 (chapter number from memory).',
      'C. A. Balanis, Antenna Theory: Analysis and Design, 4th ed., Wiley, 2016, ch. 6 and 12 (chapter number from memory).',
      'R. C. Hansen, Phased Array Antennas, 2nd ed., Wiley, 2009, ch. 2–3 (chapter number from memory).',
      'T. T. Taylor, "Design of line-source antennas for narrow beamwidth and low side lobes", IRE Trans. Antennas Propag., AP-3, 1955.',
      'C. L. Dolph, "A current distribution for broadside arrays which optimizes the relationship between beam width and side-lobe level", Proc. IRE, 34, 1946.',
      'IEEE Std 145-2013, Standard for Definitions of Terms for Antennas.',
    ],
    examples: [
      { title: 'Rooftop 28 GHz backhaul panel: 16 × 16 square lattice, Taylor 30 dB, steered 25° towards the next mast', query: '?v=2&geo=planar&lat=rectangular&out=rectangle&nx=16&ny=16&d=0.5lambda&f=28GHz&tap=taylor&sll=-30dB&nbar=5&el=cosine&nexp=2&th=25deg&ph=0deg&bits=5' },
      { title: 'Harbour-patrol ship ring: 48 elements round the mast at 3.1 GHz, beam 20° off the ring axis', query: '?v=2&geo=circular&nx=48&d=0.55lambda&f=3.1GHz&tap=uniform&el=isotropic&th=20deg&ph=40deg' },
      { title: 'Low-band listening station: Y of three 12-element arms at 150 MHz', query: '?v=2&geo=yArms&nx=12&d=1.4m&f=150MHz&tap=uniform&el=isotropic&th=30deg&ph=90deg' },
      { title: 'Too-wide spacing on purpose: a 12-element line at 0.9 λ steered to 35° (grating lobe)', query: '?v=2&geo=linear&nx=12&d=0.9lambda&f=10GHz&tap=uniform&el=isotropic&th=35deg&ph=0deg' },
      { title: 'Half-filled 24 × 24 test panel at 5.8 GHz (seed 11)', query: '?v=2&geo=thinned&lat=rectangular&out=circle&nx=24&ny=24&d=0.5lambda&f=5.8GHz&fill=0.5&seed=11&tap=uniform&el=isotropic&th=10deg&ph=45deg' },
    ],
    sourcePath: 'calc/calculators/arrayExplorer.ts',
    compute: (inputs) => options.background?.(inputs) ?? computeArrayExplorer(inputs, 'interactive'),
  };
}

