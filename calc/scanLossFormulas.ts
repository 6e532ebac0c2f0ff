import { defineFormula } from './formula';
import { beamBroadeningFactor, currentSheetMismatchLossDb, scanLossPartsDb } from './scanLoss';

export const cosineScanLossFormula = defineFormula({
  id: 'scan-loss-cosine-element',
  title: 'Scan loss with an embedded element power pattern cosⁿθ',
  latex: '\\Delta G(\\theta_0) = 10\\log_{10}\\cos\\theta_0 + 10\\,(n-1)\\log_{10}\\cos\\theta_0 = 10\\,n\\log_{10}\\cos\\theta_0',
  symbols: [
    { symbol: '\\Delta G(\\theta_0)', meaning: 'realized-gain change at scan angle θ0 relative to broadside: projected aperture (directivity) plus the element factor beyond it', unit: 'dB' },
    { symbol: '\\theta_0', meaning: 'scan angle from broadside', unit: '°' },
    { symbol: 'n', meaning: 'exponent of the embedded element power pattern cosⁿθ (power, not field; n = 1: projected aperture only; n ≥ 1 for a large array)', unit: '' },
  ],
  validity: 'Large arrays (every element sees the same surroundings), no grating lobe in visible space; the cosⁿ law is a fit to measured or simulated embedded patterns, not a derivation.',
  source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory; projected aperture and element pattern); exponent fits are common practice.',
  argNames: ['scanDeg', 'cosineExponent'],
  evaluate: ({ scanDeg, cosineExponent }) => scanLossPartsDb(scanDeg, 'cosine', cosineExponent).totalDb,
  example: { args: { scanDeg: 60, cosineExponent: 1 }, expected: 10 * Math.log10(0.5), tolerance: 1e-12, source: 'cos 60° = 0.5 → −3.01 dB, hand-worked' },
});

export const currentSheetFormula = defineFormula({
  id: 'scan-loss-current-sheet',
  title: 'Scan mismatch of an ideal infinite current sheet',
  latex: '|\\Gamma(\\theta_0)| = \\tan^2\\frac{\\theta_0}{2},\\qquad \\Delta G_{\\mathrm{mm}} = 10\\log_{10}\\left(1 - |\\Gamma|^2\\right)',
  symbols: [
    { symbol: '|\\Gamma(\\theta_0)|', meaning: 'reflection magnitude at scan angle θ0, matched at broadside', unit: '' },
    { symbol: '\\theta_0', meaning: 'scan angle from broadside', unit: '°' },
    { symbol: '\\Delta G_{\\mathrm{mm}}', meaning: 'mismatch loss', unit: 'dB' },
  ],
  validity: 'An ideal, infinitely large current sheet matched at broadside; real arrays differ, especially near scan blindness or with dielectric layers.',
  source: 'H. A. Wheeler, IEEE Trans. Antennas Propag. AP-13 (1965) 506–514.',
  argNames: ['scanDeg'],
  evaluate: ({ scanDeg }) => currentSheetMismatchLossDb(scanDeg),
  example: { args: { scanDeg: 60 }, expected: 10 * Math.log10(8 / 9), tolerance: 1e-12, source: 'hand-worked: |Γ| = tan²30° = 1/3, 1 − |Γ|² = 8/9 → −0.51 dB' },
});

export const beamBroadeningFormula = defineFormula({
  id: 'beam-broadening',
  title: 'Beam broadening with scan',
  latex: '\\theta_{3\\mathrm{dB}}(\\theta_0) \\approx \\frac{\\theta_{3\\mathrm{dB}}(0)}{\\cos\\theta_0}',
  symbols: [
    { symbol: '\\theta_{3\\mathrm{dB}}(\\theta_0)', meaning: 'half-power beamwidth in the scan plane at scan angle θ0', unit: '°' },
    { symbol: '\\theta_0', meaning: 'scan angle from broadside', unit: '°' },
  ],
  validity: 'Long arrays, away from end-fire (the law fails within a beamwidth or so of the horizon; the calculator also computes the pattern).',
  source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §1.1 (section number from memory); Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory).',
  argNames: ['scanDeg'],
  evaluate: ({ scanDeg }) => beamBroadeningFactor(scanDeg),
  example: { args: { scanDeg: 60 }, expected: 2, tolerance: 1e-12, source: '1/cos 60° = 2, hand-worked' },
});
