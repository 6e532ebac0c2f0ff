import { defineFormula } from './formula';
import { systemNoiseTemperatureK } from './link/noiseCascade';
import { carrierToNoiseDensityDbHz, gOverTDbPerK, sensitivityDbm } from './link/carrierToNoise';
import { mismatchLossFromVswrDb } from './link/mismatch';
import { polarizationMismatchLossDb } from './link/polarizationMismatch';
import { midpointFresnelRadiusM, radioHorizonM } from './link/lineOfSight';

export const systemNoiseTemperatureFormula = defineFormula({
  id: 'system-noise-temperature',
  title: 'System noise temperature at the antenna terminals (Friis noise formula)',
  latex: 'T_{\\mathrm{sys}} = T_A + (L - 1)\\,T_{\\mathrm{phys}} + L\\,T_{\\mathrm{rx}},\\qquad T_{\\mathrm{rx}} = T_0\\,(10^{\\mathrm{NF}/10} - 1)',
  symbols: [
    { symbol: 'T_{\\mathrm{sys}}', meaning: 'system noise temperature referred to the antenna terminals', unit: 'K' },
    { symbol: 'T_A', meaning: 'antenna noise temperature', unit: 'K' },
    { symbol: 'L', meaning: 'feeder loss (linear, ≥ 1)', unit: '' },
    { symbol: 'T_{\\mathrm{phys}}', meaning: 'physical temperature of the feeder', unit: 'K' },
    { symbol: 'T_{\\mathrm{rx}}', meaning: 'receiver effective input noise temperature', unit: 'K' },
    { symbol: 'T_0', meaning: 'reference temperature, 290 K', unit: 'K' },
    { symbol: '\\mathrm{NF}', meaning: 'receiver noise figure', unit: 'dB' },
  ],
  validity: 'Matched stages, noise temperatures referred to one reference plane; the feeder is a matched passive line at a uniform temperature.',
  source: 'H. T. Friis, "Noise figures of radio receivers", Proc. IRE 32 (1944) 419–422; Pozar, Microwave Engineering, 4th ed. (2012), noise of a lossy line.',
  argNames: ['antennaTemperatureK', 'feederLossDb', 'feederPhysicalTemperatureK', 'receiverNoiseTemperatureK'],
  evaluate: (a) => systemNoiseTemperatureK(a.antennaTemperatureK, a.feederLossDb, a.feederPhysicalTemperatureK, a.receiverNoiseTemperatureK),
  example: {
    args: { antennaTemperatureK: 50, feederLossDb: 10 * Math.log10(2), feederPhysicalTemperatureK: 290, receiverNoiseTemperatureK: 100 },
    expected: 540,
    tolerance: 1e-9,
    source: 'hand-worked: L = 2 → 50 + (2 − 1)·290 + 2·100 = 540 K',
  },
});

export const gOverTFormula = defineFormula({
  id: 'g-over-t',
  title: 'Receiving figure of merit G/T',
  latex: 'G/T = G_r - 10\\log_{10}\\frac{T_{\\mathrm{sys}}}{1\\ \\mathrm{K}}\\ \\ \\mathrm{dB/K}',
  symbols: [
    { symbol: 'G/T', meaning: 'figure of merit of the receiving system', unit: 'dB/K' },
    { symbol: 'G_r', meaning: 'receive antenna gain (or realized gain) at the same reference plane as T_sys', unit: 'dBi' },
    { symbol: 'T_{\\mathrm{sys}}', meaning: 'system noise temperature', unit: 'K' },
  ],
  validity: 'Gain and noise temperature referred to the same plane (here the antenna terminals).',
  source: 'Maral & Bousquet, Satellite Communications Systems, 5th ed., Wiley, 2009 (figure of merit G/T).',
  argNames: ['receiveGainDbi', 'systemNoiseTemperatureK'],
  evaluate: (a) => gOverTDbPerK(a.receiveGainDbi, a.systemNoiseTemperatureK),
  example: { args: { receiveGainDbi: 40, systemNoiseTemperatureK: 100 }, expected: 20, tolerance: 1e-12, source: 'hand-worked: 40 dBi − 10·log10(100) = 20 dB/K' },
});

export const carrierToNoiseDensityFormula = defineFormula({
  id: 'carrier-to-noise-density',
  title: 'Carrier-to-noise-density ratio C/N₀',
  latex: 'C/N_0 = P_r - 10\\log_{10}(k\\,T_{\\mathrm{sys}}) = \\mathrm{EIRP} - L + G/T - 10\\log_{10} k\\ \\ \\mathrm{dB\\,Hz}',
  symbols: [
    { symbol: 'C/N_0', meaning: 'carrier power over noise power per hertz', unit: 'dB·Hz' },
    { symbol: 'P_r', meaning: 'received power at the antenna terminals', unit: 'dBW' },
    { symbol: 'k', meaning: 'Boltzmann constant 1.380649×10⁻²³ J/K (exact in the SI), −228.60 dBW/(K·Hz)', unit: 'J/K' },
    { symbol: 'T_{\\mathrm{sys}}', meaning: 'system noise temperature', unit: 'K' },
    { symbol: 'L', meaning: 'path and other losses', unit: 'dB' },
  ],
  validity: 'Thermal noise only (no interference, no phase noise), white over the band.',
  source: 'Maral & Bousquet, Satellite Communications Systems, 5th ed., Wiley, 2009; BIPM, The International System of Units, 9th ed., 2019 (value of k).',
  argNames: ['receivedPowerDbm', 'systemNoiseTemperatureK'],
  evaluate: (a) => carrierToNoiseDensityDbHz(a.receivedPowerDbm, a.systemNoiseTemperatureK),
  example: { args: { receivedPowerDbm: -100, systemNoiseTemperatureK: 290 }, expected: 73.975187, tolerance: 1e-6, source: 'hand-worked from k = 1.380649×10⁻²³ J/K: kT₀ = −173.975187 dBm/Hz, so −100 dBm gives 73.975187 dB·Hz' },
});

export const sensitivityFormula = defineFormula({
  id: 'receiver-sensitivity',
  title: 'Receiver sensitivity from kT₀B, noise figure and required SNR',
  latex: 'P_{\\min} = 10\\log_{10}(k T_0 B) + \\mathrm{NF} + \\mathrm{SNR}_{\\mathrm{req}},\\qquad 10\\log_{10}(k T_0) = -173.98\\ \\mathrm{dBm/Hz}',
  symbols: [
    { symbol: 'P_{\\min}', meaning: 'smallest input power that reaches the required SNR', unit: 'dBm' },
    { symbol: 'T_0', meaning: 'reference temperature 290 K (the source is taken at T₀)', unit: 'K' },
    { symbol: 'B', meaning: 'noise bandwidth', unit: 'Hz' },
    { symbol: '\\mathrm{NF}', meaning: 'receiver noise figure', unit: 'dB' },
    { symbol: '\\mathrm{SNR}_{\\mathrm{req}}', meaning: 'required signal-to-noise ratio in B', unit: 'dB' },
  ],
  validity: 'A receiver fed from a source at 290 K; with a cold antenna the system temperature, not this figure, sets the noise.',
  source: 'Pozar, Microwave Engineering, 4th ed. (2012), noise figure; IEEE Std 145 / IRE definition of noise figure with T₀ = 290 K.',
  argNames: ['bandwidthHz', 'noiseFigureDb', 'requiredSnrDb'],
  evaluate: (a) => sensitivityDbm(a.bandwidthHz, a.noiseFigureDb, a.requiredSnrDb),
  example: { args: { bandwidthHz: 1e6, noiseFigureDb: 3, requiredSnrDb: 10 }, expected: -100.975187, tolerance: 1e-6, source: 'hand-worked: −173.975 + 60 + 3 + 10 = −100.975 dBm' },
});

export const mismatchLossFormula = defineFormula({
  id: 'mismatch-loss',
  title: 'Mismatch loss from VSWR',
  latex: '|\\Gamma| = \\frac{S - 1}{S + 1},\\qquad \\mathrm{RL} = -20\\log_{10}|\\Gamma|,\\qquad L_{\\mathrm{mm}} = -10\\log_{10}(1 - |\\Gamma|^2)',
  symbols: [
    { symbol: 'S', meaning: 'voltage standing-wave ratio (VSWR), ≥ 1', unit: '' },
    { symbol: '|\\Gamma|', meaning: 'magnitude of the reflection coefficient', unit: '' },
    { symbol: '\\mathrm{RL}', meaning: 'return loss', unit: 'dB' },
    { symbol: 'L_{\\mathrm{mm}}', meaning: 'mismatch loss: gain minus realized gain (IEEE Std 145)', unit: 'dB' },
  ],
  validity: 'Source or load matched to the line on the other side; otherwise the two reflections interact.',
  source: 'Pozar, Microwave Engineering, 4th ed. (2012); IEEE Std 145-2013, IEEE Standard for Definitions of Terms for Antennas (realized gain).',
  argNames: ['vswr'],
  evaluate: (a) => mismatchLossFromVswrDb(a.vswr),
  example: { args: { vswr: 2 }, expected: 0.511525, tolerance: 1e-6, source: 'hand-worked: |Γ| = 1/3, −10·log10(8/9) = 0.5115 dB' },
});

export const polarizationMismatchFormula = defineFormula({
  id: 'polarization-mismatch',
  title: 'Polarization mismatch of two elliptically polarized antennas',
  latex: 'p = \\frac12 + \\frac{4 r_1 r_2 + (1 - r_1^2)(1 - r_2^2)\\cos 2\\Delta\\tau}{2(1 + r_1^2)(1 + r_2^2)},\\qquad L_p = -10\\log_{10} p',
  symbols: [
    { symbol: 'p', meaning: 'polarization efficiency (0–1)', unit: '' },
    { symbol: 'r_1', meaning: 'axial ratio of the wave (linear, ≥ 1), positive for one sense of rotation, negative for the other', unit: '' },
    { symbol: 'r_2', meaning: 'axial ratio of the receive antenna, signed the same way', unit: '' },
    { symbol: '\\Delta\\tau', meaning: 'angle between the major axes of the two ellipses', unit: '°' },
    { symbol: 'L_p', meaning: 'polarization mismatch loss (capped at 60 dB for ideal cross-polarization)', unit: 'dB' },
  ],
  validity: 'Each sense is the antenna’s own as it transmits (two right-hand antennas match); Δτ is the physical angle between the major axes; plane-wave coupling on the beam axis. Linear: r → ∞; circular: r = ±1.',
  source: 'W. L. Stutzman, Polarization in Electromagnetic Systems, Artech House, 1993; Stutzman & Thiele, Antenna Theory and Design, 3rd ed., Wiley, 2012.',
  argNames: ['axialRatio1Db', 'axialRatio2Db', 'sameSense', 'tiltDifferenceDeg'],
  evaluate: (a) => polarizationMismatchLossDb(a.axialRatio1Db, a.axialRatio2Db, a.sameSense !== 0, a.tiltDifferenceDeg),
  example: {
    args: { axialRatio1Db: 0, axialRatio2Db: 3, sameSense: 1, tiltDifferenceDeg: 0 },
    expected: 0.125167,
    tolerance: 1e-4,
    source: 'hand-worked: circular into AR 3 dB (r = 1.4125) of the same sense, p = (1 + r)²/(2(1 + r²)) = 0.971591, 0.125167 dB',
  },
});

export const fresnelRadiusFormula = defineFormula({
  id: 'fresnel-radius-midpoint',
  title: 'First Fresnel-zone radius at the midpoint',
  latex: 'r_1 = \\sqrt{\\frac{\\lambda d_1 d_2}{d_1 + d_2}} = \\tfrac12\\sqrt{\\lambda d}\\ \\ \\text{at the midpoint}',
  symbols: [
    { symbol: 'r_1', meaning: 'radius of the first Fresnel zone', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
    { symbol: 'd_1', meaning: 'distance from the transmitter', unit: 'm' },
    { symbol: 'd_2', meaning: 'distance from the receiver', unit: 'm' },
    { symbol: 'd', meaning: 'path length', unit: 'm' },
  ],
  validity: 'Paths long compared with the zone radius. Keep about 60 % of it clear of obstacles for free-space loss (common practice).',
  source: 'Recommendation ITU-R P.530 (Fresnel ellipsoid) (from memory); any propagation text.',
  argNames: ['pathLengthM', 'frequencyHz'],
  evaluate: (a) => midpointFresnelRadiusM(a.pathLengthM, a.frequencyHz),
  example: { args: { pathLengthM: 10_000, frequencyHz: 299_792_458 }, expected: 50, tolerance: 1e-9, source: 'hand-worked: λ = 1 m, ½√(1·10⁴) = 50 m' },
});

export const radioHorizonFormula = defineFormula({
  id: 'radio-horizon',
  title: 'Radio horizon over a smooth earth (4/3 earth radius)',
  latex: 'd_h = \\sqrt{2 k a h_1} + \\sqrt{2 k a h_2},\\qquad k = 4/3,\\ a = 6371\\ \\mathrm{km}',
  symbols: [
    { symbol: 'd_h', meaning: 'largest distance with a direct path over a smooth earth', unit: 'm' },
    { symbol: 'k', meaning: 'effective earth-radius factor (4/3: standard atmosphere)', unit: '' },
    { symbol: 'a', meaning: 'earth radius', unit: 'm' },
    { symbol: 'h_1', meaning: 'transmit antenna height above the ground', unit: 'm' },
    { symbol: 'h_2', meaning: 'receive antenna height above the ground', unit: 'm' },
  ],
  validity: 'Smooth spherical earth, heights small compared with the earth radius, standard refraction; terrain and anomalous refraction change it.',
  source: 'Recommendation ITU-R P.452 and P.530 (effective earth radius, k = 4/3 median) (from memory); common practice.',
  argNames: ['heightTransmitM', 'heightReceiveM'],
  evaluate: (a) => radioHorizonM(a.heightTransmitM, a.heightReceiveM),
  example: { args: { heightTransmitM: 10, heightReceiveM: 10 }, expected: 26068.627, tolerance: 1e-2, source: 'hand-worked: 2·√(2·(4/3)·6 371 000·10) = 26 068.6 m' },
});
