import { freeSpaceWavelengthM } from '../wavelength';
import { buildArrayModel } from '../array/buildArray';
import { directivity } from '../array/directivity';
import { principalPlaneMetrics } from '../array/beamMetrics';
import type { Candidate, SizingRequirement } from './candidate';

/** Largest ring or Y array the sizing evaluates; beyond it the architecture is flagged as impractical. */
export const MAX_SPARSE_ELEMENTS = 4096;

type SparseKind = 'ring' | 'y';

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
      return forwardDirectivityDbi(kind, count, dWl) + 10 * Math.log10(eta) + 10 * Math.log10(Math.cos((Math.min(scan, 89.9) * Math.PI) / 180)) >= requirement.gainEdgeDbi;
    }
    const m = principalPlaneMetrics(model(kind, count, dWl, 0, 0));
    const worst = Math.max(m.theta.hpbwDeg ?? Infinity, m.phi.hpbwDeg ?? Infinity);
    return worst <= requirement.hpbwDeg;
  };
  let lo = 2 * step;
  let hi = 4 * step;
  let capped = false;
  while (!meets(hi)) {
    lo = hi;
    hi *= 2;
    if (hi >= MAX_SPARSE_ELEMENTS) {
      hi = MAX_SPARSE_ELEMENTS - (MAX_SPARSE_ELEMENTS % step);
      capped = !meets(hi);
      break;
    }
  }
  if (!capped) {
    while (hi - lo > step) {
      const mid = lo + step * Math.floor((hi - lo) / (2 * step));
      if (meets(mid)) hi = mid;
      else lo = mid;
    }
  }
  const count = hi;
  const broadside = principalPlaneMetrics(model(kind, count, dWl, 0, 0));
  const edge = scan > 0 ? principalPlaneMetrics(model(kind, count, dWl, Math.min(scan, 89), 0)) : broadside;
  const edgeAz = scan > 0 ? principalPlaneMetrics(model(kind, count, dWl, Math.min(scan, 89), kind === 'ring' ? 45 : 60)) : broadside;
  const gainBroadside = forwardDirectivityDbi(kind, count, dWl) + 10 * Math.log10(eta);
  const gainEdge = gainBroadside + 10 * Math.log10(Math.cos((Math.min(scan, 89.9) * Math.PI) / 180));
  const flags: string[] = [];
  if (capped) flags.push(`needs more than ${MAX_SPARSE_ELEMENTS} elements: impractical as a ${kind === 'ring' ? 'ring' : 'Y'}; a filled aperture does better`);
  const sidelobe = broadside.theta.peakSidelobeDb;
  const notes = [
    `Sparse aperture: peak sidelobe ${sidelobe === undefined ? 'undefined' : `${sidelobe.toFixed(1)} dB`} (uniform excitation); chosen where the beamwidth must stay the same over azimuth.`,
    `Scan-edge HPBW at two azimuths: ${edge.theta.hpbwDeg?.toFixed(2) ?? '—'}° and ${edgeAz.theta.hpbwDeg?.toFixed(2) ?? '—'}°.`,
  ];
  if (kind === 'ring') {
    const diameterM = (count * dM) / Math.PI;
    return {
      id: 'ringArray',
      name: 'Uniform circular array',
      sizeM: diameterM,
      areaM2: (Math.PI * diameterM * diameterM) / 4,
      depthM: lambdaLow / 4,
      elementCount: count,
      spacingM: dM,
      steering: scan > 0 ? `electronic, ±${scan}°, any azimuth` : 'electronic, any azimuth',
      gainBroadsideDbi: gainBroadside,
      gainEdgeDbi: gainEdge,
      hpbwBroadsideDeg: [broadside.theta.hpbwDeg ?? null, broadside.phi.hpbwDeg ?? null],
      hpbwEdgeDeg: edge.theta.hpbwDeg ?? null,
      flags,
      notes,
      outline: { kind: 'ring', diameterM },
    };
  }
  const perArm = Math.max(1, Math.round(count / 3));
  const armM = perArm * dM;
  return {
    id: 'yArray',
    name: 'Y-shaped array',
    sizeM: 2 * armM * Math.cos(Math.PI / 6),
    areaM2: (3 * Math.sqrt(3) / 4) * armM * armM,
    depthM: lambdaLow / 4,
    elementCount: 3 * perArm,
    spacingM: dM,
    steering: scan > 0 ? `electronic, ±${scan}°, any azimuth` : 'electronic, any azimuth',
    gainBroadsideDbi: gainBroadside,
    gainEdgeDbi: gainEdge,
    hpbwBroadsideDeg: [broadside.theta.hpbwDeg ?? null, broadside.phi.hpbwDeg ?? null],
    hpbwEdgeDeg: edge.theta.hpbwDeg ?? null,
    flags,
    notes,
    outline: { kind: 'y', armM },
  };
}
