/**
 * Formulas shown on the backplane spacing page. Each evaluate calls the calc/backplane function
 * the calculator uses; each example is a worked value with its source.
 */
import { defineFormula } from './formula';
import { powerRatioToDbFloored } from './decibel';
import { radToDeg } from './angle';
import {
  backplaneImageFactorDb,
  backplaneRoundTripPhaseRad,
  broadsideBandHz,
  broadsideNullFrequencyHz,
  broadsideRippleDb,
  dipoleOverPlaneDirectivity,
  quarterWaveSpacingM,
} from './backplane/index';

/** h = λ0 / (4√εr). */
export const quarterWaveBackplaneFormula = defineFormula({
  id: 'backplane-quarter-wave',
  title: 'Quarter-wave backplane spacing in a spacer',
  latex: 'h_{\\lambda/4} = \\frac{\\lambda_0}{4\\sqrt{\\varepsilon_r}}',
  symbols: [
    { symbol: 'h_{\\lambda/4}', meaning: 'spacing between radiator and backplane', unit: 'm' },
    { symbol: '\\lambda_0', meaning: 'free-space wavelength at the design frequency', unit: 'm' },
    { symbol: '\\varepsilon_r', meaning: 'relative permittivity of the spacer (1 for air)', unit: '' },
  ],
  validity: 'Broadside, at the design frequency only; the reflected wave then returns in phase.',
  source: 'Common practice, no source (the quarter-wave rule); the wavelength λ0/√εr follows from the SI value of c.',
  argNames: ['frequencyHz', 'relativePermittivity'],
  evaluate: ({ frequencyHz, relativePermittivity }) => quarterWaveSpacingM(frequencyHz, relativePermittivity),
  example: { args: { frequencyHz: 5.8e9, relativePermittivity: 1 }, expected: 299792458 / 5.8e9 / 4, tolerance: 1e-15, source: 'c/(4f) at 5.8 GHz = 12.92 mm, hand-worked' },
});

/** Round-trip phase at broadside. */
export const backplanePhaseFormula = defineFormula({
  id: 'backplane-round-trip-phase',
  title: 'Phase of the reflected wave at broadside',
  latex: '\\Phi = k_s h + \\pi + k_s h,\\qquad k_s = \\frac{2\\pi\\sqrt{\\varepsilon_r}}{\\lambda_0}',
  symbols: [
    { symbol: '\\Phi', meaning: 'phase lag of the reflected wave behind the direct wave (shown in degrees)', unit: 'rad' },
    { symbol: 'k_s', meaning: 'wavenumber in the spacer', unit: 'rad/m' },
    { symbol: 'h', meaning: 'spacing', unit: 'm' },
    { symbol: '\\pi', meaning: 'phase reversal of the tangential E-field at the conductor', unit: 'rad' },
  ],
  validity: 'Normal incidence; Φ = 2π (in phase) at h = λ_s/4: π/2 + π + π/2.',
  source: 'Common practice, no source (quarter-wave phase arithmetic); the π at a perfect conductor: Balanis, Antenna Theory, 4th ed., §4.7 (section number from memory).',
  argNames: ['spacingM', 'frequencyHz', 'relativePermittivity'],
  evaluate: ({ spacingM, frequencyHz, relativePermittivity }) => radToDeg(backplaneRoundTripPhaseRad(spacingM, frequencyHz, relativePermittivity)),
  example: { args: { spacingM: 299792458 / 1e9 / 4, frequencyHz: 1e9, relativePermittivity: 1 }, expected: 360, tolerance: 1e-9, source: 'π/2 + π + π/2 = 2π (360°) at h = λ/4, hand-worked' },
});

/** Image factor in dB. */
export const backplaneImageFactorFormula = defineFormula({
  id: 'backplane-image-factor',
  title: 'Image factor of the backplane',
  latex: 'F_{\\mathrm{dB}} = 20\\log_{10}\\left|2\\sin\\!\\left(k_0 h\\sqrt{\\varepsilon_r - \\sin^2\\theta}\\right)\\right|',
  symbols: [
    { symbol: 'F_{\\mathrm{dB}}', meaning: 'field of radiator plus image relative to the radiator alone (+6.02 dB at best)', unit: 'dB' },
    { symbol: 'k_0', meaning: 'free-space wavenumber 2π/λ0', unit: 'rad/m' },
    { symbol: 'h', meaning: 'spacing', unit: 'm' },
    { symbol: '\\varepsilon_r', meaning: 'spacer relative permittivity', unit: '' },
    { symbol: '\\theta', meaning: 'angle from broadside in air', unit: '°' },
  ],
  validity: 'Infinite perfectly conducting plane, horizontal radiator. εr = 1: exact image theory. εr > 1: one ray through the spacer (Snell), surface reflections, Fresnel factors and surface waves ignored; exact phase at broadside.',
  source: 'Image theory, Balanis, Antenna Theory, 4th ed., §4.7 (section number from memory; horizontal dipole above ground: 2j sin(kh cos θ)); the spacer ray phase is our stated approximation.',
  argNames: ['spacingM', 'frequencyHz', 'relativePermittivity', 'thetaDeg'],
  evaluate: ({ spacingM, frequencyHz, relativePermittivity, thetaDeg }) => backplaneImageFactorDb(spacingM, frequencyHz, relativePermittivity, thetaDeg),
  example: { args: { spacingM: 299792458 / 1e9 / 8, frequencyHz: 1e9, relativePermittivity: 1, thetaDeg: 0 }, expected: 20 * Math.log10(2 * Math.sin(Math.PI / 4)), tolerance: 1e-12, source: 'h = λ/8: 20 log10(2 sin 45°) = 3.01 dB, hand-worked' },
});

/** Null frequency. */
export const backplaneNullFormula = defineFormula({
  id: 'backplane-null-frequency',
  title: 'Frequency at which the backplane cancels broadside',
  latex: 'f_{\\mathrm{null}} = \\frac{c}{2h\\sqrt{\\varepsilon_r}}',
  symbols: [
    { symbol: 'f_{\\mathrm{null}}', meaning: 'frequency at which h is half a spacer wavelength', unit: 'Hz' },
    { symbol: 'c', meaning: 'speed of light in vacuum', unit: 'm/s' },
    { symbol: 'h', meaning: 'spacing', unit: 'm' },
    { symbol: '\\varepsilon_r', meaning: 'spacer relative permittivity', unit: '' },
  ],
  validity: 'Broadside; the reflected wave then arrives in antiphase (Φ = 3π).',
  source: 'Image theory, Balanis, Antenna Theory, 4th ed., §4.7 (section number from memory; sin(kh) = 0 at h = λ/2).',
  argNames: ['spacingM', 'relativePermittivity'],
  evaluate: ({ spacingM, relativePermittivity }) => broadsideNullFrequencyHz(spacingM, relativePermittivity),
  example: { args: { spacingM: 0.0125, relativePermittivity: 4 }, expected: 299792458 / (2 * 0.0125 * 2), tolerance: 1e-3, source: 'c/(2 · 12.5 mm · 2) = 5.996 GHz, hand-worked' },
});

/** Band edges within X dB. */
export const backplaneBandFormula = defineFormula({
  id: 'backplane-band-edges',
  title: 'Band over which the broadside factor stays within X dB of its best',
  latex: 'f_{\\pm} = \\frac{2 f_q}{\\pi}\\begin{cases}\\pi - \\arcsin a\\\\ \\arcsin a\\end{cases},\\quad a = 10^{-X/20},\\quad f_q = \\frac{c}{4h\\sqrt{\\varepsilon_r}}',
  symbols: [
    { symbol: 'f_{\\pm}', meaning: 'upper and lower edge of the band', unit: 'Hz' },
    { symbol: 'f_q', meaning: 'frequency at which h is a quarter spacer wavelength', unit: 'Hz' },
    { symbol: 'X', meaning: 'allowed drop from the best broadside factor', unit: 'dB' },
    { symbol: 'h', meaning: 'spacing', unit: 'm' },
  ],
  validity: 'The broadside image factor alone; the radiator\'s own impedance and pattern change over the band are not included.',
  source: 'Solving 2|sin(k_s h)| = 2a for the image factor (Balanis, Antenna Theory, 4th ed., §4.7 (section number from memory)), hand-derived.',
  argNames: ['spacingM', 'relativePermittivity', 'withinDb', 'upper'],
  evaluate: ({ spacingM, relativePermittivity, withinDb, upper }) => {
    const band = broadsideBandHz(spacingM, relativePermittivity, withinDb);
    return upper ? band.highHz : band.lowHz;
  },
  example: { args: { spacingM: 299792458 / 1e9 / 4, relativePermittivity: 1, withinDb: 10 * Math.log10(2), upper: 0 }, expected: 0.5e9, tolerance: 1e-3, source: '3.01 dB down: sin x = 1/√2, x = π/4, f = f_q/2 = 0.5 GHz, hand-worked' },
});

/** Ripple across the band. */
export const backplaneRippleFormula = defineFormula({
  id: 'backplane-ripple',
  title: 'Broadside variation across the band',
  latex: '\\Delta = 20\\log_{10}\\frac{\\max_{f} |\\sin(k_s h)|}{\\min_{f} |\\sin(k_s h)|},\\quad f_{\\mathrm{lo}} \\le f \\le f_{\\mathrm{hi}}',
  symbols: [
    { symbol: '\\Delta', meaning: 'max − min of the broadside image factor across the band', unit: 'dB' },
    { symbol: 'k_s', meaning: 'wavenumber in the spacer', unit: 'rad/m' },
    { symbol: 'h', meaning: 'spacing', unit: 'm' },
    { symbol: 'f_{\\mathrm{lo}}', meaning: 'band low edge', unit: 'Hz' },
    { symbol: 'f_{\\mathrm{hi}}', meaning: 'band high edge', unit: 'Hz' },
  ],
  validity: 'Spacing below half a spacer wavelength at the band high edge; minimised over h by golden-section search for the flattest spacing (analytically λ_s/4 at (f_lo + f_hi)/2).',
  source: 'Image theory (Balanis, Antenna Theory, 4th ed., §4.7 (section number from memory)); the optimisation criterion is our choice.',
  argNames: ['spacingM', 'bandLowHz', 'bandHighHz', 'relativePermittivity'],
  evaluate: ({ spacingM, bandLowHz, bandHighHz, relativePermittivity }) => broadsideRippleDb(spacingM, bandLowHz, bandHighHz, relativePermittivity),
  example: { args: { spacingM: 299792458 / 1e9 / 4, bandLowHz: 0.5e9, bandHighHz: 1.5e9, relativePermittivity: 1 }, expected: 10 * Math.log10(2), tolerance: 1e-12, source: 'edges at x = π/4 and 3π/4: 20 log10(1/sin 45°) = 3.01 dB, hand-worked' },
});

/** Directivity of the dipole over the plane. */
export const dipoleOverPlaneFormula = defineFormula({
  id: 'dipole-over-plane-directivity',
  title: 'Broadside directivity of a dipole over the backplane',
  latex: 'D = \\frac{4\\pi\\,U(\\theta = 0)}{\\displaystyle\\int_0^{2\\pi}\\!\\!\\int_0^{\\pi/2} U\\,\\sin\\theta\\,d\\theta\\,d\\phi},\\quad U \\propto \\left|E_{\\mathrm{el}}\\,2\\sin(k h\\cos\\theta)\\right|^2',
  symbols: [
    { symbol: 'D', meaning: 'broadside directivity (shown in dBi)', unit: '' },
    { symbol: 'U', meaning: 'radiation intensity of dipole plus image', unit: 'W/sr' },
    { symbol: 'E_{\\mathrm{el}}', meaning: 'dipole field pattern: sin ψ (short) or cos((π/2) cos ψ)/sin ψ (half-wave)', unit: '' },
    { symbol: 'h', meaning: 'spacing, as h/λ in the spacer', unit: 'm' },
  ],
  validity: 'Infinite perfectly conducting plane; the medium above it is taken as uniform (εr > 1: the spacer-filled half-space, an approximation).',
  source: 'IEEE Std 145 definition; Gauss–Legendre quadrature checked against SciPy dblquad (scripts/fixtures/backplane.py) and Balanis, Antenna Theory, 4th ed., §4.7.2 (section number from memory; short dipole closed form).',
  argNames: ['heightWavelengths', 'halfWave'],
  evaluate: ({ heightWavelengths, halfWave }) => powerRatioToDbFloored(dipoleOverPlaneDirectivity(halfWave ? 'halfWave' : 'short', heightWavelengths), -100),
  example: { args: { heightWavelengths: 0.25, halfWave: 0 }, expected: 10 * Math.log10(4 / (2 / 3 + 1 / Math.PI ** 2)), tolerance: 1e-9, source: 'short dipole at λ/4: 4 sin²(kh)/R(kh) = 4/(2/3 + 1/π²), Balanis, Antenna Theory, 4th ed., §4.7.2 (section number from memory)' },
});
