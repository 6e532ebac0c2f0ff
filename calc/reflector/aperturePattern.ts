/**
 * Far-field pattern of a circularly symmetric aperture field by a numerical Hankel transform:
 *   F(u) = ∫_{t_b}^{1} E(t) J0(u t) t dt,   t = ρ/a,  u = k a sin θ,
 * tabulated once on Gauss–Legendre nodes and summed for each u. The pattern is real (the aperture
 * field is real and in phase), so nulls are sign changes and beam figures come from root-finding:
 * half-power and first null by Brent on F, sidelobe peaks by Brent on F·dF/du (see below).
 * Aperture-field (physical-optics) model: valid for apertures many wavelengths across, near the
 * main beam; no obliquity factor, no feed or strut scattering.
 *
 * Sidelobes are the local maxima of |F| past the first null. With a central blockage |F| can dip
 * without changing sign between two nulls, so a lobe between two nulls may hold more than one
 * maximum: the search samples |F| finely past the first null and refines each local maximum (Brent
 * on F·dF/du), rather than assuming one extremum of F between two nulls.
 */
import { CalcInputError, requireFinite, requireInRange } from '../errors';
import { besselJ0, besselJ1 } from '../numeric/besselJ';
import { brentRoot } from '../numeric/brentRoot';
import { compositeGaussLegendre } from '../numeric/gaussLegendre';
import { goldenMinimize } from '../numeric/goldenMinimize';

export interface ApertureTable {
  /** Normalized radii t_i in [t_b, 1]. */
  radii: Float64Array;
  /** E(t_i)·t_i·w_i. */
  weightedField: Float64Array;
  /** F(0), the on-axis value. */
  onAxis: number;
}

/**
 * Tabulates an aperture amplitude E(t) (t = ρ/a, real, ≥ 0) on [innerFraction, 1] with
 * `panels` × 16-point Gauss–Legendre panels (default 4).
 */
export function tabulateAperture(amplitude: (t: number) => number, innerFraction = 0, panels = 4): ApertureTable {
  requireInRange('innerFraction', innerFraction, 0, 1 - 1e-9);
  const { nodes, weights } = compositeGaussLegendre(innerFraction, 1, 16, panels);
  const weightedField = new Float64Array(nodes.length);
  let onAxis = 0;
  for (let i = 0; i < nodes.length; i++) {
    weightedField[i] = requireFinite('aperture amplitude', amplitude(nodes[i])) * nodes[i] * weights[i];
    onAxis += weightedField[i];
  }
  if (!(onAxis > 0)) throw new CalcInputError('amplitude', `expected an aperture field with a positive integral, got ${onAxis}`);
  return { radii: nodes, weightedField, onAxis };
}

/** Normalized far field F(u)/F(0) (real; negative in odd lobes). */
export function apertureField(table: ApertureTable, u: number): number {
  let sum = 0;
  for (let i = 0; i < table.radii.length; i++) sum += table.weightedField[i] * besselJ0(u * table.radii[i]);
  return sum / table.onAxis;
}

/** Derivative d/du of the normalized far field: −Σ E t² J1(u t) w / F(0). */
export function apertureFieldSlope(table: ApertureTable, u: number): number {
  let sum = 0;
  for (let i = 0; i < table.radii.length; i++) sum -= table.weightedField[i] * table.radii[i] * besselJ1(u * table.radii[i]);
  return sum / table.onAxis;
}

export interface BeamFigures {
  /** u at the half-power point (|F/F0|² = 1/2). */
  halfPowerU: number;
  /** u of the first null. */
  firstNullU: number;
  /** u of the first sidelobe peak: the first local maximum of |F| after the first null (null if none below the search limit). */
  firstSidelobeU: number | null;
  /** First sidelobe level relative to the peak, dB (negative). */
  firstSidelobeDb: number | null;
  /** u of the highest sidelobe peak past the first null, up to the sidelobe search limit. */
  highestSidelobeU: number | null;
  /** Highest sidelobe level relative to the peak, dB (negative). */
  highestSidelobeDb: number | null;
}

/** Step for bracketing sign changes of F(u): nulls of a circular aperture are about π apart. */
const BRACKET_STEP = 0.2;
/** Step of the scan for maxima of |F| past the first null; a lobe is about π wide in u. */
const SIDELOBE_SCAN_STEP = 0.05;

/** Next u > from where F changes sign, or null if none below uLimit. */
function nextNull(table: ApertureTable, from: number, uLimit: number): number | null {
  let a = from;
  let fa = apertureField(table, a);
  while (a < uLimit) {
    const b = Math.min(uLimit, a + BRACKET_STEP);
    const fb = apertureField(table, b);
    if (fa * fb <= 0) return fb === 0 ? b : brentRoot((u) => apertureField(table, u), a, b, 1e-12);
    a = b;
    fa = fb;
  }
  return null;
}

export interface SidelobePeak {
  /** u = k a sin θ of the peak. */
  u: number;
  /** Level relative to the main-beam peak, dB (negative). */
  levelDb: number;
}

/** Refines a maximum of |F| sampled at u0 with neighbours u0 ± step: Brent on F·dF/du, golden section if that bracket has no sign change. */
function refinePeak(table: ApertureTable, u0: number, step: number): SidelobePeak {
  const growth = (u: number) => apertureField(table, u) * apertureFieldSlope(table, u);
  const a = u0 - step;
  const b = u0 + step;
  const u = growth(a) > 0 && growth(b) < 0 ? brentRoot(growth, a, b, 1e-12) : goldenMinimize((x) => -Math.abs(apertureField(table, x)), a, b, 1e-12);
  return { u, levelDb: 20 * Math.log10(Math.abs(apertureField(table, u))) };
}

/**
 * First and highest local maxima of |F(u)| in (fromU, toU]: |F| sampled every `step` in u
 * (a lobe is about π wide), each candidate refined by refinePeak. fromU should be a null, so the
 * first maximum is the first sidelobe. Only candidates within 1 dB of the best sample are refined
 * for the highest (sampling at 0.05 costs well under 0.1 dB at a lobe peak).
 */
export function sidelobePeaks(table: ApertureTable, fromU: number, toU: number, step = SIDELOBE_SCAN_STEP): { first: SidelobePeak; highest: SidelobePeak } | null {
  requireInRange('step', step, 1e-4, 1);
  const candidates: { u: number; level: number }[] = [];
  let u0 = fromU;
  let v0 = Math.abs(apertureField(table, u0));
  let u1 = Math.min(toU, u0 + step);
  let v1 = Math.abs(apertureField(table, u1));
  while (u1 < toU) {
    const u2 = u1 + step;
    const v2 = Math.abs(apertureField(table, u2));
    if (v1 > v0 && v1 >= v2) candidates.push({ u: u1, level: v1 });
    u0 = u1; v0 = v1; u1 = u2; v1 = v2;
  }
  if (candidates.length === 0) return null;
  const first = refinePeak(table, candidates[0].u, step);
  const bestSample = Math.max(...candidates.map((c) => c.level));
  let highest = first;
  for (const c of candidates.slice(1)) {
    if (c.level < bestSample * 10 ** (-1 / 20)) continue;
    const peak = refinePeak(table, c.u, step);
    if (peak.levelDb > highest.levelDb) highest = peak;
  }
  return { first, highest };
}

/**
 * Half-power point, first null, first sidelobe (first local maximum of |F| after the first null)
 * and highest sidelobe of the tabulated aperture, in u = k a sin θ. Nulls and the half-power point
 * are searched up to uLimit (default 80, where the 64-node tabulation still resolves the
 * transform); sidelobes up to min(uLimit, sidelobeLimitU) (pass k a to keep to visible space).
 * Returns null if the main beam has no null below uLimit.
 */
export function beamFigures(table: ApertureTable, uLimit = 80, sidelobeLimitU = uLimit): BeamFigures | null {
  const firstNullU = nextNull(table, 1e-9, uLimit);
  if (firstNullU === null) return null;
  const halfPowerU = brentRoot((u) => apertureField(table, u) - Math.SQRT1_2, 0, firstNullU, 1e-12);
  const peaks = sidelobePeaks(table, firstNullU, Math.min(uLimit, sidelobeLimitU));
  if (peaks === null) return { halfPowerU, firstNullU, firstSidelobeU: null, firstSidelobeDb: null, highestSidelobeU: null, highestSidelobeDb: null };
  return {
    halfPowerU,
    firstNullU,
    firstSidelobeU: peaks.first.u,
    firstSidelobeDb: peaks.first.levelDb,
    highestSidelobeU: peaks.highest.u,
    highestSidelobeDb: peaks.highest.levelDb,
  };
}
