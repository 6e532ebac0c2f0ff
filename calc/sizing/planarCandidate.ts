import { freeSpaceWavelengthM } from '../wavelength';
import { latticeCellAreaPerSpacingSquared, maxGratingFreeSpacingWavelengths, type Lattice } from '../gratingLobeLimit';
import { apertureDirectivity, scanLossPartsDb, uniformLineHpbwDeg } from '../scanLoss';
import type { Candidate, SizingRequirement } from './candidate';

/** Grating-lobe-free spacing at the highest frequency with the team margin, m. */
export function sizingSpacingM(requirement: SizingRequirement, lattice: Lattice, scanDeg: number): number {
  return maxGratingFreeSpacingWavelengths(Math.min(scanDeg, 90), lattice) * freeSpaceWavelengthM(requirement.frequencyHighHz) * (1 - requirement.assumptions.spacingMarginFraction);
}

/** Smallest whole N (≥ 2) with uniformLineHpbwDeg(N, d/λ, 0) ≤ hpbwDeg, by bisection. */
export function lineCountForHpbw(spacingWavelengths: number, hpbwDeg: number): number {
  let lo = 2;
  let hi = 4;
  const width = (n: number) => uniformLineHpbwDeg(n, spacingWavelengths, 0) ?? Infinity;
  while (width(hi) > hpbwDeg && hi < 1e7) hi *= 2;
  if (width(lo) <= hpbwDeg) return lo;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (width(mid) <= hpbwDeg) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** A square planar phased array scanning electronically in both planes. */
export function sizePlanarArray(requirement: SizingRequirement, lattice: Lattice): Candidate {
  const lambda = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const scan = Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const { arrayRadiationEfficiency: eta, cosineExponent: n } = requirement.assumptions;
  const loss = scanLossPartsDb(Math.min(scan, 89.9), 'cosine', n).totalDb;
  const dRect = sizingSpacingM(requirement, 'rectangular', scan);
  const dTri = sizingSpacingM(requirement, 'triangular', scan);
  const d = lattice === 'triangular' ? dTri : dRect;
  let areaM2: number;
  if (requirement.kind === 'gain') {
    areaM2 = (lambda * lambda) / (4 * Math.PI) * 10 ** ((requirement.gainEdgeDbi - 10 * Math.log10(eta) - loss) / 10);
  } else {
    const side = lineCountForHpbw(d / lambda, requirement.hpbwDeg) * d;
    areaM2 = side * side;
  }
  const widthM = Math.sqrt(areaM2);
  const countRect = Math.max(1, Math.ceil(areaM2 / (latticeCellAreaPerSpacingSquared('rectangular') * dRect * dRect)));
  const countTri = Math.max(1, Math.ceil(areaM2 / (latticeCellAreaPerSpacingSquared('triangular') * dTri * dTri)));
  const across = Math.max(2, Math.round(widthM / d));
  const gainBroadside = 10 * Math.log10(eta * apertureDirectivity(areaM2, lambda));
  const hpbw0 = uniformLineHpbwDeg(across, d / lambda, 0);
  return {
    id: 'planarArray',
    name: `Planar phased array (${lattice === 'triangular' ? 'triangular' : 'rectangular'} lattice)`,
    sizeM: widthM,
    areaM2,
    depthM: lambda / 4,
    elementCount: lattice === 'triangular' ? countTri : countRect,
    elementCountRectangular: countRect,
    elementCountTriangular: countTri,
    spacingM: d,
    steering: scan > 0 ? `electronic, ±${scan}° in both planes` : 'electronic (fixed beam possible)',
    gainBroadsideDbi: gainBroadside,
    gainEdgeDbi: gainBroadside + loss,
    hpbwBroadsideDeg: [hpbw0, hpbw0],
    hpbwEdgeDeg: uniformLineHpbwDeg(across, d / lambda, Math.min(scan, 89.9)),
    flags: [],
    notes: [`Spacing ${(d / freeSpaceWavelengthM(requirement.frequencyHighHz)).toFixed(3)} λ at the highest frequency (grating-lobe-free with the team margin); depth shown is the radiating layer over its backplane only.`],
    outline: { kind: 'rectangle', widthM, heightM: widthM },
  };
}
