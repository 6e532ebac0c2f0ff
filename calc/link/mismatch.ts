/**
 * Impedance mismatch: VSWR ↔ |Γ| ↔ return loss ↔ mismatch loss. Realized gain = gain − mismatch loss
 * (IEEE Std 145-2013, "realized gain"). Pozar, Microwave Engineering, 4th ed. (2012), ch. 2 (chapter number from memory).
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative } from '../errors';

/** Largest |Γ| the page accepts (VSWR ≈ 2·10⁶): keeps every figure finite. */
const MAX_REFLECTION = 1 - 1e-6;

/** |Γ| from VSWR (≥ 1): (S − 1)/(S + 1). */
export function reflectionMagnitudeFromVswr(vswr: number): number {
  requireFinite('vswr', vswr);
  if (vswr < 1) throw new CalcInputError('vswr', `expected a VSWR ≥ 1 (1 is a perfect match), got ${vswr}`);
  return (vswr - 1) / (vswr + 1);
}

/** VSWR from |Γ| (0 ≤ |Γ| < 1): (1 + |Γ|)/(1 − |Γ|). */
export function vswrFromReflectionMagnitude(reflectionMagnitude: number): number {
  requireInRange('reflectionMagnitude', reflectionMagnitude, 0, MAX_REFLECTION);
  return (1 + reflectionMagnitude) / (1 - reflectionMagnitude);
}

/** Return loss in dB (≥ 0) from |Γ| (0 < |Γ| ≤ 1): −20·log10|Γ|. A perfect match (|Γ| = 0) has no finite return loss and is rejected. */
export function returnLossDbFromReflectionMagnitude(reflectionMagnitude: number): number {
  requireInRange('reflectionMagnitude', reflectionMagnitude, Number.MIN_VALUE, 1);
  return -20 * Math.log10(reflectionMagnitude);
}

/** |Γ| from a return loss in dB (≥ 0): 10^(−RL/20). */
export function reflectionMagnitudeFromReturnLossDb(returnLossDb: number): number {
  requireNonNegative('returnLossDb', returnLossDb, 'dB');
  return 10 ** (-returnLossDb / 20);
}

/** Mismatch loss in dB (≥ 0) from |Γ| (0 ≤ |Γ| < 1): −10·log10(1 − |Γ|²). */
export function mismatchLossDb(reflectionMagnitude: number): number {
  requireInRange('reflectionMagnitude', reflectionMagnitude, 0, MAX_REFLECTION);
  return 0 - 10 * Math.log10(1 - reflectionMagnitude * reflectionMagnitude); // 0 − 0 is +0: a match shows 0, not −0
}

/** Mismatch loss in dB from VSWR (≥ 1). */
export function mismatchLossFromVswrDb(vswr: number): number {
  return mismatchLossDb(reflectionMagnitudeFromVswr(vswr));
}
