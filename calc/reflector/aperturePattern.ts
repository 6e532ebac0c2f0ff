/**
 * Far-field pattern of a circularly symmetric aperture field by a numerical Hankel transform:
 *   F(u) = ∫_{t_b}^{1} E(t) J0(u t) t dt,   t = ρ/a,  u = k a sin θ,
 * tabulated once on Gauss–Legendre nodes and summed for each u. The pattern is real (the aperture
 * field is real and in phase), so nulls are sign changes and beam figures come from root-finding:
 * half-power and first null by Brent on F, the first sidelobe peak by Brent on dF/du.
 * Aperture-field (physical-optics) model: valid for apertures many wavelengths across, near the
 * main beam; no obliquity factor, no feed or strut scattering.
 */
import { CalcInputError, requireFinite, requireInRange } from '../errors';
import { besselJ0, besselJ1 } from '../numeric/besselJ';
import { brentRoot } from '../numeric/brentRoot';
import { compositeGaussLegendre } from '../numeric/gaussLegendre';

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
  /** u of the first sidelobe peak (null if no second null below uLimit). */
  firstSidelobeU: number | null;
  /** First sidelobe level relative to the peak, dB (negative). */
  firstSidelobeDb: number | null;
}

/** Step for bracketing sign changes of F(u): nulls of a circular aperture are about π apart. */
const BRACKET_STEP = 0.2;

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

/**
 * Half-power point, first null and first sidelobe of the tabulated aperture, in u = k a sin θ,
 * searching u up to uLimit (default 80). Returns null if the main beam has no null below uLimit.
 */
export function beamFigures(table: ApertureTable, uLimit = 80): BeamFigures | null {
  const firstNullU = nextNull(table, 1e-9, uLimit);
  if (firstNullU === null) return null;
  const halfPowerU = brentRoot((u) => apertureField(table, u) - Math.SQRT1_2, 0, firstNullU, 1e-12);
  const secondNullU = nextNull(table, firstNullU + 1e-6, uLimit);
  if (secondNullU === null) return { halfPowerU, firstNullU, firstSidelobeU: null, firstSidelobeDb: null };
  const slope = (u: number) => apertureFieldSlope(table, u);
  if (!(slope(firstNullU) * slope(secondNullU) < 0)) return { halfPowerU, firstNullU, firstSidelobeU: null, firstSidelobeDb: null };
  const firstSidelobeU = brentRoot(slope, firstNullU, secondNullU, 1e-12);
  const level = apertureField(table, firstSidelobeU);
  return { halfPowerU, firstNullU, firstSidelobeU, firstSidelobeDb: 20 * Math.log10(Math.abs(level)) };
}
