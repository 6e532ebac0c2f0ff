import { CalcInputError, requireFinite, requireInRange } from '../errors';
import { uniformCircularGeometry } from './circularGeometry';
import { customGeometryWavelengths } from './customGeometry';
import { validateElementPattern } from './elementPattern';
import type { ArrayGeometry } from './geometry';
import { uniformLinearGeometry } from './linearGeometry';
import { quantizeWeightPhases } from './phaseQuantization';
import type { PlanarLatticeSpec } from './planarGeometry';
import { planarLatticeGeometry } from './planarGeometry';
import type { RandomArraySpec } from './randomGeometry';
import { randomGeometry, thinnedGeometry } from './randomGeometry';
import { directionCosines, progressivePhaseWeights, steeredWeights } from './steering';
import type { Taper } from './taper';
import { lineTaperWeights, taperFunction, validateTaper } from './taper';
import type { ArrayModel, ComplexWeights, DirectionDeg, ElementPattern, SeparableWeights } from './types';
import { volumetricGeometry } from './volumetricGeometry';
import { yShapedGeometry } from './yShapedGeometry';

/** Geometry descriptions accepted by buildArrayModel (lengths in wavelengths). */
export type GeometrySpec =
  | { kind: 'linear'; count: number; spacingWavelengths: number }
  | ({ kind: 'planar' } & PlanarLatticeSpec)
  | { kind: 'circular'; count: number; radiusWavelengths: number }
  | { kind: 'yShaped'; elementsPerArm: number; spacingWavelengths: number; includeCentre?: boolean }
  | { kind: 'volumetric'; countX: number; countY: number; countZ: number; spacingWavelengths: number }
  | ({ kind: 'random' } & RandomArraySpec)
  | { kind: 'custom'; xWavelengths: ArrayLike<number>; yWavelengths: ArrayLike<number>; zWavelengths: ArrayLike<number> };

/** Everything the UI chooses about an array; every field but geometry has a default. */
export interface ArraySpec {
  /** A geometry description, or a geometry already built (e.g. customGeometryMetres). */
  geometry: GeometrySpec | ArrayGeometry;
  /** Randomly thin the geometry: keep each element with probability fillFraction (seeded). */
  thinning?: { fillFraction: number; seed: number };
  /** Amplitude taper (default uniform). */
  taper?: Taper;
  /** 'separable' (product of x and y line tapers; default on lattices) or 'radial' (taper of the normalized radius; default elsewhere). */
  taperForm?: 'separable' | 'radial';
  /** Beam direction, degrees (default broadside θ = 0°, φ = 0°). Sets the steering phase and where figures of merit are measured. */
  steering?: DirectionDeg;
  /** Instead of steering phases: a progressive phase step (rad) along element index, e.g. end-fire; beam then names where the beam is. */
  phaseStepRad?: number;
  /** Where the beam is when phaseStepRad is given (default the steering direction). */
  beam?: DirectionDeg;
  /** Quantize phases to this many phase-shifter bits (1…24); default continuous. */
  phaseBits?: number;
  /** Element pattern (default isotropic). */
  element?: ElementPattern;
}

/** Builds the geometry from its description. */
export function buildGeometry(spec: GeometrySpec): ArrayGeometry {
  switch (spec.kind) {
    case 'linear': return uniformLinearGeometry(spec.count, spec.spacingWavelengths);
    case 'planar': return planarLatticeGeometry(spec);
    case 'circular': return uniformCircularGeometry(spec.count, spec.radiusWavelengths);
    case 'yShaped': return yShapedGeometry(spec.elementsPerArm, spec.spacingWavelengths, spec.includeCentre);
    case 'volumetric': return volumetricGeometry(spec.countX, spec.countY, spec.countZ, spec.spacingWavelengths);
    case 'random': return randomGeometry(spec);
    case 'custom': return customGeometryWavelengths(spec.xWavelengths, spec.yWavelengths, spec.zWavelengths);
    default: throw new CalcInputError('geometry.kind', `expected linear, planar, circular, yShaped, volumetric, random or custom, got ${JSON.stringify((spec as { kind: unknown }).kind)}`);
  }
}

function referenceCount(halfLengthWavelengths: number, pitchWavelengths: number): number {
  return Math.max(2, Math.round((2 * halfLengthWavelengths) / pitchWavelengths));
}

/** Amplitude of each element for the taper; also the separable line tapers when they apply. */
function taperAmplitudes(geometry: ArrayGeometry, taper: Taper, form: 'separable' | 'radial'): { amplitudes: Float64Array; lineX?: Float64Array; lineY?: Float64Array } {
  const { x, y } = geometry.positionsWavelengths;
  const count = x.length;
  const lattice = geometry.lattice;
  const amplitudes = new Float64Array(count);
  if (lattice && geometry.fullGrid && (form === 'separable' || lattice.kind === 'line')) {
    const lineX = lineTaperWeights(taper, lattice.columns);
    const lineY = lattice.rows > 1 ? lineTaperWeights(taper, lattice.rows) : Float64Array.of(1);
    for (let n = 0; n < count; n++) amplitudes[n] = lineX[lattice.column[n]] * lineY[lattice.row[n]];
    return { amplitudes, lineX, lineY };
  }
  const a = geometry.apertureHalfXWavelengths;
  const b = geometry.apertureHalfYWavelengths;
  const pitch = lattice ? lattice.vectorsWavelengths[0][0] : 2 * a / Math.max(2, Math.round(Math.sqrt(count)));
  const fx = taperFunction(taper, referenceCount(a, pitch));
  if (form === 'separable') {
    const fy = taperFunction(taper, referenceCount(b, lattice ? lattice.pitchYWavelengths : pitch));
    for (let n = 0; n < count; n++) amplitudes[n] = fx(x[n] / a) * fy(y[n] / b);
  } else {
    for (let n = 0; n < count; n++) amplitudes[n] = fx(Math.hypot(x[n] / a, y[n] / b));
  }
  return { amplitudes };
}

function lineFactors(amplitudes: Float64Array, origin: number, pitch: number, directionCosine: number): ComplexWeights {
  const count = amplitudes.length;
  const re = new Float64Array(count);
  const im = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const phase = -2 * Math.PI * (origin + i * pitch) * directionCosine;
    re[i] = amplitudes[i] * Math.cos(phase);
    im[i] = amplitudes[i] * Math.sin(phase);
  }
  return { re, im };
}

/**
 * Builds an ArrayModel (positions in λ, complex weights, element pattern, beam direction and
 * fast-path descriptions) from an ArraySpec. Throws CalcInputError for invalid input.
 */
export function buildArrayModel(spec: ArraySpec): ArrayModel {
  let geometry = 'positionsWavelengths' in spec.geometry ? spec.geometry : buildGeometry(spec.geometry);
  if (spec.thinning) geometry = thinnedGeometry(geometry, spec.thinning.fillFraction, spec.thinning.seed);
  const taper = validateTaper(spec.taper ?? { kind: 'uniform' });
  const form = spec.taperForm ?? (geometry.lattice ? 'separable' : 'radial');
  const element = validateElementPattern(spec.element ?? { kind: 'isotropic' });
  const steering = spec.steering ?? { thetaDeg: 0, phiDeg: 0 };
  requireInRange('steering.thetaDeg', steering.thetaDeg, 0, 180, '°');
  requireInRange('steering.phiDeg', steering.phiDeg, -360, 360, '°');
  const { amplitudes, lineX, lineY } = taperAmplitudes(geometry, taper, form);
  const positions = geometry.positionsWavelengths;
  const lattice = geometry.lattice;
  let weights: ComplexWeights;
  let separable: SeparableWeights | undefined;
  let beam: DirectionDeg = steering;
  if (spec.phaseStepRad !== undefined) {
    requireFinite('phaseStepRad', spec.phaseStepRad, 'rad');
    if (!lattice || lattice.kind !== 'line') throw new CalcInputError('phaseStepRad', 'expected a linear geometry for a progressive phase step');
    weights = progressivePhaseWeights(amplitudes, spec.phaseStepRad);
    beam = spec.beam ?? steering;
    requireInRange('beam.thetaDeg', beam.thetaDeg, 0, 180, '°');
    requireInRange('beam.phiDeg', beam.phiDeg, -360, 360, '°');
    if (lineX && lineY) separable = { x: weights, y: { re: Float64Array.of(1), im: Float64Array.of(0) } };
  } else {
    weights = steeredWeights(positions, amplitudes, steering.thetaDeg, steering.phiDeg);
    if (lattice && lineX && lineY) {
      const [u0, v0] = directionCosines(steering.thetaDeg, steering.phiDeg);
      separable = {
        x: lineFactors(lineX, lattice.originXWavelengths, lattice.pitchXWavelengths, u0),
        y: lineFactors(lineY, lattice.originYWavelengths, lattice.pitchYWavelengths, v0),
      };
    }
  }
  if (spec.phaseBits !== undefined) {
    weights = quantizeWeightPhases(weights, spec.phaseBits);
    separable = undefined;
  }
  return { positionsWavelengths: positions, weights, element, beam, lattice, separable, phaseBits: spec.phaseBits };
}
