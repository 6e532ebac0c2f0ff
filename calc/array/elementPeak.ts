import { degToRad } from '../angle';
import { goldenMinimize } from '../numeric/goldenMinimize';
import { elementFieldAt, isIsotropic, validateElementPattern } from './elementPattern';
import { directionCosines } from './steering';
import type { DirectionDeg, ElementPattern } from './types';

const powerAt = (element: ElementPattern, thetaRad: number, phiRad: number) => {
  const s = Math.sin(thetaRad);
  return elementFieldAt(element, s * Math.cos(phiRad), s * Math.sin(phiRad), Math.cos(thetaRad)) ** 2;
};

let lastPeak: { key: string; peak: number } | undefined;

/**
 * Largest power |f|² of the element pattern (with its ground-plane factor) over the sphere: a
 * 0.5° θ × 10° φ grid, then golden-section search in θ and in φ around the best sample. The last
 * answer is kept, so repeated calls for the same element cost nothing.
 */
export function elementPowerPeak(element: ElementPattern): number {
  validateElementPattern(element);
  if (isIsotropic(element)) return 1;
  const key = JSON.stringify(element);
  if (lastPeak?.key === key) return lastPeak.peak;
  const thetaStep = degToRad(0.5), phiStep = degToRad(10);
  let best = { p: -1, theta: 0, phi: 0 };
  for (let i = 0; i <= 360; i++) {
    for (let j = 0; j < 36; j++) {
      const p = powerAt(element, i * thetaStep, j * phiStep);
      if (p > best.p) best = { p, theta: i * thetaStep, phi: j * phiStep };
    }
  }
  const theta = goldenMinimize((t) => -powerAt(element, t, best.phi), Math.max(0, best.theta - thetaStep), Math.min(Math.PI, best.theta + thetaStep), 1e-12);
  const phi = goldenMinimize((f) => -powerAt(element, theta, f), best.phi - phiStep, best.phi + phiStep, 1e-12);
  const peak = Math.max(best.p, powerAt(element, theta, best.phi), powerAt(element, theta, phi));
  lastPeak = { key, peak };
  return peak;
}

/** Lowest level elementLevelDb reports, dB: an exact null of the element pattern. */
export const ELEMENT_NULL_FLOOR_DB = -300;

/**
 * Element power toward a direction (degrees) relative to the element's own peak, dB (≤ 0; an
 * exact null gives ELEMENT_NULL_FLOOR_DB), evaluated at the same direction cosines as the
 * array engine's pattern.
 */
export function elementLevelDb(element: ElementPattern, direction: DirectionDeg): number {
  const peak = elementPowerPeak(element);
  if (!(peak > 0)) return ELEMENT_NULL_FLOOR_DB;
  const [u, v, w] = directionCosines(direction.thetaDeg, direction.phiDeg);
  const p = elementFieldAt(element, u, v, w) ** 2;
  return Math.max(ELEMENT_NULL_FLOOR_DB, Math.min(0, 10 * Math.log10(p / peak)));
}
