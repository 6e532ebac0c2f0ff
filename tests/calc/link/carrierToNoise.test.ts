import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { carrierToNoiseDb, carrierToNoiseDensityDbHz, carrierToNoiseDensityFromGOverTDbHz, ebN0Db, gOverTDbPerK, sensitivityDbm } from '../../../calc/link/carrierToNoise';
import { freeSpacePathLossDb } from '../../../calc/link/friis';

describe('G/T, C/N₀, C/N, Eb/N₀ and sensitivity', () => {
  it('G/T: a 3 m dish of 35.0 dBi with T_sys = 120 K has 14.21 dB/K (hand-worked: 35 − 10·log10 120 = 14.208)', () => {
    expect(gOverTDbPerK(35, 120)).toBeCloseTo(14.2082, 4);
  });
  it('C/N₀ from received power equals EIRP − L + G/T − 10·log10 k (two routes agree, property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -20, max: 80, noNaN: true }),
        fc.double({ min: 1, max: 1e8, noNaN: true }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        fc.double({ min: 5, max: 3000, noNaN: true }),
        (eirpDbw, r, gr, tsys) => {
          const loss = freeSpacePathLossDb(r, 1e10);
          const prDbm = eirpDbw - loss + gr + 30;
          expect(carrierToNoiseDensityDbHz(prDbm, tsys)).toBeCloseTo(carrierToNoiseDensityFromGOverTDbHz(eirpDbw, loss, gOverTDbPerK(gr, tsys)), 9);
        },
      ),
    );
  });
  it('C/N = C/N₀ − 10·log10 B and Eb/N₀ = C/N₀ − 10·log10 R_b (hand-worked)', () => {
    expect(carrierToNoiseDb(80, 1e6)).toBeCloseTo(20, 12);
    expect(ebN0Db(80, 1e7)).toBeCloseTo(10, 12);
  });
  it('sensitivity of a 1 MHz, 3 dB NF receiver needing 10 dB SNR is −100.98 dBm (hand-worked: −173.98 + 60 + 3 + 10)', () => {
    expect(sensitivityDbm(1e6, 3, 10)).toBeCloseTo(-100.9752, 4);
  });
  it('rejects a bandwidth or bit rate of 0 and T_sys ≤ 0, naming the input', () => {
    expect(() => carrierToNoiseDb(80, 0)).toThrow(/bandwidthHz/);
    expect(() => ebN0Db(80, 0)).toThrow(/bitRateBitPerS/);
    expect(() => gOverTDbPerK(30, 0)).toThrow(/systemNoiseTemperatureK/);
    expect(() => sensitivityDbm(0, 3, 10)).toThrow(/bandwidthHz/);
  });
});
