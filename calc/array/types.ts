/**
 * Shared shapes of the array engine. Positions are in wavelengths (x, y, z per calc/angleConvention),
 * weights are complex element excitations (real and imaginary parts, linear field units).
 */

/** Element positions in wavelengths, one entry per element in each coordinate. */
export interface ElementPositions {
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
}

/** Complex excitation per element (linear field units). */
export interface ComplexWeights {
  re: Float64Array;
  im: Float64Array;
}

/**
 * Index of a planar array whose elements all sit on a uniform rectangular grid in the x–y plane
 * (z = 0): element n is at (originX + column[n]·pitchX, originY + row[n]·pitchY) wavelengths.
 * An equilateral triangular lattice is stored on a grid of pitch d/2 × d√3/2 with alternate
 * sites empty. `vectorsWavelengths` are the physical lattice vectors (one for a line).
 */
export interface LatticeIndex {
  kind: 'line' | 'rectangular' | 'triangular';
  pitchXWavelengths: number;
  pitchYWavelengths: number;
  originXWavelengths: number;
  originYWavelengths: number;
  columns: number;
  rows: number;
  column: Int32Array;
  row: Int32Array;
  vectorsWavelengths: Array<[number, number]>;
}

/**
 * Separable excitation of a full rectangular grid: the element in column c, row r has weight
 * x[c]·y[r]. Present only when that product holds exactly.
 */
export interface SeparableWeights {
  x: ComplexWeights;
  y: ComplexWeights;
}

/** Element pattern kinds; every kind may sit over an infinite ground plane. */
export type ElementKind =
  | { kind: 'isotropic' }
  /**
   * Power pattern cosⁿθ (n = powerExponent; field cos^(n/2) θ) in the forward hemisphere
   * (θ < 90°), zero behind. The exponent is of the power pattern, as everywhere in Dirigo.
   */
  | { kind: 'cosine'; powerExponent: number }
  /** Thin half-wave dipole with its axis along x, y or z. */
  | { kind: 'halfWaveDipole'; axis: 'x' | 'y' | 'z' };

/** Element pattern: a kind, optionally over a perfectly conducting ground plane z = −h (h in λ). */
export type ElementPattern = ElementKind & { groundPlaneHeightWavelengths?: number };

/** A direction in degrees (θ from broadside +z, φ from +x; calc/angleConvention). */
export interface DirectionDeg {
  thetaDeg: number;
  phiDeg: number;
}

/**
 * Everything needed to evaluate an array: positions (λ), complex weights, element pattern and
 * the beam direction at which directivity and beamwidths are measured. `lattice` and
 * `separable` are optional descriptions that unlock fast evaluation paths.
 */
export interface ArrayModel {
  positionsWavelengths: ElementPositions;
  weights: ComplexWeights;
  element: ElementPattern;
  beam: DirectionDeg;
  lattice?: LatticeIndex;
  separable?: SeparableWeights;
  /** Phase-shifter bits if the phases were quantized, else undefined. */
  phaseBits?: number;
}
