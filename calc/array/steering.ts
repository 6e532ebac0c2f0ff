import { degToRad } from '../angle';
import { requireInRange } from '../errors';
import type { ComplexWeights, ElementPositions } from './types';

/** Direction cosines (u, v, w) of (θ, φ) in degrees (calc/angleConvention). */
export function directionCosines(thetaDeg: number, phiDeg: number): [number, number, number] {
  const theta = degToRad(thetaDeg);
  const phi = degToRad(phiDeg);
  return [Math.sin(theta) * Math.cos(phi), Math.sin(theta) * Math.sin(phi), Math.cos(theta)];
}

/**
 * Complex weights a_n·e^{−j k r_n·û0} that steer the beam to (θ0, φ0): the progressive phase of
 * calc/angleConvention, with k r_n·û0 = 2π (x u0 + y v0 + z w0) for positions in wavelengths.
 */
export function steeredWeights(positions: ElementPositions, amplitudes: Float64Array, scanThetaDeg: number, scanPhiDeg: number): ComplexWeights {
  requireInRange('scanThetaDeg', scanThetaDeg, 0, 180, '°');
  requireInRange('scanPhiDeg', scanPhiDeg, -360, 360, '°');
  const [u0, v0, w0] = directionCosines(scanThetaDeg, scanPhiDeg);
  const count = amplitudes.length;
  const re = new Float64Array(count);
  const im = new Float64Array(count);
  for (let n = 0; n < count; n++) {
    const phase = -2 * Math.PI * (positions.x[n] * u0 + positions.y[n] * v0 + positions.z[n] * w0);
    re[n] = amplitudes[n] * Math.cos(phase);
    im[n] = amplitudes[n] * Math.sin(phase);
  }
  return { re, im };
}

/** Complex weights a_n·e^{j n δ} of a line with a progressive phase δ (rad) between neighbours. */
export function progressivePhaseWeights(amplitudes: Float64Array, phaseStepRad: number): ComplexWeights {
  const count = amplitudes.length;
  const re = new Float64Array(count);
  const im = new Float64Array(count);
  for (let n = 0; n < count; n++) {
    re[n] = amplitudes[n] * Math.cos(n * phaseStepRad);
    im[n] = amplitudes[n] * Math.sin(n * phaseStepRad);
  }
  return { re, im };
}
