/**
 * Spillover, taper (illumination) and aperture efficiency of a front-fed paraboloid fed by the
 * cos^q ψ power pattern of feedPattern.ts, by Gauss–Legendre integration over the feed angle ψ.
 * With I1 = ∫0^ψ0 √P(ψ) tan(ψ/2) dψ, I2 = ∫0^ψ0 P(ψ) sin ψ dψ, Itot = ∫0^π/2 P(ψ) sin ψ dψ:
 *   spillover η_s = I2 / Itot,  taper η_t = 2 I1² / (tan²(ψ0/2) I2),  product η_s η_t.
 * (Balanis, Antenna Theory, 4th ed., §15.4.1 (section number from memory), eqs. for ε_s, ε_t, ε_ap; the aperture field of a
 * ray at ψ is ∝ √P(ψ)/r with r = f/cos²(ψ/2), ρ = 2f tan(ψ/2).)
 */
import { requireInRange } from '../errors';
import { integrateGaussLegendre } from '../numeric/gaussLegendre';
import { scanThenMinimize } from '../numeric/goldenMinimize';
import { feedPowerPattern, edgeTaperDb, MAX_POWER_EXPONENT } from './feedPattern';

/** Quadrature: 16-point Gauss–Legendre on 6 panels per interval (checked against SciPy quad). */
const ORDER = 16;
const PANELS = 6;

export interface IlluminationEfficiencies {
  /** Fraction of feed power intercepted by the reflector. */
  spillover: number;
  /** Directivity of the aperture field relative to a uniform one of the same size. */
  taper: number;
  /** spillover × taper. */
  aperture: number;
}

function checkArgs(powerExponent: number, rimHalfAngle: number): void {
  requireInRange('powerExponent', powerExponent, 0, MAX_POWER_EXPONENT);
  requireInRange('rimHalfAngleRad', rimHalfAngle, 1e-6, Math.PI / 2, 'rad');
}

/** ∫ P(ψ) sin ψ dψ over [from, to] for the cos^q power pattern. */
export function feedPowerIntegral(powerExponent: number, fromRad: number, toRad: number): number {
  return integrateGaussLegendre((psi) => feedPowerPattern(powerExponent, psi) * Math.sin(psi), fromRad, toRad, ORDER, PANELS);
}

/** ∫ √P(ψ) tan(ψ/2) dψ over [from, to]: proportional to the aperture-field integral ∫ E ρ dρ. */
export function apertureFieldIntegral(powerExponent: number, fromRad: number, toRad: number): number {
  return integrateGaussLegendre((psi) => Math.sqrt(feedPowerPattern(powerExponent, psi)) * Math.tan(psi / 2), fromRad, toRad, ORDER, PANELS);
}

/** Spillover, taper and their product for power exponent q and rim half-angle ψ0 (radians). */
export function illuminationEfficiencies(powerExponent: number, rimHalfAngle: number): IlluminationEfficiencies {
  checkArgs(powerExponent, rimHalfAngle);
  const intercepted = feedPowerIntegral(powerExponent, 0, rimHalfAngle);
  const total = intercepted + feedPowerIntegral(powerExponent, rimHalfAngle, Math.PI / 2);
  const fieldIntegral = apertureFieldIntegral(powerExponent, 0, rimHalfAngle);
  const t = Math.tan(rimHalfAngle / 2);
  const spillover = Math.min(1, intercepted / total);
  const taper = Math.min(1, (2 * fieldIntegral * fieldIntegral) / (t * t * intercepted));
  return { spillover, taper, aperture: spillover * taper };
}

/** Spillover efficiency (linear) for power exponent q and rim half-angle ψ0 (radians). */
export function spilloverEfficiency(powerExponent: number, rimHalfAngle: number): number {
  return illuminationEfficiencies(powerExponent, rimHalfAngle).spillover;
}

/** Taper (illumination) efficiency (linear) for power exponent q and rim half-angle ψ0 (radians). */
export function reflectorTaperEfficiency(powerExponent: number, rimHalfAngle: number): number {
  return illuminationEfficiencies(powerExponent, rimHalfAngle).taper;
}

export interface OptimumIllumination {
  powerExponent: number;
  /** Edge taper including space attenuation, dB. */
  edgeTaperDb: number;
  /** spillover × taper at the optimum. */
  efficiency: number;
}

/**
 * The cos^q feed that maximizes spillover × taper for rim half-angle ψ0 (radians): a scan over q
 * from 0 to the exponent giving a 40 dB feed fall-off at the rim (at least 12), then golden-section.
 */
export function optimumIllumination(rimHalfAngle: number): OptimumIllumination {
  requireInRange('rimHalfAngleRad', rimHalfAngle, 1e-3, Math.PI / 2, 'rad');
  const perUnitQDb = -10 * Math.log10(Math.cos(rimHalfAngle));
  const qMax = Math.min(MAX_POWER_EXPONENT, Math.max(12, 40 / perUnitQDb));
  const q = scanThenMinimize((x) => -illuminationEfficiencies(x, rimHalfAngle).aperture, 0, qMax, 24, 1e-6);
  return { powerExponent: q, edgeTaperDb: edgeTaperDb(q, rimHalfAngle), efficiency: illuminationEfficiencies(q, rimHalfAngle).aperture };
}
