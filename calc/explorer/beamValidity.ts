/**
 * When the explorer's beam figures stop describing a beam at the steering direction (θ0, φ0):
 * the steering direction lies in or near a null of the element pattern, or the pattern's peak
 * has moved far from θ0. Thresholds are stated in the warning texts.
 */
import { elementLevelDb } from '../array/elementPeak';
import type { DirectionDeg, ElementPattern, PlaneMetrics } from '../array/index';
import { warning, type CalcWarning } from '../warnings';

/** The element pattern toward θ0 more than this many dB below its own peak counts as a null: beam figures are not shown. */
export const ELEMENT_NULL_DEPTH_DB = 20;

/** A pattern peak farther from θ0 than this fraction of the plane's HPBW flags the beam figures as outside validity. */
export const PEAK_OFFSET_LIMIT_HPBW = 0.5;

/** The explorer outputs that describe the main beam at (θ0, φ0). */
export const BEAM_OUTPUT_KEYS = ['directivityDbi', 'hpbwScanDeg', 'hpbwCrossDeg', 'fnbwScanDeg', 'fnbwCrossDeg', 'sidelobeDb', 'gratingLobeDb', 'peakOffsetDeg'] as const;

const angle = (deg: number) => `${Number(deg.toFixed(1))}°`;

/**
 * An outside-validity warning when the element pattern toward the steering direction is more than
 * ELEMENT_NULL_DEPTH_DB below its own peak (e.g. a cos θ element steered to θ0 = 90°). The caller
 * leaves every output in BEAM_OUTPUT_KEYS empty: no beam forms there, so a directivity of
 * −300 dBi or a beamwidth would describe rounding noise or a beam elsewhere. Null otherwise.
 */
export function elementNullWarning(element: ElementPattern, beam: DirectionDeg): CalcWarning | null {
  const levelDb = elementLevelDb(element, beam);
  if (levelDb >= -ELEMENT_NULL_DEPTH_DB) return null;
  const depth = levelDb < -100 ? 'at a null (more than 100 dB below its own peak)' : `${(-levelDb).toFixed(1)} dB below its own peak`;
  return warning(
    'beam-in-element-null',
    'outside-validity',
    `The element pattern toward the steering direction (θ₀ = ${angle(beam.thetaDeg)}, φ₀ = ${angle(beam.phiDeg)}) is ${depth}; more than ${ELEMENT_NULL_DEPTH_DB} dB down, the array forms no beam there. Directivity, beamwidths, sidelobe and grating-lobe levels and the peak offset are not shown: steer away from the element's null or choose another element.`,
    [...BEAM_OUTPUT_KEYS],
  );
}

/** A principal plane's figures with the explorer's name for the plane and its HPBW output key. */
export interface NamedPlane {
  metrics: PlaneMetrics;
  /** 'scan plane' or 'orthogonal plane'. */
  name: string;
}

/**
 * An outside-validity warning when, in a plane with a defined HPBW, the pattern's peak lies more
 * than PEAK_OFFSET_LIMIT_HPBW × HPBW from the steering direction: θ0 is then outside the half-power
 * beam, the beamwidths and sidelobe level describe the displaced beam and the directivity toward
 * θ0 is more than about 3 dB below the beam's peak. The values stay, flagged. Null otherwise.
 */
export function peakOffSteeringWarning(planes: NamedPlane[]): CalcWarning | null {
  const far = planes.filter(({ metrics: m }) => m.hpbwDeg !== undefined && Math.abs(m.peakOffsetDeg) > PEAK_OFFSET_LIMIT_HPBW * m.hpbwDeg);
  if (far.length === 0) return null;
  const where = far.map(({ metrics: m, name }) => `${angle(Math.abs(m.peakOffsetDeg))} from θ₀ in the ${name} (half its HPBW is ${angle(m.hpbwDeg! * PEAK_OFFSET_LIMIT_HPBW)})`).join(' and ');
  return warning(
    'beam-peak-off-steering',
    'outside-validity',
    `The pattern's peak lies ${where}: more than half the HPBW away, the steering direction is outside the half-power beam, so the element pattern, not the phase, decides where the beam points. The beamwidths and sidelobe level describe the displaced beam, and the directivity toward (θ₀, φ₀) is more than about 3 dB below its peak.`,
    BEAM_OUTPUT_KEYS.filter((key) => key !== 'peakOffsetDeg'),
  );
}

/** The values with every output in BEAM_OUTPUT_KEYS emptied (null, shown as "—") when blank is true; unchanged otherwise. */
export function withoutBeamFigures<T extends Record<string, number | null>>(values: T, blank: boolean): T {
  if (!blank) return values;
  const emptied: Record<string, number | null> = { ...values };
  for (const key of BEAM_OUTPUT_KEYS) if (key in emptied) emptied[key] = null;
  return emptied as T;
}
