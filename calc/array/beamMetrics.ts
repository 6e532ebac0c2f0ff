import { degToRad, radToDeg } from '../angle';
import { requireInRange } from '../errors';
import { brentRoot } from '../numeric/brentRoot';
import { goldenMinimize } from '../numeric/goldenMinimize';
import type { CalcWarning } from '../warnings';
import { warning } from '../warnings';
import { arrayDiameterWavelengths } from './geometry';
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
  /** Highest sidelobe relative to the peak (negative dB), undefined if there is none. */
  peakSidelobeDb?: number;
  /** Angle of that sidelobe from the beam direction in this plane. */
  peakSidelobeOffsetDeg?: number;
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

function planeMetrics(model: ArrayModel, plane: 'theta' | 'phi', u0: Vector, e: Vector, region: 'forward' | 'sphere', beamwidthOnly = false): PlaneMetrics {
  const evaluate = planeEvaluator(model, u0, e);
  const at = (t: number) => evaluate([t]).power[0];
  const tau = 1 / (arrayDiameterWavelengths(model.positionsWavelengths) + 1);
  // Peak: best of a fine scan within ±2τ, refined by golden-section search.
  const scan = Float64Array.from({ length: 65 }, (_, i) => -2 * tau + (4 * tau * i) / 64);
  const scanned = evaluate(scan).power;
  let best = 32;
  for (let i = 0; i < scan.length; i++) if (scanned[i] > scanned[best]) best = i;
  const tPeak = goldenMinimize((t) => -at(t), scan[Math.max(0, best - 1)], scan[Math.min(64, best + 1)], 1e-13);
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
  // Sidelobes: scan the rest of the great circle, refine the largest local maxima.
  const count = Math.min(400_000, Math.ceil((2 * Math.PI) / (tau / 6)));
  const ts = Float64Array.from({ length: count }, (_, i) => right.null! + ((2 * Math.PI - (right.null! - left.null!)) * i) / (count - 1));
  const { power, w } = evaluate(ts);
  const candidates: number[] = [];
  for (let i = 1; i < count - 1; i++) {
    if (region === 'forward' && (w[i - 1] < 0 || w[i] < 0 || w[i + 1] < 0)) continue;
    if (power[i] >= power[i - 1] && power[i] >= power[i + 1] && power[i] > 0) candidates.push(i);
  }
  candidates.sort((a, b) => power[b] - power[a]);
  let sidelobe = 0, sidelobeT = 0;
  for (const i of candidates.slice(0, 4)) {
    const t = goldenMinimize((x) => -at(x), ts[i - 1], ts[i + 1], 1e-12);
    const p = Math.max(at(t), power[i]);
    if (p > sidelobe) { sidelobe = p; sidelobeT = t; }
  }
  if (sidelobe > 0) {
    result.peakSidelobeDb = 10 * Math.log10(sidelobe / peak);
    const wrapped = ((sidelobeT + Math.PI) % (2 * Math.PI) + 2 * Math.PI) % (2 * Math.PI) - Math.PI;
    result.peakSidelobeOffsetDeg = radToDeg(wrapped);
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
