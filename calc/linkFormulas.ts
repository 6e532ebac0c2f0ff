import { defineFormula } from './formula';
import { freeSpacePathLossDb, friisMaxRangeM, p525BasicTransmissionLossDb } from './link/friis';
import { apertureDistanceToLimitM, farFieldBoundaryM, farFieldDistanceToLimitM, farFieldPowerDensityWPerM2 } from './exposure/powerDensity';

export const friisRangeFormula = defineFormula({
  id: 'friis-range',
  title: 'Friis free-space range',
  latex: 'R_{\\max} = \\frac{\\lambda}{4\\pi}\\,10^{(P_t + G_t + G_r - L - P_{\\mathrm{req}})/20}',
  symbols: [
    { symbol: 'R_{\\max}', meaning: 'largest distance at which the received power reaches the requirement', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
    { symbol: 'P_t', meaning: 'transmit power', unit: 'dBm' },
    { symbol: 'G_t', meaning: 'transmit antenna gain', unit: 'dBi' },
    { symbol: 'G_r', meaning: 'receive antenna gain', unit: 'dBi' },
    { symbol: 'L', meaning: 'other losses (feeders, pointing, polarization, atmosphere)', unit: 'dB' },
    { symbol: 'P_{\\mathrm{req}}', meaning: 'required received power (sensitivity plus margin)', unit: 'dBm' },
  ],
  validity: 'Free space, both antennas in each other’s far field, polarizations matched (or the mismatch in L), line of sight clear of the first Fresnel zone.',
  source: 'H. T. Friis, "A note on a simple transmission formula", Proc. IRE 34 (1946) 254–256.',
  argNames: ['transmitPowerDbm', 'transmitGainDbi', 'receiveGainDbi', 'requiredPowerDbm', 'frequencyHz', 'otherLossDb'],
  evaluate: (a) => friisMaxRangeM(a.transmitPowerDbm, a.transmitGainDbi, a.receiveGainDbi, a.requiredPowerDbm, a.frequencyHz, a.otherLossDb),
  example: {
    args: { transmitPowerDbm: 30, transmitGainDbi: 0, receiveGainDbi: 0, requiredPowerDbm: -70, frequencyHz: 299_792_458, otherLossDb: 0 },
    expected: 1e5 / (4 * Math.PI),
    tolerance: 1e-6,
    source: 'hand-worked: λ = 1 m, budget 100 dB → R = 10⁵/(4π) = 7957.7 m',
  },
});

export const freeSpacePathLossFormula = defineFormula({
  id: 'free-space-path-loss',
  title: 'Free-space path loss',
  latex: 'L_{\\mathrm{fs}} = 20\\log_{10}\\frac{4\\pi R}{\\lambda}\\ \\text{dB} \\;\\approx\\; 32.4 + 20\\log_{10} f_{\\mathrm{MHz}} + 20\\log_{10} d_{\\mathrm{km}}',
  symbols: [
    { symbol: 'L_{\\mathrm{fs}}', meaning: 'free-space basic transmission loss between isotropic antennas', unit: 'dB' },
    { symbol: 'R', meaning: 'distance', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
    { symbol: 'f_{\\mathrm{MHz}}', meaning: 'frequency in MHz (ITU-R P.525 form)', unit: 'MHz' },
    { symbol: 'd_{\\mathrm{km}}', meaning: 'distance in km (ITU-R P.525 form)', unit: 'km' },
  ],
  validity: 'Far field, free space. The P.525 constant 32.4 is 32.45 rounded, so the two forms differ by about 0.05 dB.',
  source: 'Recommendation ITU-R P.525-4 (2019), eq. (8) (equation number from memory); Friis (1946).',
  argNames: ['distanceM', 'frequencyHz'],
  evaluate: ({ distanceM, frequencyHz }) => freeSpacePathLossDb(distanceM, frequencyHz),
  example: { args: { distanceM: 1000, frequencyHz: 1e9 }, expected: 92.4478, tolerance: 1e-3, source: '20·log10(4π·1000/0.299792458) = 92.4478 dB, hand-worked; P.525 form gives 92.4 dB' },
});

export const p525LossFormula = defineFormula({
  id: 'p525-basic-transmission-loss',
  title: 'Free-space basic transmission loss, ITU-R P.525 form',
  latex: 'L_{bf} = 32.4 + 20\\log_{10} f + 20\\log_{10} d',
  symbols: [
    { symbol: 'L_{bf}', meaning: 'free-space basic transmission loss', unit: 'dB' },
    { symbol: 'f', meaning: 'frequency', unit: 'MHz' },
    { symbol: 'd', meaning: 'distance', unit: 'km' },
  ],
  validity: 'Free space, far field; the rounded constant limits agreement with 20·log10(4πR/λ) to about 0.05 dB.',
  source: 'Recommendation ITU-R P.525-4 (2019), eq. (8) (equation number from memory).',
  argNames: ['distanceM', 'frequencyHz'],
  evaluate: ({ distanceM, frequencyHz }) => p525BasicTransmissionLossDb(distanceM, frequencyHz),
  example: { args: { distanceM: 10_000, frequencyHz: 2.4e9 }, expected: 32.4 + 20 * Math.log10(2400) + 20, tolerance: 1e-9, source: 'P.525-4 eq. (8) (equation number from memory) evaluated by hand: 32.4 + 67.60 + 20 = 120.00 dB' },
});

export const farFieldDensityFormula = defineFormula({
  id: 'far-field-power-density',
  title: 'Far-field power density on the beam axis',
  latex: 'S = \\frac{\\mathrm{EIRP}}{4\\pi R^2},\\qquad \\mathrm{EIRP} = P_t\\,G_t',
  symbols: [
    { symbol: 'S', meaning: 'power density', unit: 'W/m²' },
    { symbol: '\\mathrm{EIRP}', meaning: 'equivalent isotropically radiated power', unit: 'W' },
    { symbol: 'R', meaning: 'distance from the antenna', unit: 'm' },
    { symbol: 'P_t', meaning: 'power delivered to the antenna', unit: 'W' },
    { symbol: 'G_t', meaning: 'antenna gain (linear)', unit: '' },
  ],
  validity: 'Far field only (beyond about 2D²/λ for an aperture of diameter D); closer in it overestimates or underestimates — use the aperture model.',
  source: 'FCC OET Bulletin 65, Edition 97-01 (1997), eq. (3) (equation number from memory); any antenna text (definition of EIRP).',
  argNames: ['eirpW', 'distanceM'],
  evaluate: ({ eirpW, distanceM }) => farFieldPowerDensityWPerM2(eirpW, distanceM),
  example: { args: { eirpW: 4 * Math.PI * 100, distanceM: 10 }, expected: 1, tolerance: 1e-12, source: 'hand-worked: 400π W / (4π·100 m²) = 1 W/m²' },
});

export const distanceToLimitFormula = defineFormula({
  id: 'distance-to-exposure-limit',
  title: 'Distance beyond which the far-field density is below a limit',
  latex: 'R_{\\mathrm{lim}} = \\sqrt{\\frac{\\mathrm{EIRP}}{4\\pi S_{\\mathrm{lim}}}}',
  symbols: [
    { symbol: 'R_{\\mathrm{lim}}', meaning: 'distance on the beam axis beyond which S < S_lim', unit: 'm' },
    { symbol: '\\mathrm{EIRP}', meaning: 'equivalent isotropically radiated power', unit: 'W' },
    { symbol: 'S_{\\mathrm{lim}}', meaning: 'power-density limit', unit: 'W/m²' },
  ],
  validity: 'Valid when the result lies in the far field; otherwise the aperture model decides. Ignores ground reflections (which can raise the density up to 4×) and time averaging.',
  source: 'FCC OET Bulletin 65, Edition 97-01 (1997), eq. (3) (equation number from memory) solved for R.',
  argNames: ['eirpW', 'limitWPerM2'],
  evaluate: ({ eirpW, limitWPerM2 }) => farFieldDistanceToLimitM(eirpW, limitWPerM2),
  example: { args: { eirpW: 4 * Math.PI * 100, limitWPerM2: 1 }, expected: 10, tolerance: 1e-12, source: 'hand-worked inverse of the density example' },
});

export const apertureExposureFormula = defineFormula({
  id: 'aperture-near-field-density',
  title: 'Conservative on-axis density of an aperture antenna (near, transition, far)',
  latex: 'S(R) = \\begin{cases} \\dfrac{16\\eta P_t}{\\pi D^2} & R \\le \\dfrac{D^2}{4\\lambda} \\\\[1ex] \\dfrac{16\\eta P_t}{\\pi D^2}\\,\\dfrac{D^2}{4\\lambda R} & \\dfrac{D^2}{4\\lambda} < R < \\dfrac{0.6 D^2}{\\lambda} \\\\[1ex] \\dfrac{P_t G}{4\\pi R^2} & R \\ge \\dfrac{0.6D^2}{\\lambda} \\end{cases}',
  symbols: [
    { symbol: 'S(R)', meaning: 'on-axis power density at distance R', unit: 'W/m²' },
    { symbol: '\\eta', meaning: 'aperture efficiency', unit: '' },
    { symbol: 'P_t', meaning: 'power delivered to the antenna', unit: 'W' },
    { symbol: 'D', meaning: 'aperture diameter', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
    { symbol: 'G', meaning: 'gain η(πD/λ)² (linear)', unit: '' },
  ],
  validity: 'Circular aperture antennas on the beam axis; conservative estimates, not a field computation. At the surface the density can reach 4P/A.',
  source: 'FCC OET Bulletin 65, Edition 97-01 (1997), §2 (section number from memory), equations for aperture antennas.',
  argNames: ['transmitPowerW', 'apertureDiameterM', 'apertureEfficiency', 'frequencyHz', 'limitWPerM2'],
  evaluate: (a) => apertureDistanceToLimitM(a.transmitPowerW, a.apertureDiameterM, a.apertureEfficiency, a.frequencyHz, a.limitWPerM2),
  example: {
    args: { transmitPowerW: 100, apertureDiameterM: 1, apertureEfficiency: 0.55, frequencyHz: 299_792_458 * 10, limitWPerM2: 10 },
    expected: 20.78386,
    tolerance: 1e-4,
    source: 'hand-worked: λ = 0.1 m, S_nf = 16·0.55·100/π = 280.1 W/m² > 10; the transition law would reach 70 m, past 0.6D²/λ = 6 m, so the far field decides: G = 0.55·(10π)² = 542.85, R = √(100·542.85/(4π·10)) = 20.784 m',
  },
});

