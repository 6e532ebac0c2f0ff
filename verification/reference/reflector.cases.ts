import type { ReferenceGroup } from './referenceCase';
import { freeSpaceWavelengthM } from '../../calc/wavelength';
import { ruzeEfficiency } from '../../calc/reflector/ruze';
import { apertureGainDbi } from '../../calc/aperture/index';
import { beamFigures, tabulateAperture } from '../../calc/reflector/aperturePattern';
import { illuminationEfficiencies, optimumIllumination } from '../../calc/reflector/efficiency';
import { rimHalfAngleRad } from '../../calc/reflector/geometry';
import { computeReflector, createReflectorCalculator } from '../../calc/calculators/reflector';
import type { CalcInputs } from '../../calc/calculator';
import { teamConventions } from '../../calc/teamConventions';
import fixture from '../fixtures/reflector-efficiency.json';
import sidelobeFixture from '../fixtures/reflector-sidelobes.json';
import offsetFixture from '../fixtures/reflector-feed-offset.json';
import { displacedFeedBeam } from '../../calc/reflector/feedOffset';
import { feedPowerPattern } from '../../calc/reflector/feedPattern';

const BALANIS_15_4 = 'Balanis, Antenna Theory, 4th ed., Wiley 2016, §15.4.1 (section number from memory; figure of aperture efficiency against ψ0 for cos^n feeds; read from the figure)';
const BALANIS_12_7 = 'Balanis, Antenna Theory, 4th ed., Wiley 2016, §12.7 (section number from memory), circular-aperture figures';
const SCIPY = 'SciPy quad, scripts/fixtures/reflector_efficiency.py (verification/fixtures/reflector-efficiency.json)';

const uniform = () => beamFigures(tabulateAperture(() => 1))!;
/** HPBW (rad) × D/λ of a circular aperture from its half-power point u = (πD/λ) sin(θ/2): 2u/π for a narrow beam. */
const beamwidthTimesDiameterRad = (halfPowerU: number) => (2 * halfPowerU) / Math.PI;
const SIDELOBE_SCIPY = 'NumPy/SciPy, scripts/fixtures/reflector_sidelobes.py (verification/fixtures/reflector-sidelobes.json)';
const OFFSET_NUMPY = 'NumPy/SciPy direct aperture sum, scripts/fixtures/reflector_feed_offset.py (verification/fixtures/reflector-feed-offset.json)';
const blocked20 = sidelobeFixture.cases.find((c) => c.focalRatio === 0.4 && c.innerFraction === 0.2)!;
const laterLobe = sidelobeFixture.cases.find((c) => c.powerExponent === 12 && c.innerFraction === 0.1)!;
const farOffset = offsetFixture.cases.find((c) => c.focalRatio === 0.3 && c.offsetWavelengths === 4)!;
/** Beam figures of the cos^q feed at this f/D with a blocked centre, by the calculator's aperture functions. */
function blockedFigures(focalRatio: number, powerExponent: number, innerFraction: number) {
  const half = Math.tan(rimHalfAngleRad(focalRatio) / 2);
  const amplitude = (t: number) => {
    const psi = 2 * Math.atan(t * half);
    return Math.sqrt(feedPowerPattern(powerExponent, psi)) * Math.cos(psi / 2) ** 2;
  };
  return beamFigures(tabulateAperture(amplitude, innerFraction))!;
}
const scipyCase = fixture.efficiencies.find((c) => c.focalRatio === 0.4 && c.powerExponent === 2) ?? fixture.efficiencies[0];
const scipyOptimum = fixture.optimum.find((c) => c.focalRatio === 0.4) ?? fixture.optimum[0];

/** The calculator at its defaults (1.2 m, 10 GHz, f/D 0.4, −10 dB edge taper, 10 cm blockage), as the page opens. */
function atDefaults(): CalcInputs {
  const def = createReflectorCalculator(teamConventions);
  const unit: Record<string, number> = { GHz: 1e9, m: 1, cm: 1e-2, mm: 1e-3, dB: 1, '': 1 };
  const inputs: CalcInputs = {};
  for (const p of def.params) {
    if (p.kind === 'choice') inputs[p.name] = p.defaultText;
    else {
      const [, n, u] = /^(-?[\d.]+)\s*([A-Za-z]*)$/.exec(p.defaultText)!;
      inputs[p.name] = Number(n) * unit[u];
    }
  }
  return inputs;
}

export const reflectorCases: ReferenceGroup = {
  topic: 'Front-fed parabolic reflector',
  modules: ['calc/reflector/ruze.ts', 'calc/reflector/gain.ts', 'calc/reflector/aperturePattern.ts', 'calc/reflector/efficiency.ts', 'calc/calculators/reflector.ts'],
  cases: [
    {
      id: 'ruze-lambda-16',
      title: 'Ruze surface efficiency at ε = λ/16: exp(−(π/4)²)',
      source: 'Ruze, "Antenna tolerance theory — a review", Proc. IEEE 54(4), 1966 (hand-worked)',
      expected: Math.exp(-((Math.PI / 4) ** 2)),
      tolerance: 1e-12,
      quantity: 'ratio',
      reads: 'ruzeEfficiency',
      compute: () => ruzeEfficiency(0.03 / 16, 0.03),
    },
    {
      id: 'uniform-hpbw-factor',
      title: 'Uniform circular aperture: HPBW (rad) × D/λ = 1.029',
      source: BALANIS_12_7,
      expected: 1.029,
      tolerance: 5e-4,
      quantity: 'angleRad',
      reads: 'beamwidthTimesDiameterRad',
      compute: () => beamwidthTimesDiameterRad(uniform().halfPowerU),
    },
    {
      id: 'uniform-first-sidelobe',
      title: 'Uniform circular aperture: first sidelobe −17.57 dB',
      source: BALANIS_12_7,
      expected: -17.57,
      tolerance: 0.005,
      quantity: 'dB',
      reads: 'firstSidelobeDb',
      compute: () => uniform().firstSidelobeDb!,
    },
    {
      id: 'optimum-cos2-efficiency',
      title: 'cos² ψ feed at its best rim angle (f/D 0.4, ψ0 ≈ 64°): spillover × taper ≈ 0.82',
      source: BALANIS_15_4,
      expected: 0.82,
      tolerance: 0.015,
      quantity: 'ratio',
      reads: 'aperture',
      compute: () => illuminationEfficiencies(2, rimHalfAngleRad(0.4)).aperture,
    },
    {
      id: 'optimum-edge-taper',
      title: 'Best edge taper for spillover × taper at f/D 0.5 is about −11 dB',
      source: BALANIS_15_4,
      expected: -11,
      tolerance: 1,
      quantity: 'dB',
      reads: 'edgeTaperDb',
      compute: () => optimumIllumination(rimHalfAngleRad(0.5)).edgeTaperDb,
    },
    {
      id: 'optimum-efficiency',
      title: 'Best spillover × taper at f/D 0.5 is about 0.82',
      source: BALANIS_15_4,
      expected: 0.82,
      tolerance: 0.015,
      quantity: 'ratio',
      reads: 'efficiency',
      compute: () => optimumIllumination(rimHalfAngleRad(0.5)).efficiency,
    },
    {
      id: 'scipy-spillover-fd04-q2',
      title: `Spillover, f/D ${scipyCase.focalRatio}, q = ${scipyCase.powerExponent}`,
      source: SCIPY,
      expected: scipyCase.spillover,
      tolerance: 2e-6,
      quantity: 'ratio',
      reads: 'spillover',
      compute: () => illuminationEfficiencies(scipyCase.powerExponent, rimHalfAngleRad(scipyCase.focalRatio)).spillover,
    },
    {
      id: 'scipy-taper-fd04-q2',
      title: `Taper efficiency, f/D ${scipyCase.focalRatio}, q = ${scipyCase.powerExponent}`,
      source: SCIPY,
      expected: scipyCase.taper,
      tolerance: 2e-6,
      quantity: 'ratio',
      reads: 'taper',
      compute: () => illuminationEfficiencies(scipyCase.powerExponent, rimHalfAngleRad(scipyCase.focalRatio)).taper,
    },
    {
      id: 'scipy-optimum-fd04',
      title: `Best spillover × taper at f/D ${scipyOptimum.focalRatio} (minimize_scalar)`,
      source: SCIPY,
      expected: scipyOptimum.efficiency,
      tolerance: 1e-6,
      quantity: 'ratio',
      reads: 'efficiency',
      compute: () => optimumIllumination(rimHalfAngleRad(scipyOptimum.focalRatio)).efficiency,
    },
    {
      id: 'gain-3m-10ghz',
      title: '3 m dish at 10 GHz with η = 0.6: 47.73 dBi',
      source: 'G = η (πD/λ)², hand-worked: πD/λ = 314.3768, squared × 0.6 = 59 299.6 → 47.7305 dBi (Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory))',
      expected: 47.7305,
      tolerance: 1e-4,
      quantity: 'dBi',
      reads: 'apertureGainDbi',
      compute: () => apertureGainDbi(0.6, 3, freeSpaceWavelengthM(10e9)),
    },
    {
      id: 'scipy-first-sidelobe-blockage-0p20',
      title: 'First sidelobe with a 0.20 D central blockage, f/D 0.4, −10 dB edge taper (first local maximum after the first null)',
      source: SIDELOBE_SCIPY,
      expected: blocked20.firstSidelobeDb,
      tolerance: 1e-6,
      quantity: 'dB',
      reads: 'firstSidelobeDb',
      compute: () => blockedFigures(0.4, blocked20.powerExponent, 0.2).firstSidelobeDb!,
    },
    {
      id: 'scipy-highest-sidelobe-later-lobe',
      title: 'Highest sidelobe, q = 12 feed at f/D 0.5 with a 0.10 D blockage (a later lobe above the first)',
      source: SIDELOBE_SCIPY,
      expected: laterLobe.highestSidelobeDb,
      tolerance: 1e-6,
      quantity: 'dB',
      reads: 'highestSidelobeDb',
      compute: () => blockedFigures(0.5, 12, 0.1).highestSidelobeDb!,
    },
    {
      id: 'numpy-coma-loss-fd03-8bw',
      title: 'Coma loss of a feed 4 λ off axis in a 50 λ dish at f/D 0.3 (about 8.6 beamwidths)',
      source: OFFSET_NUMPY,
      expected: farOffset.scanLossDb,
      tolerance: 1e-4,
      quantity: 'dB',
      reads: 'scanLossDb',
      compute: () => displacedFeedBeam(farOffset).scanLossDb,
    },
    {
      id: 'hpbw-70-lambda-over-d',
      title: 'About −10 dB edge taper: HPBW (°) × D/λ ≈ 70 (calculator at its defaults)',
      source: 'rule of thumb: common practice, no source (±10 %)',
      expected: 70,
      tolerance: 7,
      quantity: 'angleDeg',
      reads: 'hpbwFactorDeg',
      compute: () => computeReflector(atDefaults()).values.hpbwFactorDeg as number,
    },
  ],
};
