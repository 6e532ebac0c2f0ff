import { freeSpaceWavelengthM } from '../wavelength';
import { buildArrayModel } from '../array/buildArray';
import { directivity } from '../array/directivity';
import { principalPlaneMetrics } from '../array/beamMetrics';
import { besselJ0 } from '../numeric/besselJ';
import { enclosingDiscAreaM2, type Candidate, type SizingRequirement } from './candidate';
import { coverageCornerPlaneDeg, coverageCornerScanDeg } from './coverage';
import { cornerScanLossDb } from './planarCandidate';
import { firstSidelobeInCutDb } from './firstSidelobe';

/**
 * Largest ring or Y array the sizing evaluates with the engine; beyond it the architecture is
 * flagged as impractical (a filled aperture does better) and sized from the D ≈ 2N estimate.
 */
export const MAX_SPARSE_ELEMENTS = 512;

/** Fewest elements of a ring (a triangle) or a Y (one per arm); the search starts here. */
export const MIN_SPARSE_ELEMENTS = 3;

type SparseKind = 'ring' | 'y';

/**
 * First sidelobe of a continuous uniformly excited ring, dB: its pattern is J0(ka sin θ), whose
 * first sidelobe peak sits at the first zero of J1 (x = 3.8317), giving 20·log10|J0(3.8317)|
 * = −7.9 dB (Balanis, Antenna Theory, 4th ed., §6.10 (section number from memory)).
 */
export const RING_FIRST_SIDELOBE_DB = 20 * Math.log10(Math.abs(besselJ0(3.8317059702075125)));

/** Element spacing along the ring or arms, in wavelengths at the highest frequency. */
const SPARSE_SPACING_WAVELENGTHS_HIGH = 0.5;
/** Gain added to the isotropic-element array by a forward element pattern or ground plane that removes the mirror beam, dB. */
const GROUND_PLANE_GAIN_DB = 10 * Math.log10(2);

function model(kind: SparseKind, count: number, spacingWavelengths: number, thetaDeg: number, phiDeg: number) {
  const geometry =
    kind === 'ring'
      ? { kind: 'circular' as const, count, radiusWavelengths: (count * spacingWavelengths) / (2 * Math.PI) }
      : { kind: 'yShaped' as const, elementsPerArm: Math.max(1, Math.round(count / 3)), spacingWavelengths };
  return buildArrayModel({ geometry, steering: { thetaDeg, phiDeg } });
}

/**
 * Directivity (dBi) of a ring or Y of isotropic elements (exact pair sum from the array engine),
 * plus 3 dB for a forward element pattern or ground plane that removes the mirror beam.
 */
function forwardDirectivityDbi(kind: SparseKind, count: number, spacingWavelengths: number): number {
  return directivity(model(kind, count, spacingWavelengths, 0, 0)).directivityDbi + GROUND_PLANE_GAIN_DB;
}

/**
 * Smallest count (a multiple of step from MIN_SPARSE_ELEMENTS) for which meets() holds, assuming
 * meets is monotonic; null past the cap. MIN_SPARSE_ELEMENTS itself is tried first; `guess`
 * (optional) starts the bracket near the answer.
 */
export function smallestSparseCount(meets: (count: number) => boolean, step: 1 | 3, cap = MAX_SPARSE_ELEMENTS, guess?: number): number | null {
  const top = cap - (cap % step);
  const snap = (n: number) => Math.min(top, Math.max(MIN_SPARSE_ELEMENTS, MIN_SPARSE_ELEMENTS + step * Math.round((n - MIN_SPARSE_ELEMENTS) / step)));
  if (meets(MIN_SPARSE_ELEMENTS)) return MIN_SPARSE_ELEMENTS;
  let lo = MIN_SPARSE_ELEMENTS;
  let hi = guess === undefined ? snap(2 * MIN_SPARSE_ELEMENTS) : snap(guess);
  if (guess !== undefined && hi > lo && !meets(hi)) {
    lo = hi;
    hi = snap(1.25 * hi);
  }
  while (!meets(hi)) {
    if (hi >= top) return null;
    lo = hi;
    hi = snap(2 * hi);
  }
  if (guess !== undefined && hi - lo > 2 * step) {
    const below = snap(0.8 * hi);
    if (below > lo && !meets(below)) lo = below;
  }
  while (hi - lo > step) {
    const mid = lo + step * Math.floor((hi - lo) / (2 * step));
    if (meets(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

/**
 * Sizes a uniform circular or Y-shaped array facing the boresight (the same coverage convention as
 * the planar face, coverage.ts), by its element count; beams and sidelobes from the engine.
 */
export function sizeSparseArray(requirement: SizingRequirement, kind: SparseKind): Candidate {
  const lambdaLow = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const dWl = SPARSE_SPACING_WAVELENGTHS_HIGH * (requirement.frequencyLowHz / requirement.frequencyHighHz);
  const dM = dWl * lambdaLow;
  const eta = requirement.assumptions.arrayRadiationEfficiency;
  const corner = Math.min(coverageCornerScanDeg(requirement.scanAzimuthDeg, requirement.scanElevationDeg), 89);
  const cornerPlane = coverageCornerPlaneDeg(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const loss = cornerScanLossDb(requirement);
  const step = kind === 'y' ? 3 : 1;
  const meets = (count: number): boolean => {
    if (requirement.kind === 'gain') {
      return forwardDirectivityDbi(kind, count, dWl) + 10 * Math.log10(eta) + loss >= requirement.gainEdgeDbi;
    }
    const m = principalPlaneMetrics(model(kind, count, dWl, 0, 0), { beamwidthOnly: true });
    const worst = Math.max(m.theta.hpbwDeg ?? Infinity, m.phi.hpbwDeg ?? Infinity);
    return worst <= requirement.hpbwDeg;
  };
  // A λ/2-spaced ring or Y of isotropic elements has directivity close to N; over a ground plane 2N.
  const estimate = requirement.kind === 'gain' ? Math.ceil(10 ** ((requirement.gainEdgeDbi - loss) / 10) / (2 * eta)) : null;
  const count = estimate !== null && estimate > MAX_SPARSE_ELEMENTS ? null : smallestSparseCount(meets, step, MAX_SPARSE_ELEMENTS, estimate ?? undefined);
  if (count === null) return impracticalSparse(requirement, kind, estimate, dM, lambdaLow);
  const broadsideModel = model(kind, count, dWl, 0, 0);
  const broadside = principalPlaneMetrics(broadsideModel, { beamwidthOnly: true });
  const edge = corner > 0 ? principalPlaneMetrics(model(kind, count, dWl, corner, cornerPlane), { beamwidthOnly: true }) : broadside;
  // First sidelobe in the cuts at φ = 0° and 90° (the principal planes of the broadside beam).
  const sidelobes = [0, 90]
    .map((plane, k) => {
      const width = k === 0 ? broadside.theta.hpbwDeg : broadside.phi.hpbwDeg;
      return width === undefined ? null : firstSidelobeInCutDb(broadsideModel, width, plane);
    })
    .filter((v): v is number => v !== null);
  const gainBroadside = forwardDirectivityDbi(kind, count, dWl) + 10 * Math.log10(eta);
  return {
    ...sparseShape(kind, count, dM),
    depthM: lambdaLow / 4,
    spacingM: dM,
    elementGainDbi: GROUND_PLANE_GAIN_DB,
    model: `${kind === 'ring' ? 'Ring' : 'Y'} of isotropic elements λ/2 apart (at the highest frequency) over a ground plane (+3 dB), facing the boresight like the planar face: directivity by the engine's exact pair sum × radiation efficiency, cosⁿθ element power pattern at the coverage corner; beams and first sidelobes from the computed pattern.`,
    steering: corner > 0 ? `electronic over ±${requirement.scanAzimuthDeg}° az × ±${requirement.scanElevationDeg}° el (corner ${corner.toFixed(1)}° from the array normal)` : 'electronic (fixed beam possible)',
    gainBroadsideDbi: gainBroadside,
    gainEdgeDbi: gainBroadside + loss,
    gainPrecision: 'computed',
    hpbwBroadsideDeg: [broadside.theta.hpbwDeg ?? null, broadside.phi.hpbwDeg ?? null],
    hpbwEdgeDeg: edge.theta.hpbwDeg ?? null,
    beamPrecision: 'computed',
    firstSidelobeDb: sidelobes.length > 0 ? Math.max(...sidelobes) : null,
    flags: [],
    fits: true,
    notes: [
      `Sparse aperture: a continuous uniformly excited ring has its first sidelobe at ${RING_FIRST_SIDELOBE_DB.toFixed(1)} dB. Lying flat (normal vertical) a ring keeps its beamwidth while it steers round in azimuth at a fixed elevation, but that is a different coverage from the ±az × ±el region about a boresight sized here.`,
    ],
  };
}

/** Identity, size, footprint, element count and outline of a ring of `count` elements or a Y of about `count`. */
function sparseShape(kind: SparseKind, count: number, spacingM: number): Pick<Candidate, 'id' | 'name' | 'sizeM' | 'enclosingDiameterM' | 'footprintM2' | 'elementCount' | 'outline'> {
  if (kind === 'ring') {
    const diameterM = (count * spacingM) / Math.PI;
    return { id: 'ringArray', name: 'Uniform circular array', sizeM: diameterM, enclosingDiameterM: diameterM, footprintM2: enclosingDiscAreaM2(diameterM), elementCount: count, outline: { kind: 'ring', diameterM } };
  }
  const perArm = Math.max(1, Math.round(count / 3));
  const armM = perArm * spacingM;
  // Tip to tip √3·arm is the largest dimension; the circle through the three tips has diameter 2·arm.
  return { id: 'yArray', name: 'Y-shaped array', sizeM: Math.sqrt(3) * armM, enclosingDiameterM: 2 * armM, footprintM2: enclosingDiscAreaM2(2 * armM), elementCount: 3 * perArm, outline: { kind: 'y', armM } };
}

/** A ring or Y too large to be sensible: sized from the D ≈ 2N estimate, flagged, beams not computed. */
function impracticalSparse(requirement: SizingRequirement, kind: SparseKind, estimate: number | null, spacingM: number, lambdaLow: number): Candidate {
  const eta = requirement.assumptions.arrayRadiationEfficiency;
  const count = Math.max(estimate ?? MAX_SPARSE_ELEMENTS, MAX_SPARSE_ELEMENTS);
  const gain = 10 * Math.log10(2 * eta * count);
  const shape = sparseShape(kind, kind === 'y' ? 3 * Math.ceil(count / 3) : count, spacingM);
  const name = kind === 'ring' ? 'ring' : 'Y';
  const message = estimate !== null && estimate > MAX_SPARSE_ELEMENTS
    ? `needs about ${estimate} elements by the estimate D ≈ 2N, more than the ${MAX_SPARSE_ELEMENTS} the sizing evaluates: impractical as a ${name}; a filled aperture does better`
    : `needs more than the ${MAX_SPARSE_ELEMENTS} elements the sizing evaluates: impractical as a ${name}; a filled aperture does better`;
  return {
    ...shape,
    depthM: lambdaLow / 4,
    spacingM,
    elementGainDbi: GROUND_PLANE_GAIN_DB,
    model: 'Too large to evaluate: sized from the estimate directivity ≈ 2N (λ/2 spacing over a ground plane); beams not computed.',
    steering: 'electronic',
    gainBroadsideDbi: gain,
    gainEdgeDbi: gain + cornerScanLossDb(requirement),
    gainPrecision: 'estimate',
    hpbwBroadsideDeg: [null, null],
    hpbwEdgeDeg: null,
    beamPrecision: 'estimate',
    firstSidelobeDb: kind === 'ring' ? RING_FIRST_SIDELOBE_DB : null,
    flags: [{ code: 'too-many-sparse-elements', kind: 'practical', message }],
    fits: true,
    notes: [],
  };
}
