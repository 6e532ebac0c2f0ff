/**
 * A conducting backplane behind a horizontal (dipole-like) radiator, by the image method.
 *
 * Model (stated on the page): the radiator sits on a spacer of relative permittivity εr and
 * thickness h over an infinite perfectly conducting plane. The wave reflected by the plane
 * travels through the spacer and back, so its phase lags by 2 k_s h cos θ_s plus π at the
 * conductor, with k_s = k0 √εr and θ_s the ray angle in the spacer (Snell: sin θ_s = sin θ/√εr).
 * The far field is the radiator's own field times the image factor
 *   |F| = |2 sin(k_s h cos θ_s)| = |2 sin(k0 h √(εr − sin² θ))|.
 * For εr = 1 this is the exact image factor (Balanis, "Antenna Theory", 4th ed., §4.7 (section number from memory)); for
 * εr > 1 it is a single-ray approximation: reflections at the spacer–air surface, the Fresnel
 * transmission factors and surface waves are ignored. At broadside (normal incidence) the phase
 * through the spacer is exact for that ray.
 */
import { CalcInputError, requireInRange, requirePositive } from '../errors';
import { degToRad } from '../angle';
import { powerRatioToDbFloored } from '../decibel';
import { SPEED_OF_LIGHT_M_PER_S } from '../constants';
import { mediumWavelengthM } from '../wavelength';
import { groundPlaneImageFactor } from '../array/imageFactor';
import { scanThenMinimize } from '../numeric/goldenMinimize';

/** Floor for image factors in dB, so a null never becomes −Infinity. */
export const IMAGE_FACTOR_FLOOR_DB = -60;

/** The usual backplane spacing: a quarter of the wavelength in the spacer, λ0/(4√εr), metres (common practice). */
export function quarterWaveSpacingM(frequencyHz: number, relativePermittivity: number): number {
  return mediumWavelengthM(frequencyHz, relativePermittivity) / 4;
}

/**
 * Phase (rad) of the wave reflected by the backplane relative to the direct wave, at broadside:
 * k_s h down + π at the conductor + k_s h back. For h = λ_s/4: π/2 + π + π/2 = 2π, so the
 * reflection adds in phase (common practice, no source: the quarter-wave rule).
 */
export function backplaneRoundTripPhaseRad(spacingM: number, frequencyHz: number, relativePermittivity: number): number {
  requirePositive('spacingM', spacingM, 'm');
  const oneWay = (2 * Math.PI * spacingM) / mediumWavelengthM(frequencyHz, relativePermittivity);
  return oneWay + Math.PI + oneWay;
}

/**
 * Image factor |F| (field, linear, 0…2) of a horizontal radiator at spacing h over the backplane
 * at frequency f, toward the air angle θ from broadside: |2 sin(k0 h √(εr − sin² θ))|, evaluated
 * with the array engine's groundPlaneImageFactor at the spacer's electrical height h/λ_s and
 * the spacer ray angle cos θ_s = √(1 − sin² θ/εr). See the model above.
 */
export function backplaneImageFactor(spacingM: number, frequencyHz: number, relativePermittivity: number, thetaDeg: number): number {
  requirePositive('spacingM', spacingM, 'm');
  requireInRange('thetaDeg', thetaDeg, 0, 90, '°');
  const heightInSpacerWavelengths = spacingM / mediumWavelengthM(frequencyHz, relativePermittivity);
  const sinTheta = Math.sin(degToRad(thetaDeg));
  const cosThetaSpacer = Math.sqrt(Math.max(0, 1 - (sinTheta * sinTheta) / relativePermittivity));
  return Math.abs(groundPlaneImageFactor(heightInSpacerWavelengths, cosThetaSpacer, 'horizontal'));
}

/** The image factor in dB (20 log10 |F|, floored at IMAGE_FACTOR_FLOOR_DB); +6.02 dB at best. */
export function backplaneImageFactorDb(spacingM: number, frequencyHz: number, relativePermittivity: number, thetaDeg: number): number {
  const factor = backplaneImageFactor(spacingM, frequencyHz, relativePermittivity, thetaDeg);
  return powerRatioToDbFloored(factor * factor, IMAGE_FACTOR_FLOOR_DB);
}

/** Frequency (Hz) at which spacing h is a quarter of the spacer wavelength: broadside factor at its best, +6.02 dB. */
export function bestBroadsideFrequencyHz(spacingM: number, relativePermittivity: number): number {
  requirePositive('spacingM', spacingM, 'm');
  requireInRange('relativePermittivity', relativePermittivity, 1, 1000);
  return SPEED_OF_LIGHT_M_PER_S / (4 * spacingM * Math.sqrt(relativePermittivity));
}

/** Frequency (Hz) at which the backplane cancels broadside: h = λ_s/2, twice the best frequency. */
export function broadsideNullFrequencyHz(spacingM: number, relativePermittivity: number): number {
  return 2 * bestBroadsideFrequencyHz(spacingM, relativePermittivity);
}

/**
 * Frequencies (Hz) between which the broadside image factor stays within withinDb of its best
 * (+6.02 dB), around the best frequency: 2|sin x| ≥ 2·10^(−withinDb/20) with x = k_s h, so
 * x from asin(a) to π − asin(a), a = 10^(−withinDb/20).
 */
export function broadsideBandHz(spacingM: number, relativePermittivity: number, withinDb: number): { lowHz: number; highHz: number } {
  requireInRange('withinDb', withinDb, 1e-6, 60, 'dB');
  const best = bestBroadsideFrequencyHz(spacingM, relativePermittivity);
  const x = Math.asin(10 ** (-withinDb / 20));
  // f is proportional to x: f = best · x/(π/2)
  return { lowHz: (best * x) / (Math.PI / 2), highHz: (best * (Math.PI - x)) / (Math.PI / 2) };
}

/**
 * Variation (max − min, dB) of the broadside image factor across the band [fLow, fHigh] for
 * spacing h. |sin x| is concave on (0, π), so the extremes are at the band edges or at the
 * peak x = π/2 when it lies inside. Throws when the band reaches the broadside null (h ≥ λ_s/2).
 */
export function broadsideRippleDb(spacingM: number, bandLowHz: number, bandHighHz: number, relativePermittivity: number): number {
  requirePositive('bandLowHz', bandLowHz, 'Hz');
  if (!(bandHighHz > bandLowHz)) throw new CalcInputError('bandHighHz', `expected a band high edge above the low edge (${bandLowHz} Hz), got ${bandHighHz} Hz`);
  const xOf = (f: number) => (2 * Math.PI * spacingM) / mediumWavelengthM(f, relativePermittivity);
  const xLow = xOf(bandLowHz), xHigh = xOf(bandHighHz);
  if (xHigh >= Math.PI) throw new CalcInputError('spacingM', 'expected a spacing below half a spacer wavelength at the band high edge (the broadside null would fall in the band)');
  const sLow = Math.sin(xLow), sHigh = Math.sin(xHigh);
  const max = xLow <= Math.PI / 2 && xHigh >= Math.PI / 2 ? 1 : Math.max(sLow, sHigh);
  const min = Math.min(sLow, sHigh);
  return 20 * Math.log10(max / min);
}

/**
 * The spacing (m) with the flattest broadside image factor across [fLow, fHigh]: minimises
 * broadsideRippleDb over 0 < h < λ_s(fHigh)/2 by a scan then golden-section search
 * (calc/numeric). Analytically the optimum is λ_s/4 at the arithmetic band centre (fLow + fHigh)/2,
 * where sin x is equal at both edges; the tests check the search against that.
 */
export function flattestSpacingM(bandLowHz: number, bandHighHz: number, relativePermittivity: number): number {
  requirePositive('bandLowHz', bandLowHz, 'Hz');
  if (!(bandHighHz > bandLowHz)) throw new CalcInputError('bandHighHz', `expected a band high edge above the low edge (${bandLowHz} Hz), got ${bandHighHz} Hz`);
  const upper = mediumWavelengthM(bandHighHz, relativePermittivity) / 2;
  return scanThenMinimize((h) => broadsideRippleDb(h, bandLowHz, bandHighHz, relativePermittivity), upper * 1e-3, upper * (1 - 1e-6), 200, 1e-13);
}
