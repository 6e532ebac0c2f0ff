import { degToRad, radToDeg } from '../angle';
import { requireInRange } from '../errors';
import { brentRoot } from '../numeric/brentRoot';
import { goldenMinimize } from '../numeric/goldenMinimize';
import type { CalcWarning } from '../warnings';
import { warning } from '../warnings';
import { arrayDiameterWavelengths } from './geometry';
import { distanceFromMainBeam, distanceToGratingLobe } from './gratingLobes';
import { patternPowerAtDirections } from './patternPower';
import type { ArrayModel, DirectionDeg } from './types';

/** Figures of merit of the main beam in one principal plane (angles in degrees, levels in dB). */
export interface PlaneMetrics {
  /** 'theta': the plane φ = φ0 through the beam (θ varies); 'phi': the orthogonal plane through the beam. */
  plane: 'theta' | 'phi';
  /** Angle from the beam direction to the pattern peak in this plane (signed, toward +θ̂ or +φ̂). */
  peakOffsetDeg: number;
  /** Half-power beamwidth (−3.01 dB points found by Brent's method), undefined if the pattern never drops to half power. */
  hpbwDeg?: number;
  /** First-null beamwidth (minima on each side found by golden-section search), undefined if none. */
  fnbwDeg?: number;
  /** Highest sidelobe relative to the peak (negative dB), undefined if there is none. Grating lobes are not sidelobes: see gratingLobeDb. */
  peakSidelobeDb?: number;
  /** Angle of that sidelobe from the beam direction in this plane. */
  peakSidelobeOffsetDeg?: number;
  /**
   * Highest grating lobe met in this plane relative to the peak (dB), for arrays on a lattice: a
   * maximum closer to a grating-lobe centre û0 + p·b1 + q·b2 than the main beam's first null is to
   * û0. Includes a lobe whose centre lies just outside visible space but which reaches into it at
   * the horizon. Undefined if the plane meets none.
   */
  gratingLobeDb?: number;
  /** Angle of that grating lobe from the beam direction in this plane. */
  gratingLobeOffsetDeg?: number;
}

/** Options of principalPlaneMetrics. */
export interface BeamMetricsOptions {
  /** Beam direction, degrees (default the model's beam). */
  direction?: DirectionDeg;
  /** 'forward' (default) looks for sidelobes only in the half space z ≥ 0, where an x–y array's mirror beam is excluded; 'sphere' everywhere. */
  sidelobeRegion?: 'forward' | 'sphere';
  /** Only HPBW and FNBW: skip the sidelobe search (much faster for large sparse arrays). */
  beamwidthOnly?: boolean;
}

type Vector = [number, number, number];

/** Power along the great circle û(t) = û0 cos t + ê sin t through the beam. */
function planeEvaluator(model: ArrayModel, u0: Vector, e: Vector): (ts: ArrayLike<number>) => { power: Float64Array; w: Float64Array } {
  return (ts) => {
    const n = ts.length;
    const u = new Float64Array(n), v = new Float64Array(n), w = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const c = Math.cos(ts[i]), s = Math.sin(ts[i]);
      u[i] = u0[0] * c + e[0] * s; v[i] = u0[1] * c + e[1] * s; w[i] = u0[2] * c + e[2] * s;
    }
    return { power: patternPowerAtDirections(model, u, v, w), w };
  };
}

/** Walks outward from t0 in steps of size step·sign; returns the half-power crossing and the first minimum. */
function walkOutward(at: (t: number) => number, evaluate: (ts: ArrayLike<number>) => { power: Float64Array }, t0: number, peak: number, step: number, sign: 1 | -1): { half?: number; null?: number } {
  const chunk = 64;
  let previousT = t0, previousP = peak;
  let beforePreviousT = t0;
  let half: number | undefined;
  let falling = false;
  for (let k = 1; k * step <= Math.PI + step; k += chunk) {
    const ts = Float64Array.from({ length: chunk }, (_, i) => t0 + sign * Math.min(Math.PI, (k + i) * step));
    const { power } = evaluate(ts);
    for (let i = 0; i < chunk; i++) {
      const t = ts[i], p = power[i];
      if (half === undefined && p < peak / 2) {
        half = brentRoot((x) => at(x) / peak - 0.5, previousT, t, 1e-13 * (1 + Math.abs(t)));
      }
      if (p < previousP) falling = true;
      else if (falling && p > previousP) {
        const lo = Math.min(beforePreviousT, t), hi = Math.max(beforePreviousT, t);
        const minimum = goldenMinimize(at, lo, hi, 1e-12);
        return { half, null: minimum };
      }
      beforePreviousT = previousT;
      previousT = t;
      previousP = p;
      if (Math.abs(t - t0) >= Math.PI) return { half };
    }
  }
  return { half };
}

/**
 * Refines a pattern maximum near t found by golden-section search: golden-section search on a
 * flat peak stops near √ε of the beamwidth, so the peak is taken as the root (Brent) of the
 * five-point central-difference slope 8[P(t + h) − P(t − h)] − [P(t + 2h) − P(t − 2h)], h = 1e-5·scale,
 * whose bias is O(h⁴). When that slope is zero at
 * t = 0 within rounding and P(0) is as high as P(t) (a beam symmetric about the steering
 * direction, or flat), the peak is exactly 0.
 */
function refinePeak(at: (t: number) => number, t: number, scale: number): number {
  const h = 1e-5 * scale;
  const slope = (x: number) => 8 * (at(x + h) - at(x - h)) - (at(x + 2 * h) - at(x - 2 * h));
  const atZero = at(0);
  if (Math.abs(slope(0)) <= 32 * Number.EPSILON * atZero && atZero >= at(t) * (1 - 1e-12)) return 0;
  const a = t - 0.01 * scale, b = t + 0.01 * scale;
  const fa = slope(a), fb = slope(b);
  if (!(fa > 0 && fb < 0)) return t;
  return brentRoot(slope, a, b, 1e-15 * (1 + Math.abs(t)));
}

/** Great-circle parameters t in [start, start + span] where the circle crosses the horizon w = 0. */
function horizonCrossings(u0: Vector, e: Vector, start: number, span: number): number[] {
  if (u0[2] === 0 && e[2] === 0) return []; // the whole circle lies in the horizon plane
  const first = Math.atan2(-u0[2], e[2]);
  const crossings: number[] = [];
  for (let k = -4; k <= 4; k++) {
    const t = first + (k * Math.PI);
    if (t > start && t < start + span) crossings.push(t);
  }
  return crossings;
}

function planeMetrics(model: ArrayModel, plane: 'theta' | 'phi', u0: Vector, e: Vector, region: 'forward' | 'sphere', beamwidthOnly = false): PlaneMetrics {
  const evaluate = planeEvaluator(model, u0, e);
  const at = (t: number) => evaluate([t]).power[0];
  const tau = 1 / (arrayDiameterWavelengths(model.positionsWavelengths) + 1);
  // Peak: best of a fine scan within ±2τ, refined by golden-section search.
  const scan = Float64Array.from({ length: 65 }, (_, i) => -2 * tau + (4 * tau * i) / 64);
  const scanned = evaluate(scan).power;
  let best = 32;
  for (let i = 0; i < scan.length; i++) if (scanned[i] > scanned[best]) best = i;
  const tPeak = refinePeak(at, goldenMinimize((t) => -at(t), scan[Math.max(0, best - 1)], scan[Math.min(64, best + 1)], 1e-13), tau);
  const peak = at(tPeak);
  const result: PlaneMetrics = { plane, peakOffsetDeg: radToDeg(tPeak) };
  if (!(peak > 0)) return result;
  const step = tau / 16;
  const right = walkOutward(at, evaluate, tPeak, peak, step, 1);
  const left = walkOutward(at, evaluate, tPeak, peak, step, -1);
  if (right.half !== undefined && left.half !== undefined) result.hpbwDeg = radToDeg(right.half - left.half);
  if (right.null === undefined || left.null === undefined) return result;
  result.fnbwDeg = radToDeg(right.null - left.null);
  if (beamwidthOnly) return result;
  // Sidelobes: scan the rest of the great circle, refine the largest local maxima. In the forward
  // region the horizon points (w = 0) count too: a lobe may peak exactly there.
  const start = right.null, span = 2 * Math.PI - (right.null - left.null);
  const count = Math.min(400_000, Math.ceil((2 * Math.PI) / (tau / 6)));
  const ts = Float64Array.from({ length: count }, (_, i) => start + (span * i) / (count - 1));
  const { power, w } = evaluate(ts);
  const candidates: Array<{ t: number; p: number; refine?: [number, number] }> = [];
  for (let i = 1; i < count - 1; i++) {
    if (region === 'forward' && (w[i - 1] < 0 || w[i] < 0 || w[i + 1] < 0)) continue;
    if (power[i] >= power[i - 1] && power[i] >= power[i + 1] && power[i] > 0) candidates.push({ t: ts[i], p: power[i], refine: [ts[i - 1], ts[i + 1]] });
  }
  if (region === 'forward') {
    for (const t of horizonCrossings(u0, e, start, span)) {
      const p = at(t);
      const inward = Math.min(count - 1, Math.max(0, Math.round(((t - start) / span) * (count - 1))));
      const neighbour = [inward - 1, inward, inward + 1].filter((i) => i >= 0 && i < count && w[i] > 0 && Math.abs(ts[i] - t) > 1e-15);
      if (p > 0 && neighbour.every((i) => p >= power[i])) candidates.push({ t, p });
    }
  }
  candidates.sort((a, b) => b.p - a.p);
  const lattice = model.lattice?.vectorsWavelengths;
  const beamUv: [number, number] = [u0[0], u0[1]];
  const uvAt = (t: number): [number, number] => [u0[0] * Math.cos(t) + e[0] * Math.sin(t), u0[1] * Math.cos(t) + e[1] * Math.sin(t)];
  const mainBeamRadius = lattice ? Math.max(distanceFromMainBeam(lattice, beamUv, uvAt(right.null)), distanceFromMainBeam(lattice, beamUv, uvAt(left.null))) : 0;
  const isGratingLobe = (t: number) => lattice !== undefined && distanceToGratingLobe(lattice, beamUv, uvAt(t)) < mainBeamRadius;
  const highest = { sidelobe: { p: 0, t: 0, refined: 0 }, grating: { p: 0, t: 0, refined: 0 } };
  for (const candidate of candidates) {
    const kind = isGratingLobe(candidate.t) ? highest.grating : highest.sidelobe;
    if (kind.refined >= 4) continue;
    kind.refined++;
    let { t, p } = candidate;
    if (candidate.refine) {
      const refined = goldenMinimize((x) => -at(x), candidate.refine[0], candidate.refine[1], 1e-12);
      const pRefined = at(refined);
      if (pRefined > p) { t = refined; p = pRefined; }
    }
    if (p > kind.p) { kind.p = p; kind.t = t; }
  }
  const wrapDeg = (t: number) => radToDeg(((t + Math.PI) % (2 * Math.PI) + 2 * Math.PI) % (2 * Math.PI) - Math.PI);
  if (highest.sidelobe.p > 0) {
    result.peakSidelobeDb = 10 * Math.log10(highest.sidelobe.p / peak);
    result.peakSidelobeOffsetDeg = wrapDeg(highest.sidelobe.t);
  }
  if (highest.grating.p > 0) {
    result.gratingLobeDb = 10 * Math.log10(highest.grating.p / peak);
    result.gratingLobeOffsetDeg = wrapDeg(highest.grating.t);
  }
  return result;
}

/** Unit vectors (û0, θ̂, φ̂) at a direction in degrees. */
export function beamFrame(direction: DirectionDeg): [Vector, Vector, Vector] {
  const theta = degToRad(direction.thetaDeg), phi = degToRad(direction.phiDeg);
  const st = Math.sin(theta), ct = Math.cos(theta), sp = Math.sin(phi), cp = Math.cos(phi);
  return [[st * cp, st * sp, ct], [ct * cp, ct * sp, -st], [-sp, cp, 0]];
}

/**
 * HPBW, FNBW and peak sidelobe level of the total pattern in the two principal planes through
 * the beam: the φ = φ0 plane ('theta') and the orthogonal plane ('phi'). Beam edges are found
 * by root-finding on the pattern (Brent), nulls and peaks by golden-section search, not read
 * from a grid.
 */
export function principalPlaneMetrics(model: ArrayModel, options: BeamMetricsOptions = {}): { theta: PlaneMetrics; phi: PlaneMetrics; warnings: CalcWarning[] } {
  const direction = options.direction ?? model.beam;
  requireInRange('direction.thetaDeg', direction.thetaDeg, 0, 180, '°');
  const [u0, thetaHat, phiHat] = beamFrame(direction);
  const region = options.sidelobeRegion ?? 'forward';
  const theta = planeMetrics(model, 'theta', u0, thetaHat, region, options.beamwidthOnly);
  const phi = planeMetrics(model, 'phi', u0, phiHat, region, options.beamwidthOnly);
  const warnings: CalcWarning[] = [];
  for (const m of [theta, phi]) {
    if (m.hpbwDeg === undefined) warnings.push(warning('no-half-power-point', 'note', `The pattern does not fall to half power in the ${m.plane} plane, so its HPBW is undefined.`, [`${m.plane}.hpbwDeg`]));
  }
  return { theta, phi, warnings };
}
