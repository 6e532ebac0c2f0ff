/**
 * Formulas shown on the end-fire length page. Each evaluate calls the calc/endFire function the
 * calculator uses; each example is a worked value with its source.
 */
import { defineFormula } from './formula';
import { powerRatioToDb } from './decibel';
import { radToDeg } from './angle';
import {
  endFireDirectivity,
  endFireElementCount,
  endFirePhaseStepRad,
  hansenWoodyardApproxDirectivity,
  hpbwFromDirectivityDeg,
  ordinaryEndFireApproxDirectivity,
  squareApertureDirectivity,
  stackingDistanceWavelengths,
  yagiGainDbd,
} from './endFire/index';

const kindOf = (hansenWoodyard: number) => (hansenWoodyard ? 'hansenWoodyard' : 'ordinary') as 'ordinary' | 'hansenWoodyard';

/** N = ⌊L/d⌋ + 1. */
export const endFireElementCountFormula = defineFormula({
  id: 'end-fire-element-count',
  title: 'Elements in an end-fire array of length L',
  latex: 'N = \\left\\lfloor \\frac{L}{d} \\right\\rfloor + 1',
  symbols: [
    { symbol: 'N', meaning: 'number of elements', unit: '' },
    { symbol: 'L', meaning: 'overall length, first to last element', unit: 'm' },
    { symbol: 'd', meaning: 'element spacing', unit: 'm' },
  ],
  validity: 'Uniform spacing; the array fits the length, (N − 1)d ≤ L. Our rule, not a published one.',
  source: 'Team rule (this project): whole elements that fit the given length.',
  argNames: ['lengthWavelengths', 'spacingWavelengths'],
  evaluate: ({ lengthWavelengths, spacingWavelengths }) => endFireElementCount(lengthWavelengths, spacingWavelengths),
  example: { args: { lengthWavelengths: 2.2, spacingWavelengths: 0.25 }, expected: 9, tolerance: 0, source: '⌊2.2/0.25⌋ + 1 = 9, hand-worked' },
});

/** Progressive phase per element, degrees. */
export const endFirePhaseFormula = defineFormula({
  id: 'end-fire-phase-step',
  title: 'Progressive phase for an end-fire beam',
  latex: '\\delta = -\\left(k d + \\frac{2.92}{N}\\,h\\right),\\qquad h = \\begin{cases}0 & \\text{ordinary}\\\\ 1 & \\text{Hansen–Woodyard}\\end{cases}',
  symbols: [
    { symbol: '\\delta', meaning: 'phase of element n+1 relative to element n (shown in degrees)', unit: 'rad' },
    { symbol: 'k', meaning: 'free-space wavenumber 2π/λ', unit: 'rad/m' },
    { symbol: 'd', meaning: 'element spacing', unit: 'm' },
    { symbol: 'N', meaning: 'number of elements', unit: '' },
    { symbol: 'h', meaning: '1 for the Hansen–Woodyard excess phase, 0 for ordinary end-fire', unit: '' },
  ],
  validity: 'Beam along the array axis toward the lagging elements; 2.92/N ≈ π/N is the Hansen–Woodyard excess phase.',
  source: 'Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory; ordinary) and §6.4 (section number from memory; Hansen–Woodyard; Hansen & Woodyard, Proc. IRE, 1938).',
  argNames: ['count', 'spacingWavelengths', 'hansenWoodyard'],
  evaluate: ({ count, spacingWavelengths, hansenWoodyard }) => radToDeg(endFirePhaseStepRad(kindOf(hansenWoodyard), count, spacingWavelengths)),
  example: { args: { count: 10, spacingWavelengths: 0.25, hansenWoodyard: 0 }, expected: -90, tolerance: 1e-12, source: '−kd = −360° × 0.25 = −90°, hand-worked' },
});

/** Exact directivity by the pattern integral (array engine). */
export const endFireDirectivityFormula = defineFormula({
  id: 'end-fire-directivity-exact',
  title: 'Directivity of the end-fire array from its pattern',
  latex: 'D = \\frac{4\\pi\\,|AF(\\hat x)|^2}{\\oint |AF|^2\\,d\\Omega} = \\frac{N^2}{\\sum_{m}\\sum_{n} e^{j(m-n)\\delta}\\,\\dfrac{\\sin((m-n)kd)}{(m-n)kd}}',
  symbols: [
    { symbol: 'D', meaning: 'directivity toward end-fire (shown in dBi)', unit: '' },
    { symbol: 'AF', meaning: 'array factor Σ e^{jn(kd cos γ + δ)}, γ from the axis', unit: '' },
    { symbol: 'N', meaning: 'number of elements', unit: '' },
    { symbol: '\\delta', meaning: 'progressive phase per element', unit: 'rad' },
    { symbol: 'k', meaning: 'free-space wavenumber', unit: 'rad/m' },
    { symbol: 'd', meaning: 'element spacing', unit: 'm' },
  ],
  validity: 'Isotropic elements, uniform amplitudes, no mutual coupling; exact for that model (the sin x/x term is 1 for m = n).',
  source: 'IEEE Std 145 definition of directivity; the closed form is the sphere integral of |AF|² (Hansen, Phased Array Antennas, 2nd ed., ch. 2 (chapter number from memory)); checked against SciPy quadrature (scripts/fixtures/end_fire.py).',
  argNames: ['count', 'spacingWavelengths', 'hansenWoodyard'],
  evaluate: ({ count, spacingWavelengths, hansenWoodyard }) => powerRatioToDb(endFireDirectivity(kindOf(hansenWoodyard), count, spacingWavelengths)),
  example: { args: { count: 10, spacingWavelengths: 0.25, hansenWoodyard: 0 }, expected: 10, tolerance: 1e-9, source: 'ordinary end-fire at d = λ/4: every cross term vanishes, D = N (Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory))' },
});

/** Ordinary end-fire, D ≈ 4L/λ. */
export const ordinaryEndFireApproxFormula = defineFormula({
  id: 'end-fire-ordinary-approx',
  title: 'Ordinary end-fire directivity, long array',
  latex: 'D_{\\mathrm{ord}} \\approx \\frac{4L}{\\lambda}',
  symbols: [
    { symbol: 'D_{\\mathrm{ord}}', meaning: 'directivity of an ordinary end-fire array (shown in dBi)', unit: '' },
    { symbol: 'L', meaning: 'array length', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
  ],
  validity: 'Long arrays (L ≫ λ) with d < λ/2; exact at d = λ/4 when L is taken as N·d.',
  source: 'Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory; D₀ ≈ 4N d/λ ≈ 4L/λ).',
  argNames: ['lengthWavelengths'],
  evaluate: ({ lengthWavelengths }) => powerRatioToDb(ordinaryEndFireApproxDirectivity(lengthWavelengths)),
  example: { args: { lengthWavelengths: 2.5 }, expected: 10, tolerance: 1e-12, source: '10 log10(4 × 2.5) = 10 dBi, hand-worked' },
});

/** Hansen–Woodyard, D ≈ 1.805 · 4L/λ. */
export const hansenWoodyardApproxFormula = defineFormula({
  id: 'end-fire-hansen-woodyard-approx',
  title: 'Hansen–Woodyard directivity, long array',
  latex: 'D_{\\mathrm{HW}} \\approx 1.805\\,\\frac{4L}{\\lambda}',
  symbols: [
    { symbol: 'D_{\\mathrm{HW}}', meaning: 'directivity of a Hansen–Woodyard array (shown in dBi)', unit: '' },
    { symbol: 'L', meaning: 'array length', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
  ],
  validity: 'Long arrays only; for short arrays the exact value (shown) can differ by more than a decibel.',
  source: 'Balanis, Antenna Theory, 4th ed., §6.4 (section number from memory; D₀ ≈ 1.805 · 4L/λ, about 2.56 dB above ordinary end-fire).',
  argNames: ['lengthWavelengths'],
  evaluate: ({ lengthWavelengths }) => powerRatioToDb(hansenWoodyardApproxDirectivity(lengthWavelengths)),
  example: { args: { lengthWavelengths: 10 }, expected: 10 * Math.log10(72.2), tolerance: 1e-12, source: '10 log10(1.805 × 40) = 18.59 dBi, hand-worked' },
});

/** Yagi–Uda gain from the NBS table, interpolated in log boom. */
export const yagiGainFormula = defineFormula({
  id: 'yagi-gain-nbs',
  title: 'Yagi–Uda gain from the NBS optimised designs',
  latex: 'G(L) = G_i + (G_{i+1} - G_i)\\,\\frac{\\log(L/L_i)}{\\log(L_{i+1}/L_i)}',
  symbols: [
    { symbol: 'G', meaning: 'gain over a half-wave dipole', unit: 'dBd' },
    { symbol: 'L', meaning: 'boom length', unit: 'λ' },
    { symbol: 'L_i', meaning: 'tabulated boom lengths 0.4, 0.8, 1.2, 2.2, 3.2, 4.2 λ', unit: 'λ' },
    { symbol: 'G_i', meaning: 'tabulated gains 7.1, 9.2, 10.2, 12.25, 13.4, 14.2 dBd (from memory)', unit: 'dBd' },
  ],
  validity: 'Optimised designs of NBS TN 688 (element diameter about 0.0085 λ); outside 0.4–4.2 λ the end segment is extended and flagged as extrapolation.',
  source: 'P. P. Viezbicke, "Yagi Antenna Design", NBS Technical Note 688, 1976 (table values recalled from memory); interpolation linear in log10(boom) is our choice.',
  argNames: ['boomWavelengths'],
  evaluate: ({ boomWavelengths }) => yagiGainDbd(boomWavelengths).gainDbd,
  example: { args: { boomWavelengths: Math.sqrt(1.2 * 2.2) }, expected: 11.225, tolerance: 1e-12, source: 'Interpolation linear in log10(boom), worked by hand at the geometric mean of the 1.2 λ and 2.2 λ rows: the mean of their gains, (10.2 + 12.25)/2 dBd (table values transcribed from memory)' },
});

/** Square aperture of side L: 4π L²/λ². */
export const squareApertureFormula = defineFormula({
  id: 'square-aperture-directivity',
  title: 'Broadside square aperture of the same length',
  latex: 'D_{\\mathrm{ap}} = \\frac{4\\pi L^2}{\\lambda^2}',
  symbols: [
    { symbol: 'D_{\\mathrm{ap}}', meaning: 'directivity of a uniformly illuminated L × L aperture (shown in dBi)', unit: '' },
    { symbol: 'L', meaning: 'side of the aperture, equal to the end-fire length', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
  ],
  validity: 'Uniform illumination, aperture many wavelengths across, efficiency 100 %; real apertures reach 50–80 % of it.',
  source: 'Balanis, Antenna Theory, 4th ed., ch. 12 (chapter number from memory; maximum directivity 4πA/λ² of a uniform aperture).',
  argNames: ['lengthWavelengths'],
  evaluate: ({ lengthWavelengths }) => powerRatioToDb(squareApertureDirectivity(lengthWavelengths)),
  example: { args: { lengthWavelengths: 1 }, expected: 10 * Math.log10(4 * Math.PI), tolerance: 1e-12, source: '10 log10(4π) = 10.99 dBi, hand-worked' },
});

/** HPBW from directivity, equal planes. */
export const hpbwFromDirectivityFormula = defineFormula({
  id: 'hpbw-from-directivity',
  title: 'Beamwidth estimate from directivity (equal E and H planes)',
  latex: '\\theta_{\\mathrm{HP}} \\approx \\sqrt{\\frac{41\\,253}{D}}',
  symbols: [
    { symbol: '\\theta_{\\mathrm{HP}}', meaning: 'half-power beamwidth in each principal plane', unit: '°' },
    { symbol: 'D', meaning: 'directivity (linear)', unit: '' },
  ],
  validity: 'A single main beam with small sidelobes and equal E- and H-plane widths; real Yagis are a little narrower in the E-plane.',
  source: 'Balanis, Antenna Theory, 4th ed., §2.7 (section number from memory; Kraus\'s approximation D ≈ 41 253/(θ₁θ₂), angles in degrees).',
  argNames: ['directivity'],
  evaluate: ({ directivity }) => hpbwFromDirectivityDeg(directivity),
  example: { args: { directivity: 41253 / 900 }, expected: 30, tolerance: 1e-3, source: '√(41 253 / 45.84) = 30°, hand-worked' },
});

/** Stacking distance from HPBW. */
export const stackingDistanceFormula = defineFormula({
  id: 'yagi-stacking-distance',
  title: 'Stacking distance from the beamwidth',
  latex: '\\frac{S}{\\lambda} \\approx \\frac{1}{2\\sin(\\theta_{\\mathrm{HP}}/2)}',
  symbols: [
    { symbol: 'S', meaning: 'centre-to-centre distance between bays in the stacking plane', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength (the result is S in wavelengths)', unit: 'm' },
    { symbol: '\\theta_{\\mathrm{HP}}', meaning: 'half-power beamwidth of one antenna in the stacking plane', unit: '°' },
  ],
  validity: 'Rule of thumb for two or more identical bays fed in phase; mutual coupling is ignored.',
  source: 'Common practice, no source.',
  argNames: ['hpbwDeg'],
  evaluate: ({ hpbwDeg }) => stackingDistanceWavelengths(hpbwDeg),
  example: { args: { hpbwDeg: 60 }, expected: 1, tolerance: 1e-12, source: '1/(2 sin 30°) = 1 λ, hand-worked' },
});
