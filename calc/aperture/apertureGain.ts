/**
 * The aperture relation, in one place: the gain of an aperture of physical area A with aperture
 * efficiency η at wavelength λ is G = η·4πA/λ²; for a circular aperture of diameter D this is
 * G = η (πD/λ)². With η = 1 it is the directivity of a uniform, in-phase aperture with a forward
 * (one-sided) pattern; η collects the taper, spillover, phase, blockage and loss factors.
 * Sources: IEEE Std 145-2013 (aperture efficiency, gain); C. A. Balanis, Antenna Theory: Analysis
 * and Design, 4th ed., Wiley, 2016, §12.5 and §15.4 (each section number from memory); W. L. Stutzman
 * and G. A. Thiele, Antenna Theory and Design, 3rd ed., Wiley, 2012, ch. 7 (chapter number from memory).
 */
import { requireInRange, requirePositive } from '../errors';

/** Gain (linear) of an aperture of physical area areaM2 with aperture efficiency η: η·4πA/λ². */
export function apertureGainFromArea(areaM2: number, wavelengthM: number, apertureEfficiency = 1): number {
  requirePositive('areaM2', areaM2, 'm²');
  requirePositive('wavelengthM', wavelengthM, 'm');
  requireInRange('apertureEfficiency', apertureEfficiency, Number.MIN_VALUE, 1);
  return (apertureEfficiency * 4 * Math.PI * areaM2) / (wavelengthM * wavelengthM);
}

/** Physical area (m²) whose aperture gain is G (linear) at efficiency η: A = G·λ²/(4πη), the inverse of apertureGainFromArea. */
export function areaForGainM2(gain: number, wavelengthM: number, apertureEfficiency = 1): number {
  requirePositive('gain', gain);
  requirePositive('wavelengthM', wavelengthM, 'm');
  requireInRange('apertureEfficiency', apertureEfficiency, Number.MIN_VALUE, 1);
  return (gain * wavelengthM * wavelengthM) / (4 * Math.PI * apertureEfficiency);
}

/** Gain (linear) of a circular aperture of diameter D: η (πD/λ)² (= η·4πA/λ² with A = πD²/4). */
export function circularApertureGain(diameterM: number, wavelengthM: number, apertureEfficiency = 1): number {
  requirePositive('diameterM', diameterM, 'm');
  return apertureGainFromArea((Math.PI * diameterM * diameterM) / 4, wavelengthM, apertureEfficiency);
}

/** Gain in dBi of a circular aperture of diameter D with aperture efficiency η at wavelength λ. */
export function apertureGainDbi(apertureEfficiency: number, diameterM: number, wavelengthM: number): number {
  return 10 * Math.log10(circularApertureGain(diameterM, wavelengthM, apertureEfficiency));
}

/** Diameter in metres giving gain G (dBi) at a fixed efficiency: D = (λ/π)·√(G/η). */
export function diameterForGainM(gainDbi: number, apertureEfficiency: number, wavelengthM: number): number {
  requireInRange('gainDbi', gainDbi, -100, 200, 'dBi');
  requireInRange('apertureEfficiency', apertureEfficiency, Number.MIN_VALUE, 1);
  requirePositive('wavelengthM', wavelengthM, 'm');
  return (wavelengthM / Math.PI) * Math.sqrt(10 ** (gainDbi / 10) / apertureEfficiency);
}

/**
 * Aperture efficiency a circular aperture of diameter D must have to reach gain G (dBi):
 * η = G/(πD/λ)². Not range-checked: above 1 the gain is more than the aperture can give.
 */
export function efficiencyForGain(gainDbi: number, diameterM: number, wavelengthM: number): number {
  requireInRange('gainDbi', gainDbi, -100, 200, 'dBi');
  return 10 ** (gainDbi / 10) / circularApertureGain(diameterM, wavelengthM, 1);
}
