import { freeSpaceWavelengthM } from '../wavelength';
import { latticeCellAreaPerSpacingSquared, type Lattice } from '../gratingLobeLimit';
import { scanLossPartsDb, uniformLineHpbwDeg } from '../scanLoss';
import { apertureGainFromArea, areaForGainM2 } from '../aperture/index';
import { enclosingDiscAreaM2, type Candidate, type SizingRequirement } from './candidate';
import { coverageCornerScanDeg, coverageSpacingLimitWavelengths } from './coverage';
import { UNIFORM_FIRST_SIDELOBE_DB } from './uniformSidelobe';

/** Most elements across a line or face whose beam the sizing computes (the limit of uniformLineHpbwDeg); more is flagged impractical. */
export const MAX_LINE_BEAM_ELEMENTS = 1e7;

/**
 * Grating-lobe-free spacing over the coverage ±azimuthDeg × ±elevationDeg at the highest
 * frequency, less the team margin, m (coverage.ts states the region's convention).
 */
export function sizingSpacingM(requirement: SizingRequirement, lattice: Lattice, azimuthDeg: number, elevationDeg: number): number {
  return coverageSpacingLimitWavelengths(azimuthDeg, elevationDeg, lattice) * freeSpaceWavelengthM(requirement.frequencyHighHz) * (1 - requirement.assumptions.spacingMarginFraction);
}

/** Smallest whole N (≥ 2) with uniformLineHpbwDeg(N, d/λ, 0) ≤ hpbwDeg, by bisection (N = 2 is tested). */
export function lineCountForHpbw(spacingWavelengths: number, hpbwDeg: number): number {
  let lo = 2;
  let hi = 4;
  const width = (n: number) => uniformLineHpbwDeg(n, spacingWavelengths, 0) ?? Infinity;
  if (width(lo) <= hpbwDeg) return lo;
  while (width(hi) > hpbwDeg && hi < 1e7) {
    lo = hi;
    hi *= 2;
  }
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (width(mid) <= hpbwDeg) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** Scan loss at the coverage corner for the cosⁿθ element power pattern, dB (≤ 0 for n ≥ 1). */
export function cornerScanLossDb(requirement: SizingRequirement, azimuthDeg = requirement.scanAzimuthDeg, elevationDeg = requirement.scanElevationDeg): number {
  const corner = Math.min(coverageCornerScanDeg(azimuthDeg, elevationDeg), 89.9);
  return scanLossPartsDb(corner, 'cosine', requirement.assumptions.cosineExponent).totalDb;
}

/** A square planar phased array facing the boresight, scanning electronically over the whole region. */
export function sizePlanarArray(requirement: SizingRequirement, lattice: Lattice): Candidate {
  const lambda = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const az = requirement.scanAzimuthDeg;
  const el = requirement.scanElevationDeg;
  const corner = Math.min(coverageCornerScanDeg(az, el), 89.9);
  const { arrayRadiationEfficiency: eta } = requirement.assumptions;
  const loss = cornerScanLossDb(requirement);
  const dRect = sizingSpacingM(requirement, 'rectangular', az, el);
  const dTri = sizingSpacingM(requirement, 'triangular', az, el);
  const d = lattice === 'triangular' ? dTri : dRect;
  let areaM2: number;
  if (requirement.kind === 'gain') {
    areaM2 = areaForGainM2(10 ** ((requirement.gainEdgeDbi - loss) / 10), lambda, eta);
  } else {
    const side = lineCountForHpbw(d / lambda, requirement.hpbwDeg) * d;
    areaM2 = side * side;
  }
  const widthM = Math.sqrt(areaM2);
  const cellM2 = latticeCellAreaPerSpacingSquared(lattice) * d * d;
  const countRect = Math.max(1, Math.ceil(areaM2 / (latticeCellAreaPerSpacingSquared('rectangular') * dRect * dRect)));
  const countTri = Math.max(1, Math.ceil(areaM2 / (latticeCellAreaPerSpacingSquared('triangular') * dTri * dTri)));
  const across = Math.max(2, Math.round(widthM / d));
  const gainBroadside = 10 * Math.log10(apertureGainFromArea(areaM2, lambda, eta));
  const beamComputable = across <= MAX_LINE_BEAM_ELEMENTS;
  const hpbw0 = beamComputable ? uniformLineHpbwDeg(across, d / lambda, 0) : null;
  const flags: Candidate['flags'] = beamComputable ? [] : [{ code: 'face-too-large', kind: 'practical', message: `impractical: ${across.toExponential(2)} elements across, more than the ${MAX_LINE_BEAM_ELEMENTS.toExponential(0)} whose beam the sizing computes` }];
  const elementGainDbi = 10 * Math.log10(apertureGainFromArea(cellM2, lambda));
  const diagonalM = widthM * Math.SQRT2;
  return {
    id: 'planarArray',
    name: `Planar phased array (${lattice === 'triangular' ? 'triangular' : 'rectangular'} lattice)`,
    sizeM: diagonalM,
    enclosingDiameterM: diagonalM,
    footprintM2: enclosingDiscAreaM2(diagonalM),
    depthM: lambda / 4,
    elementCount: lattice === 'triangular' ? countTri : countRect,
    elementCountRectangular: countRect,
    elementCountTriangular: countTri,
    spacingM: d,
    elementGainDbi,
    model: 'Face of area A, each element filling its lattice cell: directivity 4πA/λ² × radiation efficiency at broadside, cosⁿθ element power pattern at the coverage corner; uniform excitation.',
    steering: corner > 0 ? `electronic over ±${az}° az × ±${el}° el (corner ${corner.toFixed(1)}° from the face normal)` : 'electronic (fixed beam possible)',
    gainBroadsideDbi: gainBroadside,
    gainEdgeDbi: gainBroadside + loss,
    gainPrecision: 'computed',
    hpbwBroadsideDeg: [hpbw0, hpbw0],
    hpbwEdgeDeg: corner > 0 && beamComputable ? uniformLineHpbwDeg(across, d / lambda, corner) : hpbw0,
    beamPrecision: 'computed',
    firstSidelobeDb: UNIFORM_FIRST_SIDELOBE_DB,
    flags,
    fits: true,
    notes: [
      `Square face ${Number(widthM.toPrecision(3))} m wide (diagonal ${Number(diagonalM.toPrecision(3))} m). Spacing ${(d / freeSpaceWavelengthM(requirement.frequencyHighHz)).toFixed(3)} λ at the highest frequency (grating-lobe-free over the region with the team margin); each element fills a cell of ${(cellM2 / (lambda * lambda)).toFixed(2)} λ², so it must reach ${elementGainDbi.toFixed(1)} dBi at the lowest frequency. Beam at the corner from the face's width as a uniform line scanned in the plane through the corner; depth is the radiating layer over its backplane only.`,
    ],
    outline: { kind: 'rectangle', widthM, heightM: widthM },
  };
}
