import { requireInteger } from '../errors';
import type { PlaneMetrics } from './beamMetrics';
import { principalPlaneMetrics } from './beamMetrics';
import type { ArraySpec } from './buildArray';
import { buildArrayModel } from './buildArray';

/** Effect of B-bit phase quantization on a steered array (degrees and dB). */
export interface QuantizationEffect {
  phaseBits: number;
  /** Phase step of the shifter, 360°/2^B. */
  phaseStepDeg: number;
  /** Beam peak offset from the intended direction, combined from the two principal planes, degrees. */
  pointingErrorDeg: number;
  /** Highest sidelobe of the two principal planes with continuous phases, and with quantized phases, dB. */
  peakSidelobeDb?: number;
  quantizedPeakSidelobeDb?: number;
}

function worstSidelobe(planes: PlaneMetrics[]): number | undefined {
  const levels = planes.map((p) => p.peakSidelobeDb).filter((x): x is number => x !== undefined);
  return levels.length ? Math.max(...levels) : undefined;
}

/**
 * Pointing error and sidelobe change from quantizing every phase to B bits (deterministic
 * rounding). The pointing error is √(δθ² + δφ²) of the peak offsets found in the two principal
 * planes, relative to the same offsets with continuous phases (so element-pattern pull is not counted);
 * for a linear array, whose beam is a cone about its axis, only the scan plane (φ = φ0) counts, for sidelobes too.
 */
export function phaseQuantizationEffect(spec: ArraySpec, phaseBits: number): QuantizationEffect {
  requireInteger('phaseBits', phaseBits, 1, 24);
  const ideal = principalPlaneMetrics(buildArrayModel({ ...spec, phaseBits: undefined }));
  const quantized = principalPlaneMetrics(buildArrayModel({ ...spec, phaseBits }));
  const dTheta = quantized.theta.peakOffsetDeg - ideal.theta.peakOffsetDeg;
  // A line's pattern is a cone about its axis: along the orthogonal plane the peak is not a point, so only the scan plane counts.
  const isLine = buildArrayModel(spec).lattice?.kind === 'line';
  const dPhi = isLine ? 0 : quantized.phi.peakOffsetDeg - ideal.phi.peakOffsetDeg;
  return {
    phaseBits,
    phaseStepDeg: 360 / 2 ** phaseBits,
    pointingErrorDeg: Math.hypot(dTheta, dPhi),
    peakSidelobeDb: worstSidelobe(isLine ? [ideal.theta] : [ideal.theta, ideal.phi]),
    quantizedPeakSidelobeDb: worstSidelobe(isLine ? [quantized.theta] : [quantized.theta, quantized.phi]),
  };
}
