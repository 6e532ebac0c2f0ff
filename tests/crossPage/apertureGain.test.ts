import { describe, expect, it } from 'vitest';
import { computeReflector } from '../../calc/calculators/reflector';
import { computeRangeExposure } from '../../calc/calculators/rangeExposure';
import { sizeReflector } from '../../calc/sizing/reflectorCandidate';
import type { SizingRequirement } from '../../calc/sizing/candidate';
import { apertureGainDbi } from '../../calc/aperture/apertureGain';
import { freeSpaceWavelengthM } from '../../calc/wavelength';

// Same antenna, same number: the reflector page, range & exposure and architecture sizing all give a
// dish of diameter D with aperture efficiency η the gain η(πD/λ)² of calc/aperture/apertureGain.ts
// (IEEE Std 145-2013 aperture efficiency; Balanis, Antenna Theory, 4th ed., §15.4, section number from memory).
const dishes = [
  { title: 'a 2.4 m ground-station dish at 12 GHz, η = 0.55', diameterM: 2.4, frequencyHz: 12e9, efficiency: 0.55 },
  { title: 'a 0.6 m hilltop relay dish at 5.8 GHz, η = 0.62', diameterM: 0.6, frequencyHz: 5.8e9, efficiency: 0.62 },
  { title: 'a 9 m tracking dish at 2.25 GHz, η = 0.48', diameterM: 9, frequencyHz: 2.25e9, efficiency: 0.48 },
];
const TOLERANCE_DB = 0.01;

const reflectorInputs = (frequencyHz: number, diameterM: number, otherLossDb: number) => ({
  frequencyHz,
  solveFor: 'gain',
  diameterM,
  targetGainDbi: 0,
  focalRatio: 0.4,
  feedSpec: 'taper',
  edgeTaperDb: -10,
  powerExponent: 2,
  rmsSurfaceErrorM: 0,
  blockageDiameterM: 0,
  strutBlockedFraction: 0,
  otherLossDb,
  offsetSpec: 'length',
  feedOffsetM: 0,
  beamTiltBeamwidths: 0,
  feedCount: 1,
});

describe('aperture gain agrees across pages (within 0.01 dB)', () => {
  for (const dish of dishes) {
    describe(dish.title, () => {
      const lambda = freeSpaceWavelengthM(dish.frequencyHz);
      const expected = apertureGainDbi(dish.efficiency, dish.diameterM, lambda);

      it('front-fed reflector: with "other losses" set so the budget multiplies to η, its gain is η(πD/λ)²', () => {
        const illumination = (computeReflector(reflectorInputs(dish.frequencyHz, dish.diameterM, 0)).values.apertureEfficiencyPercent as number) / 100;
        const otherLossDb = 10 * Math.log10(illumination / dish.efficiency);
        expect(otherLossDb).toBeGreaterThan(0);
        const run = computeReflector(reflectorInputs(dish.frequencyHz, dish.diameterM, otherLossDb));
        expect(run.values.apertureEfficiencyPercent as number).toBeCloseTo(100 * dish.efficiency, 9);
        expect(Math.abs((run.values.gainDbi as number) - expected)).toBeLessThan(TOLERANCE_DB);
        // and solving for the diameter that gives this gain returns the dish
        const solved = computeReflector({ ...reflectorInputs(dish.frequencyHz, dish.diameterM, otherLossDb), solveFor: 'diameter', targetGainDbi: expected });
        expect((solved.values.diameterM as number) / dish.diameterM).toBeCloseTo(1, 9);
      });

      it('range & exposure: the gain of the diameter at η equals it, and entering that gain implies η back, with no mismatch flag', () => {
        const run = computeRangeExposure({
          frequencyHz: dish.frequencyHz,
          solveFor: 'range',
          transmitPowerW: 20,
          transmitGainDbi: expected,
          receiveGainDbi: 20,
          requiredPowerW: 1e-12,
          otherLossDb: 3,
          rangeM: 50_000,
          apertureDiameterM: dish.diameterM,
          apertureEfficiency: dish.efficiency,
          limitSet: 'icnirp2020-public',
          customLimitWPerM2: null,
        });
        expect(Math.abs((run.values.apertureGainAtEtaDbi as number) - expected)).toBeLessThan(TOLERANCE_DB);
        expect(run.values.impliedEfficiencyPercent as number).toBeCloseTo(100 * dish.efficiency, 9);
        expect(run.values.apertureDistanceToLimitAtEtaM as number).toBeCloseTo(run.values.apertureDistanceToLimitM as number, 9);
        expect(run.warnings.map((w) => w.code)).not.toContain('gain-aperture-mismatch');
      });

      it('architecture sizing: a dish sized for that gain at η has this diameter and reports this gain', () => {
        const requirement: SizingRequirement = {
          frequencyLowHz: dish.frequencyHz,
          frequencyHighHz: dish.frequencyHz,
          kind: 'gain',
          gainEdgeDbi: expected,
          hpbwDeg: 1,
          scanAzimuthDeg: 0,
          scanElevationDeg: 0,
          uniformBeam: false,
          maxSidelobeDb: null,
          limits: { maxSizeM: null, maxElements: null, maxDepthM: null },
          assumptions: { reflectorEfficiency: dish.efficiency, arrayRadiationEfficiency: 0.8, cosineExponent: 1.2, spacingMarginFraction: 0.05, elementGainDbi: 5 },
        };
        const candidate = sizeReflector(requirement);
        expect(candidate.sizeM / dish.diameterM).toBeCloseTo(1, 9);
        expect(Math.abs(candidate.gainBroadsideDbi - expected)).toBeLessThan(TOLERANCE_DB);
        expect(Math.abs(apertureGainDbi(dish.efficiency, candidate.sizeM, lambda) - expected)).toBeLessThan(TOLERANCE_DB);
      });
    });
  }
});
