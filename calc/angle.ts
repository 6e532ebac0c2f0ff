import { DEG_PER_RAD, RAD_PER_DEG } from './constants';

/** Degrees to radians. */
export function degToRad(angleDeg: number): number {
  return angleDeg * RAD_PER_DEG;
}

/** Radians to degrees. */
export function radToDeg(angleRad: number): number {
  return angleRad * DEG_PER_RAD;
}
