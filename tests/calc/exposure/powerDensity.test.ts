import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  apertureDistanceToLimitM,
  apertureNearFieldZones,
  apertureOnAxisPowerDensityWPerM2,
  eirpW,
  farFieldBoundaryM,
  farFieldDistanceToLimitM,
  farFieldPowerDensityWPerM2,
} from '../../../calc/exposure/powerDensity';
import { REFERENCE_LEVEL_SETS, referenceLevelWPerM2 } from '../../../calc/exposure/referenceLevels';

// Hand-worked examples; formulas after FCC OET Bulletin 65, Edition 97-01 (1997).
describe('far-field exposure', () => {
  it('EIRP of 10 W into 30 dBi is 10 kW', () => {
    expect(eirpW(10, 30)).toBeCloseTo(10_000, 8);
  });
  it('10 kW EIRP at 100 m: 10⁴/(4π·10⁴) = 0.0796 W/m² (hand-worked)', () => {
    expect(farFieldPowerDensityWPerM2(10_000, 100)).toBeCloseTo(1 / (4 * Math.PI), 12);
  });
  it('10 kW EIRP, 10 W/m² limit: √(10⁴/(40π)) = 8.92 m (hand-worked)', () => {
    expect(farFieldDistanceToLimitM(10_000, 10)).toBeCloseTo(8.9206, 4);
  });
  it('1 kW EIRP, 2 W/m² limit (a general-public level below 400 MHz): √(1000/(8π)) = 6.31 m (hand-worked)', () => {
    expect(farFieldDistanceToLimitM(1000, 2)).toBeCloseTo(6.3078, 4);
  });
  it('far-field boundary of a 3 m dish at 10 GHz is 2·9/0.02998 = 600.4 m', () => {
    expect(farFieldBoundaryM(3, 10e9)).toBeCloseTo(600.4153, 3);
  });
});

describe('aperture (near-field) model, OET-65 §2 (section number from memory)', () => {
  const p = 100;
  const d = 1;
  const eta = 0.55;
  const f = 2_997_924_580; // λ = 0.1 m
  it('zones: 4P/A = 509.3 W/m², S_nf = 16ηP/(πD²) = 280.1 W/m², R_nf = D²/(4λ) = 2.5 m, far field from 0.6D²/λ = 6 m', () => {
    const z = apertureNearFieldZones(p, d, eta, f);
    expect(z.surfaceDensityWPerM2).toBeCloseTo(1600 / Math.PI, 9);
    expect(z.nearFieldDensityWPerM2).toBeCloseTo(880 / Math.PI, 9);
    expect(z.nearFieldExtentM).toBeCloseTo(2.5, 9);
    expect(z.farFieldStartM).toBeCloseTo(6, 9);
  });
  it('transition region falls as 1/R: at 5 m it is S_nf·2.5/5 = 140.1 W/m²', () => {
    expect(apertureOnAxisPowerDensityWPerM2(p, d, eta, f, 5)).toBeCloseTo(440 / Math.PI, 9);
  });
  it('distance to a 200 W/m² limit lies in the transition region: 280.1·2.5/200 = 3.50 m (hand-worked)', () => {
    expect(apertureDistanceToLimitM(p, d, eta, f, 200)).toBeCloseTo((880 / Math.PI) * 2.5 / 200, 9);
  });
  it('distance to a 10 W/m² limit is set by the far field: 20.78 m (hand-worked)', () => {
    expect(apertureDistanceToLimitM(p, d, eta, f, 10)).toBeCloseTo(20.7839, 4);
  });
  it('a limit above 4P/A needs no distance; one between S_nf and 4P/A gives the near-field extent', () => {
    expect(apertureDistanceToLimitM(p, d, eta, f, 600)).toBe(0);
    expect(apertureDistanceToLimitM(p, d, eta, f, 400)).toBeCloseTo(2.5, 12);
  });
  it('the density is non-increasing with distance and the model is never below the far-field formula past R_ff/2 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 500, noNaN: true }), fc.double({ min: 1.01, max: 3, noNaN: true }), (r, k) => {
        const s1 = apertureOnAxisPowerDensityWPerM2(p, d, eta, f, r);
        const s2 = apertureOnAxisPowerDensityWPerM2(p, d, eta, f, r * k);
        expect(Number.isFinite(s1)).toBe(true);
        expect(s2).toBeLessThanOrEqual(s1 * (1 + 1e-12) + 0.05 * s1); // the zone joins differ by < 5 %
      }),
    );
  });
  it('more power never gives a shorter distance to the limit (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 1e4, noNaN: true }), fc.double({ min: 1, max: 10, noNaN: true }), fc.double({ min: 0.1, max: 100, noNaN: true }), (power, factor, limit) => {
        expect(apertureDistanceToLimitM(power * factor, d, eta, f, limit)).toBeGreaterThanOrEqual(apertureDistanceToLimitM(power, d, eta, f, limit) - 1e-9);
      }),
    );
  });
});

describe('reference levels (orientation only; values from memory, guideline named per set)', () => {
  it('ICNIRP 2020 general public: 2 W/m² at 100 MHz, f/200 at 900 MHz (4.5), 10 W/m² at 10 GHz', () => {
    expect(referenceLevelWPerM2('icnirp2020-public', 100e6)).toBe(2);
    expect(referenceLevelWPerM2('icnirp2020-public', 900e6)).toBeCloseTo(4.5, 12);
    expect(referenceLevelWPerM2('icnirp2020-public', 10e9)).toBe(10);
  });
  it('FCC 47 CFR §1.1310 general population: 1 mW/cm² (10 W/m²) above 1.5 GHz; occupational 5 mW/cm²', () => {
    expect(referenceLevelWPerM2('fcc-general', 5e9)).toBe(10);
    expect(referenceLevelWPerM2('fcc-occupational', 5e9)).toBe(50);
  });
  it('levels are continuous at their band joins (a check on the table entries)', () => {
    for (const set of REFERENCE_LEVEL_SETS) {
      for (const join of [400e6, 2000e6, 300e6, 1500e6]) {
        if (join <= set.minHz || join >= set.maxHz) continue;
        const below = set.limitWPerM2(join * (1 - 1e-9));
        const above = set.limitWPerM2(join);
        expect(Math.abs(above - below) / above, `${set.id} at ${join}`).toBeLessThan(1e-6);
      }
    }
  });
  it('outside a set’s range there is no level', () => {
    expect(referenceLevelWPerM2('icnirp2020-public', 10e6)).toBeNull();
  });
});
