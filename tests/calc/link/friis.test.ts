import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  dbmToWatts,
  freeSpacePathLossDb,
  friisMaxRangeM,
  friisReceivedPowerDbm,
  friisRequiredGainSumDbi,
  p525BasicTransmissionLossDb,
  wattsToDbm,
} from '../../../calc/link/friis';
import { CalcInputError } from '../../../calc/errors';

describe('freeSpacePathLossDb(distanceM, frequencyHz)', () => {
  it('1 km at 1 GHz is 92.45 dB (20·log10(4πR/λ), hand-worked)', () => {
    expect(freeSpacePathLossDb(1000, 1e9)).toBeCloseTo(92.4478, 4);
  });
  it('grows by 6.02 dB per doubling of distance (inverse-square law)', () => {
    expect(freeSpacePathLossDb(2000, 3e9) - freeSpacePathLossDb(1000, 3e9)).toBeCloseTo(20 * Math.log10(2), 12);
  });
  it('agrees with the ITU-R P.525-4 eq. (8) (equation number from memory) form within 0.05 dB everywhere (property; the P.525 constant 32.4 is 32.448 rounded)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e8, noNaN: true }), fc.double({ min: 1e6, max: 1e12, noNaN: true }), (d, f) => {
        const diff = freeSpacePathLossDb(d, f) - p525BasicTransmissionLossDb(d, f);
        expect(diff).toBeGreaterThan(0);
        expect(diff).toBeLessThan(0.05);
      }),
    );
  });
  it('P.525-4 eq. (8) (equation number from memory) at 2.4 GHz and 10 km: 32.4 + 67.60 + 20 = 120.00 dB', () => {
    expect(p525BasicTransmissionLossDb(10_000, 2.4e9)).toBeCloseTo(120.0042, 3);
  });
  it('rejects a zero distance', () => {
    expect(() => freeSpacePathLossDb(0, 1e9)).toThrow(CalcInputError);
  });
});

describe('Friis link', () => {
  it('received power: 30 dBm + 20 + 20 − 92.45 − 2 = −24.45 dBm at 1 km, 1 GHz (hand-worked)', () => {
    expect(friisReceivedPowerDbm(30, 20, 20, 1000, 1e9, 2)).toBeCloseTo(-24.4478, 4);
  });
  it('range and received power are inverse (round trip, property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 60, noNaN: true }),
        fc.double({ min: -10, max: 50, noNaN: true }),
        fc.double({ min: -10, max: 50, noNaN: true }),
        fc.double({ min: -130, max: -40, noNaN: true }),
        fc.double({ min: 1e7, max: 1e11, noNaN: true }),
        (pt, gt, gr, req, f) => {
          const r = friisMaxRangeM(pt, gt, gr, req, f, 1);
          expect(Number.isFinite(r) && r > 0).toBe(true);
          expect(friisReceivedPowerDbm(pt, gt, gr, r, f, 1)).toBeCloseTo(req, 8);
          const sum = friisRequiredGainSumDbi(pt, req, r, f, 1);
          expect(sum).toBeCloseTo(gt + gr, 8);
        },
      ),
    );
  });
  it('more gain never gives less range (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -10, max: 60, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), (g, extra) => {
        expect(friisMaxRangeM(30, g + extra, 10, -90, 2e9)).toBeGreaterThanOrEqual(friisMaxRangeM(30, g, 10, -90, 2e9));
      }),
    );
  });
  it('dBm ↔ W: 30 dBm = 1 W, 0 dBm = 1 mW (definition)', () => {
    expect(dbmToWatts(30)).toBeCloseTo(1, 14);
    expect(wattsToDbm(1e-3)).toBeCloseTo(0, 12);
  });
});
