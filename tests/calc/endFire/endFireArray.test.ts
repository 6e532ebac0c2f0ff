import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  endFireApproxDirectivity,
  endFireArrayModel,
  endFireDirectivity,
  endFireElementCount,
  endFireHpbwDeg,
  endFireLengthForDirectivity,
  endFirePhaseStepRad,
  endFireSpacingLimitWavelengths,
  type EndFireArrayKind,
} from '../../../calc/endFire/index';
import { directivity } from '../../../calc/array/directivity';
import { CalcInputError } from '../../../calc/errors';
import fixture from '../../../verification/fixtures/end-fire.json';

describe('endFireElementCount(L, d): N = ⌊L/d⌋ + 1 (our rule)', () => {
  it('counts whole elements that fit the length', () => {
    expect(endFireElementCount(2.2, 0.25)).toBe(9);
    expect(endFireElementCount(2.0, 0.25)).toBe(9); // L = (N − 1)d exactly
    expect(endFireElementCount(0.25, 0.25)).toBe(2);
    expect(endFireElementCount(0.3 * 7, 0.3)).toBe(8); // 2.1/0.3 is 6.999… in floating point
  });
  it('throws CalcInputError for a length below one spacing, zero, NaN or too many elements', () => {
    expect(() => endFireElementCount(0.2, 0.25)).toThrow(CalcInputError);
    expect(() => endFireElementCount(0, 0.25)).toThrow(CalcInputError);
    expect(() => endFireElementCount(Number.NaN, 0.25)).toThrow(CalcInputError);
    expect(() => endFireElementCount(5000, 0.25)).toThrow(CalcInputError);
  });
});

describe('endFirePhaseStepRad (Balanis, "Antenna Theory", 4th ed., §6.3–6.4 (section number from memory))', () => {
  it('ordinary: −kd; Hansen–Woodyard: −(kd + 2.92/N)', () => {
    expect(endFirePhaseStepRad('ordinary', 10, 0.25)).toBeCloseTo(-Math.PI / 2, 14);
    expect(endFirePhaseStepRad('hansenWoodyard', 10, 0.25)).toBeCloseTo(-(Math.PI / 2 + 0.292), 14);
  });
});

describe('endFireDirectivity against SciPy quadrature (scripts/fixtures/end_fire.py)', () => {
  for (const c of fixture.cases) {
    it(`${c.kind}, N = ${c.count}, d = ${c.spacingWavelengths} λ: D = ${c.directivity.toFixed(4)} within 1e-8 relative; HPBW within 1e-6°`, () => {
      const kind = c.kind as EndFireArrayKind;
      const d = endFireDirectivity(kind, c.count, c.spacingWavelengths);
      expect(Math.abs(d / c.directivity - 1)).toBeLessThan(1e-8);
      const hpbw = endFireHpbwDeg(kind, c.count, c.spacingWavelengths);
      if (c.hpbwDeg >= 179.999) expect(hpbw === null || Math.abs(hpbw - c.hpbwDeg) < 1e-6).toBe(true);
      else expect(Math.abs((hpbw as number) - c.hpbwDeg)).toBeLessThan(1e-6);
    });
  }
});

describe('end-fire directivity: exact values and long-array approximations', () => {
  it('ordinary end-fire at d = λ/4 has D = N exactly (every cross term sin(mπ/2)cos(mπ/2)/(mπ/2) vanishes; Balanis 4th ed. §6.3 (section number from memory), hand-derived)', () => {
    for (const n of [2, 3, 7, 16, 33, 100]) expect(endFireDirectivity('ordinary', n, 0.25)).toBeCloseTo(n, 9);
  });
  it('closed form agrees with the engine\'s sphere quadrature within 0.005 dB (two independent integrations)', () => {
    for (const [kind, n, d] of [['ordinary', 12, 0.3], ['hansenWoodyard', 12, 0.22], ['hansenWoodyard', 25, 0.25]] as const) {
      const model = endFireArrayModel(kind, n, d);
      expect(Math.abs(directivity(model).directivityDbi - directivity(model, { method: 'quadrature' }).directivityDbi)).toBeLessThan(0.005);
    }
  });
  it('long arrays: ordinary → 4L/λ and Hansen–Woodyard → 1.805 · 4L/λ within 1 %, L = N·d (Balanis, "Antenna Theory", 4th ed., §6.3 and §6.4 (section number from memory))', () => {
    const n = 400, d = 0.25;
    expect(Math.abs(endFireDirectivity('ordinary', n, d) / endFireApproxDirectivity('ordinary', n * d) - 1)).toBeLessThan(0.01);
    expect(Math.abs(endFireDirectivity('hansenWoodyard', n, d) / endFireApproxDirectivity('hansenWoodyard', n * d) - 1)).toBeLessThan(0.01);
  });
  it('Hansen–Woodyard gains about 2.56 dB over ordinary only for long arrays (computed; Balanis 4th ed. §6.4 (section number from memory))', () => {
    const advantage = (n: number) => 10 * Math.log10(endFireDirectivity('hansenWoodyard', n, 0.25) / endFireDirectivity('ordinary', n, 0.25));
    expect(Math.abs(advantage(400) - 2.565)).toBeLessThan(0.02);
    expect(Math.abs(advantage(3) - 2.565)).toBeGreaterThan(0.3);
  });
  it('HPBW of a long ordinary end-fire array ≈ 2 acos(1 − 1.391λ/(πNd)) within 0.5 % (Balanis, "Antenna Theory", 4th ed., §6.3 (section number from memory), Table 6.2 (table number from memory), from memory)', () => {
    const n = 100, d = 0.25;
    const approx = 2 * Math.acos(1 - 1.391 / (Math.PI * n * d)) * (180 / Math.PI);
    expect(Math.abs((endFireHpbwDeg('ordinary', n, d) as number) / approx - 1)).toBeLessThan(0.005);
  });
  it('end-fire spacing limits: λ/2 ordinary, (N − 1)λ/(4N) Hansen–Woodyard (Balanis 4th ed. §6.3–6.4 (section number from memory))', () => {
    expect(endFireSpacingLimitWavelengths('ordinary', 10)).toBe(0.5);
    expect(endFireSpacingLimitWavelengths('hansenWoodyard', 10)).toBeCloseTo(0.225, 15);
  });
  it('an ordinary array at d = λ/2 has a second beam of equal strength backward (the grating lobe the warning names)', () => {
    const model = endFireArrayModel('ordinary', 10, 0.5);
    const forward = directivity(model, { direction: { thetaDeg: 90, phiDeg: 0 } }).directivity;
    const backward = directivity(model, { direction: { thetaDeg: 90, phiDeg: 180 } }).directivity;
    expect(backward / forward).toBeCloseTo(1, 9);
  });
});

describe('endFireLengthForDirectivity: the fewest whole elements that reach a target', () => {
  it('ordinary at d = λ/4 for 20 (13.01 dBi) needs exactly 20 elements, 4.75 λ', () => {
    const s = endFireLengthForDirectivity('ordinary', 0.25, 20)!;
    expect(s.count).toBe(20);
    expect(s.lengthWavelengths).toBeCloseTo(4.75, 12);
  });
  it('returns null when the target is beyond the element limit', () => {
    expect(endFireLengthForDirectivity('ordinary', 0.25, 1e6)).toBeNull();
  });
  it('throws CalcInputError for a non-finite target', () => {
    expect(() => endFireLengthForDirectivity('ordinary', 0.25, Number.NaN)).toThrow(CalcInputError);
  });
});

describe('property-based checks (fast-check)', () => {
  const kindArb = fc.constantFrom<EndFireArrayKind>('ordinary', 'hansenWoodyard');
  it('directivity is finite, ≥ 1 and grows with N for spacings within the end-fire condition', () => {
    fc.assert(fc.property(kindArb, fc.integer({ min: 2, max: 120 }), fc.double({ min: 0.05, max: 1, noNaN: true }), (kind, n, fraction) => {
      const d = fraction * (kind === 'ordinary' ? 0.45 : 0.25);
      const a = endFireDirectivity(kind, n, d);
      const b = endFireDirectivity(kind, n + 1, d);
      return Number.isFinite(a) && a >= 1 - 1e-9 && b > a;
    }), { numRuns: 200, seed: 7 });
  });
  it('round trip length → directivity → length returns the same element count and length', () => {
    fc.assert(fc.property(kindArb, fc.integer({ min: 2, max: 300 }), fc.double({ min: 0.05, max: 1, noNaN: true }), (kind, n, fraction) => {
      const d = fraction * (kind === 'ordinary' ? 0.45 : 0.25);
      const length = (n - 1) * d;
      const count = endFireElementCount(length, d);
      const target = endFireDirectivity(kind, count, d);
      const s = endFireLengthForDirectivity(kind, d, target);
      return s !== null && s.count === n && Math.abs(s.lengthWavelengths - length) <= 1e-12 * Math.max(1, length);
    }), { numRuns: 120, seed: 11 });
  });
  it('the solution is minimal: one element fewer falls short of the target', () => {
    fc.assert(fc.property(kindArb, fc.double({ min: 2, max: 300, noNaN: true }), fc.double({ min: 0.1, max: 1, noNaN: true }), (kind, target, fraction) => {
      const d = fraction * (kind === 'ordinary' ? 0.45 : 0.25);
      const s = endFireLengthForDirectivity(kind, d, target)!;
      return s.directivity >= target && (s.count === 1 || endFireDirectivity(kind, s.count - 1, d) < target);
    }), { numRuns: 100, seed: 13 });
  });
});
