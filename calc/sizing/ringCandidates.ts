import { freeSpaceWavelengthM } from '../wavelength';
import { buildArrayModel } from '../array/buildArray';
import { directivity } from '../array/directivity';
import { principalPlaneMetrics } from '../array/beamMetrics';
import { besselJ0 } from '../numeric/besselJ';
import { projectedApertureLossDb } from '../scanLoss';
import type { Candidate, SizingRequirement } from './candidate';

/**
 * Largest ring or Y array the sizing evaluates with the engine; beyond it the architecture is
 * flagged as impractical (a filled aperture does better) and sized from the N ≈ D estimate.
 */
export const MAX_SPARSE_ELEMENTS = 512;

type SparseKind = 'ring' | 'y';

/**
 * First sidelobe of a continuous uniformly excited ring, dB: its pattern is J0(ka sin θ), whose
 * first sidelobe peak sits at the first zero of J1 (x = 3.8317), giving 20·log10|J0(3.8317)|
 * = −7.9 dB (Balanis, Antenna Theory, 4th ed., §6.10 (section number from memory)).
 */
export const RING_FIRST_SIDELOBE_DB = 20 * Math.log10(Math.abs(besselJ0(3.8317059702075125)));

/** Element spacing along the ring or arms, in wavelengths at the highest frequency. */
const SPARSE_SPACING_WAVELENGTHS_HIGH = 0.5;

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
  return directivity(model(kind, count, spacingWavelengths, 0, 0)).directivityDbi + 3.0103;
}

/** Sizes a uniform circular or Y-shaped array by its element count; beams from the engine. */
export function sizeSparseArray(requirement: SizingRequirement, kind: SparseKind): Candidate {
  const lambdaLow = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const dWl = SPARSE_SPACING_WAVELENGTHS_HIGH * (requirement.frequencyLowHz / requirement.frequencyHighHz);
  const dM = dWl * lambdaLow;
  const eta = requirement.assumptions.arrayRadiationEfficiency;
  const scan = Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const step = kind === 'y' ? 3 : 1;
  const meets = (count: number): boolean => {
    if (requirement.kind === 'gain') {
      return forwardDirectivityDbi(kind, count, dWl) + 10 * Math.log10(eta) + projectedApertureLossDb(Math.min(scan, 89.9)) >= requirement.gainEdgeDbi;
    }
    const m = principalPlaneMetrics(model(kind, count, dWl, 0, 0), { beamwidthOnly: true });
    const worst = Math.max(m.theta.hpbwDeg ?? Infinity, m.phi.hpbwDeg ?? Infinity);
    return worst <= requirement.hpbwDeg;
  };
  // A λ/2-spaced ring or Y of isotropic elements has directivity close to N; over a ground plane 2N.
  const scanFactor = 10 ** (projectedApertureLossDb(Math.min(scan, 89.9)) / 10);
  const estimate = requirement.kind === 'gain' ? Math.ceil(10 ** (requirement.gainEdgeDbi / 10) / (2 * eta * scanFactor)) : 0;
  let lo = 2 * step;
  let hi = 4 * step;
  let capped = estimate > MAX_SPARSE_ELEMENTS;
  while (!capped && !meets(hi)) {
    lo = hi;
    hi *= 2;
    if (hi >= MAX_SPARSE_ELEMENTS) {
      hi = MAX_SPARSE_ELEMENTS - (MAX_SPARSE_ELEMENTS % step);
      capped = !meets(hi);
      break;
    }
  }
  if (capped) return impracticalSparse(requirement, kind, Math.max(estimate, MAX_SPARSE_ELEMENTS), dM, lambdaLow);
  {
    while (hi - lo > step) {
      const mid = lo + step * Math.floor((hi - lo) / (2 * step));
      if (meets(mid)) hi = mid;
      else lo = mid;
    }
  }
  const count = hi;
  const broadside = principalPlaneMetrics(model(kind, count, dWl, 0, 0), { beamwidthOnly: true });
  const edge = scan > 0 ? principalPlaneMetrics(model(kind, count, dWl, Math.min(scan, 89), 0), { beamwidthOnly: true }) : broadside;
  const edgeAz = scan > 0 ? principalPlaneMetrics(model(kind, count, dWl, Math.min(scan, 89), kind === 'ring' ? 45 : 60), { beamwidthOnly: true }) : broadside;
  const gainBroadside = forwardDirectivityDbi(kind, count, dWl) + 10 * Math.log10(eta);
  const gainEdge = gainBroadside + projectedApertureLossDb(Math.min(scan, 89.9));
  const flags: string[] = [];
  const notes = [
    `Sparse aperture: the first sidelobe of a uniformly excited ring is about ${RING_FIRST_SIDELOBE_DB.toFixed(1)} dB (Y arrays are similar); chosen where the beamwidth must stay the same over azimuth.`,
    `Scan-edge HPBW at two azimuths: ${edge.theta.hpbwDeg?.toFixed(2) ?? '—'}° and ${edgeAz.theta.hpbwDeg?.toFixed(2) ?? '—'}°.`,
  ];
  return {
    ...sparseShape(kind, count, dM),
    depthM: lambdaLow / 4,
    spacingM: dM,
    steering: scan > 0 ? `electronic, ±${scan}°, any azimuth` : 'electronic, any azimuth',
    gainBroadsideDbi: gainBroadside,
    gainEdgeDbi: gainEdge,
    hpbwBroadsideDeg: [broadside.theta.hpbwDeg ?? null, broadside.phi.hpbwDeg ?? null],
    hpbwEdgeDeg: edge.theta.hpbwDeg ?? null,
    flags,
    notes,
  };
}

/** Identity, size, area, element count and outline of a ring of `count` elements or a Y of about `count`. */
function sparseShape(kind: SparseKind, count: number, spacingM: number): Pick<Candidate, 'id' | 'name' | 'sizeM' | 'areaM2' | 'elementCount' | 'outline'> {
  if (kind === 'ring') {
    const diameterM = (count * spacingM) / Math.PI;
    return { id: 'ringArray', name: 'Uniform circular array', sizeM: diameterM, areaM2: (Math.PI * diameterM * diameterM) / 4, elementCount: count, outline: { kind: 'ring', diameterM } };
  }
  const perArm = Math.max(1, Math.round(count / 3));
  const armM = perArm * spacingM;
  return { id: 'yArray', name: 'Y-shaped array', sizeM: 2 * armM * Math.cos(Math.PI / 6), areaM2: ((3 * Math.sqrt(3)) / 4) * armM * armM, elementCount: 3 * perArm, outline: { kind: 'y', armM } };
}

/** A ring or Y too large to be sensible: sized from the N ≈ D estimate, flagged, beams not computed. */
function impracticalSparse(requirement: SizingRequirement, kind: SparseKind, count: number, spacingM: number, lambdaLow: number): Candidate {
  const eta = requirement.assumptions.arrayRadiationEfficiency;
  const scan = Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const gain = 10 * Math.log10(2 * eta * count);
  return {
    ...sparseShape(kind, kind === 'y' ? 3 * Math.ceil(count / 3) : count, spacingM),
    depthM: lambdaLow / 4,
    spacingM,
    steering: 'electronic, any azimuth',
    gainBroadsideDbi: gain,
    gainEdgeDbi: gain + projectedApertureLossDb(Math.min(scan, 89.9)),
    hpbwBroadsideDeg: [null, null],
    hpbwEdgeDeg: null,
    flags: [`needs about ${count} elements (more than ${MAX_SPARSE_ELEMENTS}): impractical as a ${kind === 'ring' ? 'ring' : 'Y'}; a filled aperture does better`],
    notes: ['Sized from the estimate directivity ≈ 2N (λ/2 spacing over a ground plane); beams not computed.'],
  };
}
