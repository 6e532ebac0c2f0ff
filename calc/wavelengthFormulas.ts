import { defineFormula } from './formula';
import { mediumWavelengthM } from './wavelength';
import { gratingLobeOnsetScanDeg, maxGratingFreeSpacingWavelengths } from './gratingLobeLimit';
import { elementCountEstimate } from './elementCount';

/** λ = c / (f √εr). */
export const wavelengthFormula = defineFormula({
  id: 'wavelength',
  title: 'Wavelength in a medium',
  latex: '\\lambda = \\frac{c}{f\\,\\sqrt{\\varepsilon_r}}',
  symbols: [
    { symbol: '\\lambda', meaning: 'wavelength in the medium', unit: 'm' },
    { symbol: 'c', meaning: 'speed of light in vacuum, 299 792 458 (exact)', unit: 'm/s' },
    { symbol: 'f', meaning: 'frequency', unit: 'Hz' },
    { symbol: '\\varepsilon_r', meaning: 'relative permittivity of a lossless, non-magnetic medium (1 for free space)', unit: '' },
  ],
  validity: 'Plane wave in a homogeneous, lossless, non-magnetic medium (μr = 1).',
  source: 'SI Brochure, 9th ed. (BIPM 2019): c is exact by the definition of the metre.',
  argNames: ['frequencyHz', 'relativePermittivity'],
  evaluate: ({ frequencyHz, relativePermittivity }) => mediumWavelengthM(frequencyHz, relativePermittivity),
  example: { args: { frequencyHz: 10e9, relativePermittivity: 1 }, expected: 0.0299792458, tolerance: 1e-15, source: 'c/f with c exact (SI)' },
});

/** Rectangular lattice: d/λ ≤ 1/(1 + sin θmax). */
export const rectangularSpacingLimitFormula = defineFormula({
  id: 'grating-free-spacing-rectangular',
  title: 'Grating-lobe-free spacing, rectangular lattice',
  latex: '\\frac{d}{\\lambda_0} \\le \\frac{1}{1 + \\sin\\theta_{\\max}}',
  symbols: [
    { symbol: 'd', meaning: 'element spacing along a lattice axis', unit: 'm' },
    { symbol: '\\lambda_0', meaning: 'free-space wavelength at the highest frequency', unit: 'm' },
    { symbol: '\\theta_{\\max}', meaning: 'largest scan angle from broadside', unit: '°' },
  ],
  validity: 'Uniform lattice, all scan planes; the grating lobe is just at the horizon at the limit, so designs keep a margin below it.',
  source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory); Skolnik, Radar Handbook, 3rd ed., ch. 13 (chapter number from memory).',
  argNames: ['scanMaxDeg'],
  evaluate: ({ scanMaxDeg }) => maxGratingFreeSpacingWavelengths(scanMaxDeg, 'rectangular'),
  example: { args: { scanMaxDeg: 30 }, expected: 2 / 3, tolerance: 1e-12, source: '1/(1 + sin 30°) = 2/3, hand-worked' },
});

/** Equilateral triangular lattice: d/λ ≤ (2/√3)/(1 + sin θmax). */
export const triangularSpacingLimitFormula = defineFormula({
  id: 'grating-free-spacing-triangular',
  title: 'Grating-lobe-free spacing, equilateral triangular lattice',
  latex: '\\frac{d}{\\lambda_0} \\le \\frac{2/\\sqrt{3}}{1 + \\sin\\theta_{\\max}}',
  symbols: [
    { symbol: 'd', meaning: 'nearest-neighbour element spacing', unit: 'm' },
    { symbol: '\\lambda_0', meaning: 'free-space wavelength at the highest frequency', unit: 'm' },
    { symbol: '\\theta_{\\max}', meaning: 'largest scan angle from broadside, worst scan plane', unit: '°' },
  ],
  validity: 'Equilateral triangular lattice, worst scan plane (towards a reciprocal-lattice vector).',
  source: 'Reciprocal-lattice condition |û₀ − λg| ≥ 1 with |g| = 2/(√3 d); Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory).',
  argNames: ['scanMaxDeg'],
  evaluate: ({ scanMaxDeg }) => maxGratingFreeSpacingWavelengths(scanMaxDeg, 'triangular'),
  example: { args: { scanMaxDeg: 30 }, expected: (2 / Math.sqrt(3)) / 1.5, tolerance: 1e-12, source: '(2/√3)/(1 + sin 30°) = 0.7698, hand-worked' },
});

/** Scan angle at which the first grating lobe enters: sin θ_GL = g·λ/d − 1. */
export const gratingLobeOnsetFormula = defineFormula({
  id: 'grating-lobe-onset',
  title: 'Scan angle at which a grating lobe enters',
  latex: '\\sin\\theta_{\\mathrm{GL}} = g\\,\\frac{\\lambda_0}{d} - 1,\\qquad g = \\begin{cases}1 & \\text{rectangular}\\\\ 2/\\sqrt{3} & \\text{triangular}\\end{cases}',
  symbols: [
    { symbol: '\\theta_{\\mathrm{GL}}', meaning: 'scan angle from broadside at which a grating lobe reaches the horizon', unit: '°' },
    { symbol: 'g', meaning: 'reciprocal-lattice factor of the lattice', unit: '' },
    { symbol: '\\lambda_0', meaning: 'free-space wavelength', unit: 'm' },
    { symbol: 'd', meaning: 'element spacing', unit: 'm' },
  ],
  validity: 'Clamped to 90° when no grating lobe can enter (d ≤ gλ/2) and to 0° when one is already visible at broadside (d ≥ gλ).',
  source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory).',
  argNames: ['spacingWavelengths', 'latticeFactor'],
  evaluate: ({ spacingWavelengths, latticeFactor }) =>
    gratingLobeOnsetScanDeg(spacingWavelengths, latticeFactor > 1 ? 'triangular' : 'rectangular'),
  example: { args: { spacingWavelengths: 0.6, latticeFactor: 1 }, expected: (Math.asin(1 / 0.6 - 1) * 180) / Math.PI, tolerance: 1e-9, source: 'asin(1/0.6 − 1) = 41.81°, hand-worked' },
});

/** Element count of an aperture: N ≈ A / (c·d²), c = 1 (square) or √3/2 (triangular). */
export const elementCountFormula = defineFormula({
  id: 'element-count',
  title: 'Element count of a filled aperture',
  latex: 'N \\approx \\frac{A}{c\\,d^2},\\qquad c = \\begin{cases}1 & \\text{square lattice}\\\\ \\sqrt{3}/2 & \\text{triangular}\\end{cases}',
  symbols: [
    { symbol: 'N', meaning: 'number of elements (rounded to the nearest whole number)', unit: '' },
    { symbol: 'A', meaning: 'aperture area', unit: 'm²' },
    { symbol: 'c', meaning: 'area of a lattice cell per d²', unit: '' },
    { symbol: 'd', meaning: 'element spacing', unit: 'm' },
  ],
  validity: 'Apertures many spacings across; edge effects (partial cells at the rim) are ignored.',
  source: 'Cell areas of square and equilateral triangular lattices (plane geometry); the ≈13.4 % saving of the triangular lattice: Sharp, IRE Trans. AP-9 (1961).',
  argNames: ['areaM2', 'spacingM', 'cellFactor'],
  evaluate: ({ areaM2, spacingM, cellFactor }) => elementCountEstimate(areaM2, spacingM, cellFactor < 1 ? 'triangular' : 'rectangular'),
  example: { args: { areaM2: 1, spacingM: 0.1, cellFactor: 1 }, expected: 100, tolerance: 0, source: '1 m² / (0.1 m)², hand-worked' },
});
