import { degToRad, radToDeg } from './angle';
import { requireInRange, requirePositive } from './errors';

/** Lattices for planar arrays. 'triangular' means equilateral triangular (nearest-neighbour spacing d). */
export type Lattice = 'rectangular' | 'triangular';

/**
 * Reciprocal-lattice radius in direction-cosine space per unit d/λ: a grating lobe sits at
 * û0 + (λ/d)·g with |g| = 1 for a rectangular (square-cell) lattice along its axes, and
 * |g| = 2/√3 for an equilateral triangular lattice with nearest-neighbour spacing d
 * (its reciprocal lattice is triangular with primitive vectors of length 2/(√3 d)).
 */
export function reciprocalRadiusFactor(lattice: Lattice): number {
  return lattice === 'triangular' ? 2 / Math.sqrt(3) : 1;
}

/**
 * Largest spacing, in wavelengths, that keeps every grating lobe out of visible space for scans
 * up to scanMaxDeg from broadside in any plane.
 * Rectangular: d/λ ≤ 1/(1 + sin θmax). Equilateral triangular: d/λ ≤ (2/√3)/(1 + sin θmax).
 * Source: Mailloux, "Phased Array Antenna Handbook", 2nd ed., §2.1 (section number from memory; grating-lobe conditions
 * for rectangular and triangular grids); Skolnik, "Radar Handbook", 3rd ed., ch. 13 (chapter number from memory).
 */
export function maxGratingFreeSpacingWavelengths(scanMaxDeg: number, lattice: Lattice): number {
  requireInRange('scanMaxDeg', scanMaxDeg, 0, 90, '°');
  return reciprocalRadiusFactor(lattice) / (1 + Math.sin(degToRad(scanMaxDeg)));
}

/**
 * Scan angle from broadside, degrees, at which the first grating lobe enters visible space for
 * spacing d/λ (worst scan plane). Returns 90 when no grating lobe can enter at any real scan
 * angle (d/λ ≤ g/2), and 0 when one is already visible at broadside (d/λ ≥ g).
 * From sin θ_GL = g·λ/d − 1 with g = reciprocalRadiusFactor(lattice).
 */
export function gratingLobeOnsetScanDeg(spacingWavelengths: number, lattice: Lattice): number {
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  const sine = reciprocalRadiusFactor(lattice) / spacingWavelengths - 1;
  if (sine >= 1) return 90;
  if (sine <= 0) return 0;
  return radToDeg(Math.asin(sine));
}

/** Area per element of the lattice, in units of d² (square 1, equilateral triangular √3/2). */
export function latticeCellAreaPerSpacingSquared(lattice: Lattice): number {
  return lattice === 'triangular' ? Math.sqrt(3) / 2 : 1;
}
