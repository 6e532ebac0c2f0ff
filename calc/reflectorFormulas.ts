/**
 * Formulas shown on the front-fed reflector page. Each evaluate calls the same calc/reflector
 * function the calculator uses; each example is a worked value with its source. The feed model
 * is the cos^q ψ POWER pattern throughout (see calc/reflector/feedPattern.ts).
 */
import { defineFormula } from './formula';
import { degToRad, radToDeg } from './angle';
import { powerRatioToDb } from './decibel';
import { freeSpaceWavelengthM } from './wavelength';
import { apertureGainDbi, farFieldDistanceM } from './aperture/index';
import {
  blockageEfficiency,
  centralBlockedFraction,
  dishDepthM,
  edgeTaperDb,
  feedAngleAtApertureRadiusRad,
  feedOffsetAngleRad,
  illuminationEfficiencies,
  loBeamDeviationFactor,
  pointingErrorForLossDeg,
  rimHalfAngleRad,
  ruzeEfficiency,
} from './reflector/index';

/** G = η (πD/λ)², in dBi. */
export const reflectorGainFormula = defineFormula({
  id: 'reflector-gain',
  title: 'Gain of a circular aperture',
  latex: 'G_{\\mathrm{dBi}} = 10\\log_{10}\\!\\left[\\eta\\left(\\frac{\\pi D}{\\lambda}\\right)^{2}\\right]',
  symbols: [
    { symbol: 'G_{\\mathrm{dBi}}', meaning: 'gain over isotropic', unit: 'dBi' },
    { symbol: '\\eta', meaning: 'aperture efficiency, the product of all efficiency factors', unit: '' },
    { symbol: 'D', meaning: 'reflector diameter', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
  ],
  validity: 'Apertures many wavelengths across (D/λ ≳ 10); η from the efficiency budget.',
  source: 'IEEE Std 145 (directivity, gain); Balanis, Antenna Theory, 4th ed., §15.4.1 (section number from memory).',
  argNames: ['apertureEfficiency', 'diameterM', 'frequencyHz'],
  evaluate: ({ apertureEfficiency, diameterM, frequencyHz }) => apertureGainDbi(apertureEfficiency, diameterM, freeSpaceWavelengthM(frequencyHz)),
  example: {
    args: { apertureEfficiency: 0.6, diameterM: 3, frequencyHz: 10e9 },
    expected: 47.7305209936,
    tolerance: 1e-9,
    source: 'hand-worked: λ = 0.0299792458 m, πD/λ = 314.3768, squared 98 832.7, × 0.6 = 59 299.6, 10·log10 = 47.7305 dBi',
  },
});

/** ψ0 = 2 atan(1/(4 f/D)). */
export const rimHalfAngleFormula = defineFormula({
  id: 'reflector-rim-half-angle',
  title: 'Half-angle subtended by the rim at the focus',
  latex: '\\psi_0 = 2\\arctan\\frac{1}{4\\,f/D}',
  symbols: [
    { symbol: '\\psi_0', meaning: 'angle from the axis to the rim, seen from the focus', unit: '°' },
    { symbol: 'f/D', meaning: 'focal ratio', unit: '' },
  ],
  validity: 'Front-fed (axisymmetric) paraboloid; ψ0 = 90° at f/D = 0.25 (focus in the rim plane).',
  source: 'Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory; paraboloid geometry).',
  argNames: ['focalRatio'],
  evaluate: ({ focalRatio }) => radToDeg(rimHalfAngleRad(focalRatio)),
  example: { args: { focalRatio: 0.5 }, expected: 53.13010235415598, tolerance: 1e-10, source: 'hand-worked: 2·atan(0.5) = 53.1301°' },
});

/** Depth D²/(16 f). */
export const dishDepthFormula = defineFormula({
  id: 'reflector-depth',
  title: 'Depth of the dish',
  latex: 'h = \\frac{D^{2}}{16 f}',
  symbols: [
    { symbol: 'h', meaning: 'depth from the rim plane to the vertex', unit: 'm' },
    { symbol: 'D', meaning: 'diameter', unit: 'm' },
    { symbol: 'f', meaning: 'focal length', unit: 'm' },
  ],
  validity: 'Paraboloid z = ρ²/(4f) evaluated at ρ = D/2.',
  source: 'Geometry of the parabola; Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory).',
  argNames: ['diameterM', 'focalLengthM'],
  evaluate: ({ diameterM, focalLengthM }) => dishDepthM(diameterM, focalLengthM),
  example: { args: { diameterM: 1.2, focalLengthM: 0.48 }, expected: 0.1875, tolerance: 1e-12, source: 'hand-worked: 1.44/(16 × 0.48) = 0.1875 m' },
});

/** Edge taper including space attenuation. */
export const edgeTaperFormula = defineFormula({
  id: 'reflector-edge-taper',
  title: 'Edge taper of a cos^q ψ power-pattern feed, with space attenuation',
  latex: 'T_{\\mathrm{e}} = 10\\,q\\log_{10}\\cos\\psi_0 + 20\\log_{10}\\frac{1+\\cos\\psi_0}{2}',
  symbols: [
    { symbol: 'T_{\\mathrm{e}}', meaning: 'aperture power density at the rim relative to the centre', unit: 'dB' },
    { symbol: 'q', meaning: 'exponent of the feed POWER pattern cos^q ψ (the field pattern is cos^{q/2} ψ)', unit: '' },
    { symbol: '\\psi_0', meaning: 'rim half-angle at the focus', unit: '°' },
  ],
  validity: 'Rotationally symmetric feed with its phase centre at the focus; ψ0 < 90°.',
  source: 'Balanis, Antenna Theory, 4th ed., §15.4.1 (section number from memory; space attenuation (1 + cos ψ)/2 of the field).',
  argNames: ['powerExponent', 'rimHalfAngleDeg'],
  evaluate: ({ powerExponent, rimHalfAngleDeg }) => edgeTaperDb(powerExponent, degToRad(rimHalfAngleDeg)),
  example: { args: { powerExponent: 2, rimHalfAngleDeg: 66 }, expected: -10.870077909836, tolerance: 1e-9, source: 'hand-worked: 20·log10(cos 66°) = −7.814 dB, 20·log10((1 + cos 66°)/2) = −3.056 dB' },
});

/** Spillover efficiency in dB. */
export const spilloverFormula = defineFormula({
  id: 'reflector-spillover',
  title: 'Spillover efficiency',
  latex: '10\\log_{10}\\eta_{\\mathrm{sp}} = 10\\log_{10}\\frac{\\int_0^{\\psi_0} P(\\psi)\\sin\\psi\\,d\\psi}{\\int_0^{\\pi/2} P(\\psi)\\sin\\psi\\,d\\psi},\\qquad P(\\psi) = \\cos^{q}\\psi',
  symbols: [
    { symbol: '\\eta_{\\mathrm{sp}}', meaning: 'fraction of the feed power that reaches the reflector', unit: '' },
    { symbol: 'P(\\psi)', meaning: 'feed power pattern', unit: '' },
    { symbol: '\\psi_0', meaning: 'rim half-angle at the focus', unit: '°' },
  ],
  validity: 'Feed radiating into the forward half-space only; integrated numerically (Gauss–Legendre).',
  source: 'Balanis, Antenna Theory, 4th ed., §15.4.1 (section number from memory; spillover efficiency).',
  argNames: ['powerExponent', 'focalRatio'],
  evaluate: ({ powerExponent, focalRatio }) => powerRatioToDb(illuminationEfficiencies(powerExponent, rimHalfAngleRad(focalRatio)).spillover),
  example: { args: { powerExponent: 2, focalRatio: 0.5 }, expected: -1.0568393731557, tolerance: 1e-9, source: 'closed form for cos^q: 1 − cos^(q+1) ψ0 = 1 − 0.6³ = 0.784 at f/D = 0.5 (cos ψ0 = 0.6), hand-worked' },
});

/** Taper efficiency in dB. */
export const taperFormula = defineFormula({
  id: 'reflector-taper',
  title: 'Taper (illumination) efficiency',
  latex: '10\\log_{10}\\eta_{\\mathrm{t}} = 10\\log_{10}\\frac{2\\left[\\int_0^{\\psi_0}\\sqrt{P(\\psi)}\\tan\\frac{\\psi}{2}\\,d\\psi\\right]^2}{\\tan^2\\frac{\\psi_0}{2}\\int_0^{\\psi_0}P(\\psi)\\sin\\psi\\,d\\psi}',
  symbols: [
    { symbol: '\\eta_{\\mathrm{t}}', meaning: 'directivity of the aperture field relative to a uniform field of the same size', unit: '' },
    { symbol: 'P(\\psi)', meaning: 'feed power pattern cos^q ψ', unit: '' },
    { symbol: '\\psi_0', meaning: 'rim half-angle at the focus', unit: '°' },
  ],
  validity: 'Aperture field ∝ √P(ψ)/r, in phase (feed phase centre at the focus).',
  source: 'Balanis, Antenna Theory, 4th ed., §15.4.1 (section number from memory; taper efficiency = aperture efficiency / spillover efficiency).',
  argNames: ['powerExponent', 'focalRatio'],
  evaluate: ({ powerExponent, focalRatio }) => powerRatioToDb(illuminationEfficiencies(powerExponent, rimHalfAngleRad(focalRatio)).taper),
  example: {
    args: { powerExponent: 2, focalRatio: 0.5 },
    expected: -0.18863020886229,
    tolerance: 1e-9,
    source: 'closed form for q = 2, hand-worked: with S = tan²(ψ0/2) = 0.25, ∫√P tan(ψ/2) dψ = 2S/(1+S) − ln(1+S) = 0.176856, ∫P sin ψ dψ = (1 − 0.6³)/3, η_t = 0.957496',
  },
});

/** Ruze surface loss in dB. */
export const ruzeFormula = defineFormula({
  id: 'ruze-surface-loss',
  title: 'Surface-error efficiency (Ruze equation)',
  latex: '10\\log_{10}\\eta_{\\mathrm{s}} = 10\\log_{10} e^{-(4\\pi\\varepsilon/\\lambda)^{2}}',
  symbols: [
    { symbol: '\\eta_{\\mathrm{s}}', meaning: 'surface (phase) efficiency', unit: '' },
    { symbol: '\\varepsilon', meaning: 'RMS surface error, normal to the surface', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
  ],
  validity: 'Random, Gaussian, spatially uncorrelated errors over many correlation cells; a small correction only up to about ε = λ/16 (−2.7 dB).',
  source: 'J. Ruze, "Antenna tolerance theory — a review", Proc. IEEE 54(4), 1966.',
  argNames: ['rmsSurfaceErrorM', 'frequencyHz'],
  evaluate: ({ rmsSurfaceErrorM, frequencyHz }) => powerRatioToDb(ruzeEfficiency(rmsSurfaceErrorM, freeSpaceWavelengthM(frequencyHz))),
  example: {
    args: { rmsSurfaceErrorM: 0.0299792458 / 16, frequencyHz: 10e9 },
    expected: -2.678946706226,
    tolerance: 1e-9,
    source: 'hand-worked: ε = λ/16 gives exp(−(π/4)²) = 0.53964, 10·log10 = −2.679 dB',
  },
});

/** Central blockage loss in dB. */
export const centralBlockageFormula = defineFormula({
  id: 'reflector-central-blockage',
  title: 'Central blockage efficiency',
  latex: '10\\log_{10}\\eta_{\\mathrm{b}} = 20\\log_{10}(1 - C_{\\mathrm{b}}),\\qquad C_{\\mathrm{b}} = \\frac{\\int_0^{\\psi_b}\\sqrt{P(\\psi)}\\tan\\frac{\\psi}{2}\\,d\\psi}{\\int_0^{\\psi_0}\\sqrt{P(\\psi)}\\tan\\frac{\\psi}{2}\\,d\\psi}',
  symbols: [
    { symbol: 'C_{\\mathrm{b}}', meaning: 'share of the aperture-field integral ∫E dA falling on the blocked disk', unit: '' },
    { symbol: '\\psi_b', meaning: 'feed angle of the blockage rim, 2 atan(D_b/(4f))', unit: '°' },
    { symbol: '\\psi_0', meaning: 'rim half-angle at the focus', unit: '°' },
  ],
  validity: 'Central disk small against the dish; ignores diffraction around the obstacle. For a uniform aperture it is (1 − (D_b/D)²)².',
  source: 'Standard aperture-blockage estimate (from memory: Stutzman & Thiele, Antenna Theory and Design, 3rd ed., reflector blockage).',
  argNames: ['powerExponent', 'focalRatio', 'blockedDiameterFraction'],
  evaluate: ({ powerExponent, focalRatio, blockedDiameterFraction }) => {
    const psiB = feedAngleAtApertureRadiusRad(focalRatio, blockedDiameterFraction / 2);
    return powerRatioToDb(blockageEfficiency(centralBlockedFraction(powerExponent, rimHalfAngleRad(focalRatio), psiB)));
  },
  example: {
    args: { powerExponent: 2, focalRatio: 0.5, blockedDiameterFraction: 0.2 },
    expected: -0.49783896146687,
    tolerance: 1e-9,
    source: 'closed form for q = 2, hand-worked: I(S) = 2S/(1+S) − ln(1+S), C_b = I(0.01)/I(0.25) = 0.055704, 20·log10(1 − C_b) = −0.4978 dB',
  },
});

/** Lo's beam deviation factor. */
export const beamDeviationFormula = defineFormula({
  id: 'beam-deviation-factor',
  title: 'Beam deviation factor (Lo)',
  latex: '\\mathrm{BDF} = \\frac{1 + k\\,(D/4f)^{2}}{1 + (D/4f)^{2}},\\qquad k \\approx 0.36',
  symbols: [
    { symbol: '\\mathrm{BDF}', meaning: 'beam tilt over feed offset angle atan(δ/f)', unit: '' },
    { symbol: 'D/4f', meaning: '1/(4 f/D)', unit: '' },
    { symbol: 'k', meaning: 'constant for a typical taper', unit: '' },
  ],
  validity: 'Small lateral feed offsets (a few beamwidths of tilt); typical edge tapers.',
  source: 'Y. T. Lo, "On the beam deviation factor of a parabolic reflector", IRE Trans. Antennas Propag., AP-8, 1960.',
  argNames: ['focalRatio'],
  evaluate: ({ focalRatio }) => loBeamDeviationFactor(focalRatio),
  example: { args: { focalRatio: 0.4 }, expected: 0.82022471910112, tolerance: 1e-12, source: 'hand-worked: (D/4f)² = 0.390625; (1 + 0.140625)/1.390625 = 0.82022' },
});

/** Beam tilt = BDF · atan(δ/f). */
export const beamTiltFormula = defineFormula({
  id: 'beam-tilt-feed-offset',
  title: 'Beam tilt from a lateral feed offset',
  latex: '\\theta_{\\mathrm{B}} = \\mathrm{BDF}\\cdot\\arctan\\frac{\\delta}{f}',
  symbols: [
    { symbol: '\\theta_{\\mathrm{B}}', meaning: 'beam tilt from the axis, to the side opposite the feed', unit: '°' },
    { symbol: '\\delta', meaning: 'lateral feed offset in the focal plane', unit: 'm' },
    { symbol: 'f', meaning: 'focal length', unit: 'm' },
  ],
  validity: 'Offsets of a few beamwidths; beyond that coma grows fast and the factor drifts.',
  source: 'Lo, IRE Trans. AP-8, 1960 (BDF); geometry of the feed offset angle.',
  argNames: ['offsetM', 'focalLengthM', 'focalRatio'],
  evaluate: ({ offsetM, focalLengthM, focalRatio }) => radToDeg(loBeamDeviationFactor(focalRatio) * feedOffsetAngleRad(offsetM, focalLengthM)),
  example: {
    args: { offsetM: 0.01, focalLengthM: 0.4, focalRatio: 0.4 },
    expected: 1.1746406903822,
    tolerance: 1e-8,
    source: 'hand-worked: atan(0.025) = 1.43186°, × 0.820225 = 1.17464°',
  },
});

/** Pointing error for a given loss, Gaussian-beam rule. */
export const pointingFormula = defineFormula({
  id: 'pointing-error-for-loss',
  title: 'Pointing error for a given loss (Gaussian-beam rule)',
  latex: '\\Delta\\theta = \\theta_{3\\,\\mathrm{dB}}\\sqrt{\\frac{L_{\\mathrm{dB}}}{12}}',
  symbols: [
    { symbol: '\\Delta\\theta', meaning: 'pointing error', unit: '°' },
    { symbol: '\\theta_{3\\,\\mathrm{dB}}', meaning: 'half-power beamwidth', unit: '°' },
    { symbol: 'L_{\\mathrm{dB}}', meaning: 'allowed gain loss', unit: 'dB' },
  ],
  validity: 'Main beam close to Gaussian, losses up to about 3 dB; 12 stands for 40 ln 2/ln 10 = 12.04.',
  source: 'Common practice, no source (Gaussian main beam: loss = 12.04 (Δθ/θ3dB)² dB).',
  argNames: ['lossDb', 'hpbwDeg'],
  evaluate: ({ lossDb, hpbwDeg }) => pointingErrorForLossDeg(lossDb, hpbwDeg),
  example: { args: { lossDb: 1, hpbwDeg: 1 }, expected: 0.28818085011358, tolerance: 1e-12, source: 'hand-worked: √(1/12.0412) = 0.28818' },
});
