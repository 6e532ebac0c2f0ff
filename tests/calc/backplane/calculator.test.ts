import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeBackplaneSpacing, createBackplaneSpacingCalculator } from '../../../calc/calculators/backplaneSpacing';
import { CalcInputError } from '../../../calc/errors';
import { defaultTexts, evaluate } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';

const def = createBackplaneSpacingCalculator(teamConventions);
const C = 299_792_458;
const base = { frequencyHz: 3e9, bandLowHz: 2e9, bandHighHz: 4e9, relativePermittivity: 1, scanMaxDeg: 30, element: 'halfWave', spacingM: null };
const codes = (r: { warnings: { code: string }[] }) => r.warnings.map((w) => w.code);

describe('computeBackplaneSpacing', () => {
  it('empty spacing means λ/4 at the design frequency: 360° round trip, +6.02 dB broadside, 7.48 dBi for a half-wave dipole', () => {
    const r = computeBackplaneSpacing(base);
    expect(r.values.spacingM).toBeCloseTo(C / 3e9 / 4, 15);
    expect(r.values.roundTripPhaseDeg).toBeCloseTo(360, 9);
    expect(r.values.broadsideDesignDb).toBeCloseTo(20 * Math.log10(2), 12);
    expect(r.values.directivityDbi).toBeCloseTo(7.4845, 3);
    expect(r.values.freeSpaceDirectivityDbi).toBeCloseTo(2.1509, 4);
    expect(r.values.nullFrequencyHz).toBeCloseTo(6e9, 0);
  });
  it('octave band 2–4 GHz around 3 GHz: edges at 60° and 120° of k h, 20 log10(2 sin 60°) = 4.77 dB; flattest spacing = λ/4 at 3 GHz', () => {
    const r = computeBackplaneSpacing(base);
    expect(r.values.broadsideLowDb).toBeCloseTo(20 * Math.log10(2 * Math.sin(Math.PI / 3)), 12);
    expect(r.values.rippleChosenDb).toBeCloseTo(-20 * Math.log10(Math.sin(Math.PI / 3)), 12);
    expect(r.values.flattestSpacingM! / (C / 3e9 / 4)).toBeCloseTo(1, 7);
    expect(codes(r)).toContain('band-beyond-1db');
  });
  it('a spacing that puts the null in the band: caution, ripple null, no NaN', () => {
    const r = computeBackplaneSpacing({ ...base, spacingM: (C / 3e9) * 0.6 });
    expect(codes(r)).toContain('null-in-band');
    expect(r.values.rippleChosenDb).toBeNull();
    expect(Object.values(r.values).every((v) => v === null || Number.isFinite(v))).toBe(true);
  });
  it('a spacer brings the model caution and a surface-wave note or caution', () => {
    const r = computeBackplaneSpacing({ ...base, relativePermittivity: 4.4 });
    expect(r.values.quarterWaveSpacerM).toBeCloseTo(C / 3e9 / 4 / Math.sqrt(4.4), 15);
    expect(codes(r)).toEqual(expect.arrayContaining(['spacer-approximation', 'spacer-surface-waves']));
  });
  it('plots: frequency across and beyond the band, angle 0–90° at the band edges, directivity against h/λ', () => {
    const { data } = computeBackplaneSpacing(base);
    expect(data.frequency[0].frequencyHz).toBeLessThan(2e9);
    expect(data.frequency[data.frequency.length - 1].frequencyHz).toBeGreaterThan(4e9);
    expect(data.angle[0].thetaDeg).toBe(0);
    expect(data.angle[data.angle.length - 1].thetaDeg).toBe(90);
    expect(data.angle[data.angle.length - 1].designDb).toBe(-60); // grazing, εr = 1: the image cancels
    expect(data.height.every((p) => Number.isFinite(p.directivityDbi))).toBe(true);
  });
  it('throws CalcInputError naming the band high edge when it is not above the low edge', () => {
    expect(() => computeBackplaneSpacing({ ...base, bandHighHz: 1e9 })).toThrow(CalcInputError);
  });
  it('property: every output is finite or null over random valid inputs (fast-check)', () => {
    fc.assert(fc.property(
      fc.double({ min: 1e8, max: 3e10, noNaN: true }), fc.double({ min: 0.5, max: 0.99, noNaN: true }), fc.double({ min: 1.01, max: 2, noNaN: true }),
      fc.double({ min: 1, max: 12, noNaN: true }), fc.double({ min: 0, max: 89, noNaN: true }), fc.constantFrom('short', 'halfWave'),
      fc.option(fc.double({ min: 0.01, max: 0.7, noNaN: true })),
      (f, lo, hi, er, scan, element, hWl) => {
        const r = computeBackplaneSpacing({ frequencyHz: f, bandLowHz: f * lo, bandHighHz: f * hi, relativePermittivity: er, scanMaxDeg: scan, element, spacingM: hWl === null ? null : (hWl * C) / f });
        return Object.values(r.values).every((v) => v === null || Number.isFinite(v));
      }), { numRuns: 40, seed: 23 });
  });
});

describe('backplane calculator in the frame', () => {
  it('defaults compute; a reversed band marks the band high edge field and keeps the last results', () => {
    const good = evaluate(def, defaultTexts(def), null);
    expect(good.stale).toBe(false);
    const ev = evaluate(def, { ...defaultTexts(def), fhi: '8 GHz' }, good.result);
    expect(ev.stale).toBe(true);
    expect(ev.fields.fhi.ok).toBe(false);
    expect(ev.result).toBe(good.result);
  });
});
