/** The explorer's "highest grating lobe level": grating lobes reported apart from sidelobes. */
import { beamFrame, patternPowerAtDirections, type ArrayModel, type GratingLobe, type PlaneMetrics } from '../array/index';

/** Power of the total pattern at a plane's peak (the beam direction turned by the plane's peak offset). */
export function planePeakPower(model: ArrayModel, plane: PlaneMetrics): number {
  const [u0, thetaHat, phiHat] = beamFrame(model.beam);
  const e = plane.plane === 'theta' ? thetaHat : phiHat;
  const t = (plane.peakOffsetDeg * Math.PI) / 180;
  const c = Math.cos(t), s = Math.sin(t);
  return patternPowerAtDirections(model, [u0[0] * c + e[0] * s], [u0[1] * c + e[1] * s], [u0[2] * c + e[2] * s])[0];
}

/**
 * Highest grating lobe relative to the main-beam peak power, dB: the larger of the total pattern
 * (element pattern included) at each visible grating-lobe direction and the grating lobes the
 * principal-plane search met (which include a lobe centred just outside visible space that
 * reaches into it at the horizon). Null when there is none, or when the element pattern nulls
 * every one (all below −300 dB).
 */
export function highestGratingLobeDb(model: ArrayModel, lobes: GratingLobe[], planes: PlaneMetrics[], peakPower: number): number | null {
  let highest = -Infinity;
  if (lobes.length > 0 && peakPower > 0) {
    const u = lobes.map((l) => l.u), v = lobes.map((l) => l.v);
    const w = lobes.map((l) => Math.sqrt(Math.max(0, 1 - l.u * l.u - l.v * l.v)));
    const power = patternPowerAtDirections(model, u, v, w);
    for (const p of power) if (p > 0) highest = Math.max(highest, 10 * Math.log10(p / peakPower));
  }
  for (const plane of planes) if (plane.gratingLobeDb !== undefined) highest = Math.max(highest, plane.gratingLobeDb);
  return highest > -300 ? highest : null;
}

/** A level in dB as warning text: one decimal, a true minus sign, no "−0.0". */
export function levelText(db: number): string {
  const text = db.toFixed(1);
  return text === '-0.0' ? '0.0' : text.replace('-', '−');
}
