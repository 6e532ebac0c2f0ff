/**
 * Scan loss of a planar phased array, split into its parts: projected aperture (cos θ), the
 * element factor beyond it, and impedance mismatch; and beam broadening with scan.
 */
import { degToRad, radToDeg } from './angle';
import { brentRoot } from './numeric/brentRoot';
import { requireInRange, requirePositive } from './errors';

/** Projected-aperture loss, dB (≤ 0): 10·log10(cos θ). */
export function projectedApertureLossDb(scanDeg: number): number {
  requireInRange('scanDeg', scanDeg, 0, 89.9, '°');
  return 10 * Math.log10(Math.cos(degToRad(scanDeg)));
}

/**
 * Element-factor loss beyond the projected aperture for a cosⁿθ embedded element power pattern,
 * dB (≤ 0 for n ≥ 1): 10·log10(cos^(n−1) θ). With n = 1 the element adds nothing beyond cos θ.
 */
export function cosineElementExtraLossDb(scanDeg: number, exponent: number): number {
  requireInRange('scanDeg', scanDeg, 0, 89.9, '°');
  requireInRange('exponent', exponent, 0, 20);
  return 10 * (exponent - 1) * Math.log10(Math.cos(degToRad(scanDeg)));
}

/**
 * Reflection magnitude of an ideal infinite current sheet matched at broadside, scanned to θ:
 * |Γ| = tan²(θ/2), in the E and H planes alike (radiation resistance ∝ cos θ or 1/cos θ).
 * Wheeler, "Simple relations derived from a phased-array antenna made of an infinite current
 * sheet", IEEE Trans. Antennas Propag. AP-13 (1965) 506–514.
 */
export function currentSheetReflectionMagnitude(scanDeg: number): number {
  requireInRange('scanDeg', scanDeg, 0, 89.9, '°');
  const t = Math.tan(degToRad(scanDeg) / 2);
  return t * t;
}

/** Mismatch loss of the ideal current sheet, dB (≤ 0): 10·log10(1 − |Γ|²). */
export function currentSheetMismatchLossDb(scanDeg: number): number {
  const gamma = currentSheetReflectionMagnitude(scanDeg);
  return 10 * Math.log10(1 - gamma * gamma);
}

export type ElementModel = 'cosine' | 'currentSheet';

export interface ScanLossParts {
  projectedDb: number;
  elementDb: number;
  mismatchDb: number;
  totalDb: number;
}

/** The scan loss split into its parts for the chosen element model (all dB, ≤ 0 in practice). */
export function scanLossPartsDb(scanDeg: number, model: ElementModel, cosineExponent: number): ScanLossParts {
  const projectedDb = projectedApertureLossDb(scanDeg);
  const elementDb = model === 'cosine' ? cosineElementExtraLossDb(scanDeg, cosineExponent) : 0;
  const mismatchDb = model === 'currentSheet' ? currentSheetMismatchLossDb(scanDeg) : 0;
  return { projectedDb, elementDb, mismatchDb, totalDb: projectedDb + elementDb + mismatchDb };
}

/** First-order beam broadening with scan: HPBW(θ0)/HPBW(0) ≈ 1/cos θ0 (away from end-fire). */
export function beamBroadeningFactor(scanDeg: number): number {
  requireInRange('scanDeg', scanDeg, 0, 89.9, '°');
  return 1 / Math.cos(degToRad(scanDeg));
}

/**
 * Power array factor of a uniform line of N isotropic elements at spacing d/λ steered to θ0,
 * at θ (both from broadside, in the scan plane): [sin(Nψ/2) / (N sin(ψ/2))]², ψ = 2π(d/λ)(sin θ − sin θ0).
 * Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory; normalized array factor of a uniform array).
 */
export function uniformLinePowerPattern(count: number, spacingWavelengths: number, scanRad: number, thetaRad: number): number {
  const psi = 2 * Math.PI * spacingWavelengths * (Math.sin(thetaRad) - Math.sin(scanRad));
  const half = psi / 2;
  const denominator = count * Math.sin(half);
  if (Math.abs(denominator) < 1e-12) return 1;
  const value = Math.sin(count * half) / denominator;
  return value * value;
}

/**
 * Scan-plane HPBW of a uniform line of N elements at d/λ steered to scanDeg, degrees, found by
 * Brent root-finding of AF²(θ) = ½ on each side of the beam; null when one side never falls to
 * half power in visible space (near end-fire).
 */
export function uniformLineHpbwDeg(count: number, spacingWavelengths: number, scanDeg: number): number | null {
  requireInRange('count', count, 2, 1e7);
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  requireInRange('scanDeg', scanDeg, 0, 89.9, '°');
  const scan = degToRad(scanDeg);
  const f = (theta: number) => uniformLinePowerPattern(count, spacingWavelengths, scan, theta) - 0.5;
  const guess = 0.886 / (count * spacingWavelengths * Math.max(Math.cos(scan), 0.05));
  const step = Math.max(guess / 8, 1e-7);
  const edge = (direction: 1 | -1): number | null => {
    let inner = scan;
    for (let k = 1; k < 100_000; k++) {
      let outer = scan + direction * k * step;
      const limit = direction === 1 ? Math.PI / 2 : -Math.PI / 2;
      if ((direction === 1 && outer >= limit) || (direction === -1 && outer <= limit)) {
        outer = limit;
        return f(outer) < 0 ? brentRoot(f, inner, outer, 1e-12) : null;
      }
      if (f(outer) < 0) return brentRoot(f, inner, outer, 1e-12);
      inner = outer;
    }
    return null;
  };
  const upper = edge(1);
  const lower = edge(-1);
  if (upper === null || lower === null) return null;
  return radToDeg(upper - lower);
}
