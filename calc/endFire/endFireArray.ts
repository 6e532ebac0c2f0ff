/**
 * Uniform end-fire arrays of isotropic elements along x (beam on +x: θ = 90°, φ = 0°): element
 * count for a length, the progressive phase, directivity from the real pattern (array engine),
 * HPBW by root-finding (array engine), the long-array approximations, and the length for a
 * target directivity.
 */
import { CalcInputError, requireInRange, requirePositive } from '../errors';
import { MAX_ARRAY_ELEMENTS } from '../array/limits';
import { buildArrayModel } from '../array/buildArray';
import { directivity } from '../array/directivity';
import { principalPlaneMetrics } from '../array/beamMetrics';
import { hansenWoodyardPhaseStepRad, ordinaryEndFirePhaseStepRad } from '../array/endFirePhase';
import type { ArrayModel } from '../array/types';

/** The two end-fire array kinds. */
export type EndFireArrayKind = 'ordinary' | 'hansenWoodyard';

/** Largest element count the end-fire tools accept (directivity and HPBW stay fast in a browser). */
export const MAX_END_FIRE_ELEMENTS = 4000;

/** Ratio of Hansen–Woodyard to ordinary end-fire directivity for long arrays, 1.805 (Balanis, "Antenna Theory", 4th ed., §6.4 (section number from memory)). */
export const HANSEN_WOODYARD_LONG_ARRAY_FACTOR = 1.805;

/**
 * Element count for an array of overall length L (first to last element) at spacing d:
 * N = floor(L/d) + 1, so (N − 1)·d ≤ L (the array fits the length). A tiny relative allowance
 * (1e-9) keeps L = (N − 1)d exactly at N elements despite rounding.
 */
export function endFireElementCount(lengthWavelengths: number, spacingWavelengths: number): number {
  requirePositive('lengthWavelengths', lengthWavelengths, 'λ');
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  if (lengthWavelengths < spacingWavelengths * (1 - 1e-9)) {
    throw new CalcInputError('lengthWavelengths', `expected a length of at least one element spacing (${spacingWavelengths} λ), got ${lengthWavelengths} λ`);
  }
  const count = Math.floor(lengthWavelengths / spacingWavelengths + 1e-9) + 1;
  if (count > MAX_END_FIRE_ELEMENTS) {
    throw new CalcInputError('lengthWavelengths', `expected at most ${MAX_END_FIRE_ELEMENTS} elements (length ÷ spacing), got ${count}`);
  }
  return count;
}

/** Progressive phase per element (rad) of the end-fire kind: ordinary −kd, Hansen–Woodyard −(kd + 2.92/N) (array engine). */
export function endFirePhaseStepRad(kind: EndFireArrayKind, count: number, spacingWavelengths: number): number {
  return kind === 'ordinary' ? ordinaryEndFirePhaseStepRad(spacingWavelengths) : hansenWoodyardPhaseStepRad(count, spacingWavelengths);
}

/** The array engine's model of a uniform end-fire line of isotropic elements, beam on +x. */
export function endFireArrayModel(kind: EndFireArrayKind, count: number, spacingWavelengths: number): ArrayModel {
  if (count < 1 || count > MAX_ARRAY_ELEMENTS) throw new CalcInputError('count', `expected 1 to ${MAX_ARRAY_ELEMENTS} elements, got ${count}`);
  return buildArrayModel({
    geometry: { kind: 'linear', count, spacingWavelengths },
    phaseStepRad: endFirePhaseStepRad(kind, count, spacingWavelengths),
    beam: { thetaDeg: 90, phiDeg: 0 },
  });
}

/** Directivity (linear) toward end-fire of a uniform line of count isotropic elements: the exact pattern integral (array engine, closed form). */
export function endFireDirectivity(kind: EndFireArrayKind, count: number, spacingWavelengths: number): number {
  return directivity(endFireArrayModel(kind, count, spacingWavelengths)).directivity;
}

/** HPBW (degrees) of the end-fire beam, by root-finding on the pattern (array engine); the beam is a body of revolution about the axis, so one plane serves. Null when the pattern never falls to half power. */
export function endFireHpbwDeg(kind: EndFireArrayKind, count: number, spacingWavelengths: number): number | null {
  const metrics = principalPlaneMetrics(endFireArrayModel(kind, count, spacingWavelengths));
  return metrics.theta.hpbwDeg ?? null;
}

/** Ordinary end-fire, long array: D ≈ 4L/λ (Balanis, "Antenna Theory", 4th ed., §6.3 (section number from memory), eq. for D0 ≈ 4N d/λ ≈ 4L/λ). */
export function ordinaryEndFireApproxDirectivity(lengthWavelengths: number): number {
  requirePositive('lengthWavelengths', lengthWavelengths, 'λ');
  return 4 * lengthWavelengths;
}

/** Hansen–Woodyard, long array: D ≈ 1.805 · 4L/λ (Balanis, "Antenna Theory", 4th ed., §6.4 (section number from memory)). */
export function hansenWoodyardApproxDirectivity(lengthWavelengths: number): number {
  requirePositive('lengthWavelengths', lengthWavelengths, 'λ');
  return HANSEN_WOODYARD_LONG_ARRAY_FACTOR * 4 * lengthWavelengths;
}

/** The long-array approximation for the kind. */
export function endFireApproxDirectivity(kind: EndFireArrayKind, lengthWavelengths: number): number {
  return kind === 'ordinary' ? ordinaryEndFireApproxDirectivity(lengthWavelengths) : hansenWoodyardApproxDirectivity(lengthWavelengths);
}

/**
 * Spacing limit of the end-fire condition (λ): ordinary end-fire needs d < λ/2, or a second,
 * equal beam appears toward −x; Hansen–Woodyard needs d ≤ (N − 1)λ/(4N) so that |ψ| ≤ π at
 * θ = 180° and the back lobe stays small (Balanis, "Antenna Theory", 4th ed., §6.3–6.4 (section number from memory)).
 */
export function endFireSpacingLimitWavelengths(kind: EndFireArrayKind, count: number): number {
  return kind === 'ordinary' ? 0.5 : (count - 1) / (4 * count);
}

/** Result of solving for the length that reaches a directivity. */
export interface EndFireLengthSolution {
  count: number;
  /** (N − 1)·d, λ. */
  lengthWavelengths: number;
  directivity: number;
}

/**
 * The shortest uniform end-fire array (whole elements at spacing d) whose exact directivity
 * reaches targetDirectivity: the smallest N with D(N) ≥ target, found by doubling then bisection
 * on N (D grows with N for the spacings the end-fire condition allows; tested), length (N − 1)d.
 * Returns null when even MAX_END_FIRE_ELEMENTS elements fall short.
 */
export function endFireLengthForDirectivity(kind: EndFireArrayKind, spacingWavelengths: number, targetDirectivity: number): EndFireLengthSolution | null {
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  requireInRange('targetDirectivity', targetDirectivity, 1e-3, 1e9);
  const d = (n: number) => endFireDirectivity(kind, n, spacingWavelengths);
  let high = 2;
  while (d(high) < targetDirectivity) {
    if (high >= MAX_END_FIRE_ELEMENTS) return null;
    high = Math.min(MAX_END_FIRE_ELEMENTS, high * 2);
  }
  let low = 1; // D(1) = 1 is taken as below any target above 1
  if (targetDirectivity <= 1) return { count: 1, lengthWavelengths: 0, directivity: 1 };
  while (high - low > 1) {
    const mid = Math.floor((low + high) / 2);
    if (d(mid) >= targetDirectivity) high = mid; else low = mid;
  }
  return { count: high, lengthWavelengths: (high - 1) * spacingWavelengths, directivity: d(high) };
}
