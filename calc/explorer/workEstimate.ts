/**
 * Rough cost of the explorer's computations, in element–direction evaluations, so the page can
 * decide what to compute at once (inside one animation frame or a few) and what to hand to a
 * background worker. Calibrated on the engine's own timings: about 10–30 ns per evaluation in
 * Chromium and Node (see bench/ and DEVELOPERS.md).
 */
import { arrayDiameterWavelengths, isIsotropic, pairSumWork, type ArrayModel } from '../array/index';

/** Evaluations allowed on the main thread for the cut and the beam metrics together (≈ 30–60 ms). */
export const SYNC_BUDGET_EVALUATIONS = 3e6;

/**
 * Cost of one direction in direct-summation units (one cos/sin pair per element): rows + columns
 * on a separable grid; on a lattice index one phasor per row and column plus a multiply-add per
 * element (about a third of a cos/sin pair); otherwise every element.
 */
export function evaluationsPerDirection(model: ArrayModel): number {
  if (model.separable) return model.separable.x.re.length + model.separable.y.re.length;
  if (model.lattice) return model.weights.re.length / 3 + model.lattice.columns + model.lattice.rows;
  return model.weights.re.length;
}

/** Directions the beam-metric search visits, from the size in wavelengths (two planes, coarse scan + sidelobe scan). */
export function metricDirections(model: ArrayModel): number {
  return 2 * 45 * (arrayDiameterWavelengths(model.positionsWavelengths) + 1);
}

/** Samples of a plotted cut over −180…180°: at least 1441 (0.25°), else about 8 per beamwidth, at most 8001. */
export function cutSamples(model: ArrayModel): number {
  const diameter = arrayDiameterWavelengths(model.positionsWavelengths);
  const beamwidthDeg = 51 / (diameter + 1);
  return Math.min(8001, Math.max(1441, 2 * Math.ceil(360 / (beamwidthDeg / 8) / 2) + 1));
}

/** Cost of the cut plus the principal-plane metrics. */
export function patternWork(model: ArrayModel): number {
  return (cutSamples(model) + metricDirections(model)) * evaluationsPerDirection(model);
}

/** Cost of a u–v map with count × count samples (FFT-able grids cost almost nothing; the caller may check that first). */
export function uvMapWork(model: ArrayModel, count: number): number {
  return count * count * (Math.PI / 4) * evaluationsPerDirection(model);
}

/**
 * True when directivity needs quadrature over the sphere (an element pattern or ground plane with
 * no exact pair sum): always background work. Isotropic elements, and forward cosⁿθ elements in
 * the x–y plane without a ground plane, have an exact pair sum instead.
 */
export function directivityNeedsQuadrature(model: ArrayModel): boolean {
  return pairSumWork(model) === null;
}

/** True when the exact pair sum is cheap enough for the main thread (isotropic sums always are: FFT or sinc only). */
export function pairSumFitsSync(model: ArrayModel): boolean {
  const work = pairSumWork(model);
  return work !== null && (isIsotropic(model.element) || work <= SYNC_BUDGET_EVALUATIONS);
}

/** Largest quadrature the explorer starts (direct-summation units, ≈ 10 s in a worker on an idle core). */
export const MAX_QUADRATURE_WORK = 8e8;

/**
 * Cost of directivity by quadrature (calc/array/directivity: 16-node Gauss–Legendre panels,
 * 2.5 per wavelength of size plus 8, in both angles; a line needs few in the second angle).
 */
export function quadratureWork(model: ArrayModel): number {
  const diameter = arrayDiameterWavelengths(model.positionsWavelengths);
  const { y, z } = model.positionsWavelengths;
  const isLine = y.every((value) => value === 0) && z.every((value) => value === 0);
  const h = model.element.groundPlaneHeightWavelengths ?? 0;
  const alpha = 16 * (2.5 * diameter + 8 * h + 10);
  const beta = 16 * (2.5 * (isLine ? 0 : diameter) + 8 * h + 10);
  return alpha * beta * evaluationsPerDirection(model);
}
