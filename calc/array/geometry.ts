import type { ElementPositions, LatticeIndex } from './types';

/**
 * An array layout before excitation: positions (λ), an optional lattice index, whether the
 * lattice is a full rectangular grid (so separable weights are possible) and the aperture
 * half-lengths in x and y (λ) that tapers are normalized to (count·pitch/2 on a lattice).
 */
export interface ArrayGeometry {
  positionsWavelengths: ElementPositions;
  lattice?: LatticeIndex;
  fullGrid: boolean;
  apertureHalfXWavelengths: number;
  apertureHalfYWavelengths: number;
}

/** Allocates zeroed position arrays for count elements. */
export function emptyPositions(count: number): ElementPositions {
  return { x: new Float64Array(count), y: new Float64Array(count), z: new Float64Array(count) };
}

/** Number of elements in a position set. */
export function elementCount(positions: ElementPositions): number {
  return positions.x.length;
}

/** Largest distance between any element and the centroid, times two (a bounding diameter), λ. */
export function arrayDiameterWavelengths(positions: ElementPositions): number {
  const n = positions.x.length;
  let cx = 0, cy = 0, cz = 0;
  for (let i = 0; i < n; i++) { cx += positions.x[i]; cy += positions.y[i]; cz += positions.z[i]; }
  cx /= n; cy /= n; cz /= n;
  let r2 = 0;
  for (let i = 0; i < n; i++) {
    const dx = positions.x[i] - cx, dy = positions.y[i] - cy, dz = positions.z[i] - cz;
    r2 = Math.max(r2, dx * dx + dy * dy + dz * dz);
  }
  return 2 * Math.sqrt(r2);
}
