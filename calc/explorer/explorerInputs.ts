/**
 * The explorer's validated inputs (SI units and degrees, as the frame hands them over) turned
 * into an ArraySpec for the array engine (lengths in wavelengths). One place decides what each
 * input means for each geometry, so the page, the worker and the tests build the same model.
 */
import type { CalcInputs } from '../calculator';
import { CalcInputError } from '../errors';
import type { ArraySpec, ElementPattern, GeometrySpec, Taper } from '../array/index';
import { freeSpaceWavelengthM } from '../wavelength';

export type ExplorerGeometry = 'linear' | 'planar' | 'circular' | 'yArms' | 'thinned';

/** Largest planar grid (columns × rows) the explorer accepts: 128 × 128. */
export const MAX_EXPLORER_SITES = 16_384;

/** What the explorer knows about the array besides the ArraySpec. */
export interface ExplorerArray {
  spec: ArraySpec;
  geometry: ExplorerGeometry;
  wavelengthM: number;
  /** Neighbour spacing, λ. */
  spacingWavelengths: number;
  /** Ring radius for the circular geometry, λ (neighbour chord = spacing). */
  ringRadiusWavelengths: number | null;
  /** Lattice for the grating-lobe onset: 'rectangular' for lines and square grids, 'triangular', or null (no lattice). */
  lattice: 'rectangular' | 'triangular' | null;
  /** φ of the plotted cut, degrees (the steering plane unless the cut input is set). */
  cutPhiDeg: number;
}

/**
 * The design sidelobe level as the array engine's taper takes it: a positive number of dB below
 * the peak. The explorer's input is the level relative to the peak (≤ 0, the site's convention).
 */
export function sidelobeDepthDb(inputs: CalcInputs): number {
  return Math.abs(inputs.sidelobeDb as number);
}

function taperOf(inputs: CalcInputs): Taper {
  switch (inputs.taper) {
    case 'cosine': return { kind: 'cosineOnPedestal', pedestal: 10 ** ((inputs.pedestalDb as number) / 20), exponent: 2 };
    case 'taylor': return { kind: 'taylor', nbar: inputs.nbar as number, sidelobeDb: sidelobeDepthDb(inputs) };
    case 'chebyshev': return { kind: 'chebyshev', sidelobeDb: sidelobeDepthDb(inputs) };
    default: return { kind: 'uniform' };
  }
}

function elementOf(inputs: CalcInputs, wavelengthM: number): ElementPattern {
  const height = inputs.groundHeightM as number | null;
  const ground = height === null ? {} : { groundPlaneHeightWavelengths: height / wavelengthM };
  switch (inputs.element) {
    case 'cosine': return { kind: 'cosine', powerExponent: inputs.elementPowerExponent as number, ...ground };
    case 'dipoleX': return { kind: 'halfWaveDipole', axis: 'x', ...ground };
    case 'dipoleY': return { kind: 'halfWaveDipole', axis: 'y', ...ground };
    default: return { kind: 'isotropic', ...ground };
  }
}

function requireSites(columns: number, rows: number): void {
  if (columns * rows > MAX_EXPLORER_SITES) {
    throw new CalcInputError('elements', `a planar grid may have at most ${MAX_EXPLORER_SITES} sites (128 × 128); ${columns} × ${rows} = ${columns * rows}. Reduce the elements per row or the rows`);
  }
}

/** Builds the engine's ArraySpec from the explorer's inputs (throws CalcInputError for impossible combinations). */
export function explorerArray(inputs: CalcInputs): ExplorerArray {
  const geometry = inputs.geometry as ExplorerGeometry;
  const wavelengthM = freeSpaceWavelengthM(inputs.frequencyHz as number);
  const d = (inputs.spacingM as number) / wavelengthM;
  const countX = inputs.countX as number;
  const countY = inputs.countY as number;
  const lattice = inputs.lattice as 'rectangular' | 'triangular';
  const outline = inputs.outline as 'rectangle' | 'circle' | 'ellipse';
  let geometrySpec: GeometrySpec;
  let ringRadius: number | null = null;
  let thinning: ArraySpec['thinning'];
  let onsetLattice: ExplorerArray['lattice'] = null;
  switch (geometry) {
    case 'linear':
      if (countX < 2) throw new CalcInputError('elements', 'a linear array needs at least 2 elements');
      geometrySpec = { kind: 'linear', count: countX, spacingWavelengths: d };
      onsetLattice = 'rectangular';
      break;
    case 'planar':
      requireSites(countX, countY);
      geometrySpec = { kind: 'planar', lattice, columns: countX, rows: countY, spacingXWavelengths: d, outline };
      onsetLattice = lattice;
      break;
    case 'thinned':
      requireSites(countX, countY);
      geometrySpec = { kind: 'planar', lattice, columns: countX, rows: countY, spacingXWavelengths: d, outline };
      thinning = { fillFraction: inputs.fillFraction as number, seed: inputs.seed as number };
      onsetLattice = lattice;
      break;
    case 'circular':
      if (countX < 3) throw new CalcInputError('elements', 'a ring needs at least 3 elements');
      ringRadius = d / (2 * Math.sin(Math.PI / countX));
      geometrySpec = { kind: 'circular', count: countX, radiusWavelengths: ringRadius };
      break;
    case 'yArms':
      geometrySpec = { kind: 'yShaped', elementsPerArm: countX, spacingWavelengths: d };
      break;
    default:
      throw new CalcInputError('geometry', `unknown geometry ${JSON.stringify(geometry)}`);
  }
  const thetaDeg = inputs.thetaDeg as number;
  const phiDeg = inputs.phiDeg as number;
  const bits = inputs.phaseBits as number;
  const radial = (geometry === 'planar' || geometry === 'thinned') && outline !== 'rectangle';
  const spec: ArraySpec = {
    geometry: geometrySpec,
    thinning,
    taper: taperOf(inputs),
    taperForm: radial ? 'radial' : undefined,
    steering: { thetaDeg, phiDeg },
    phaseBits: bits > 0 ? bits : undefined,
    element: elementOf(inputs, wavelengthM),
  };
  const cut = inputs.cutPhiDeg as number | null;
  return { spec, geometry, wavelengthM, spacingWavelengths: d, ringRadiusWavelengths: ringRadius, lattice: onsetLattice, cutPhiDeg: cut ?? phiDeg };
}

/** A stable text key of the inputs (for matching background results to the inputs they were made for). */
export function inputsKey(inputs: CalcInputs): string {
  return JSON.stringify(Object.keys(inputs).sort().map((k) => [k, inputs[k]]));
}
